/**
 * A copy-on-write working copy of one ordered record collection, used by DesignDraft. Reads see
 * the latest state; the original array is copied on the first write and never mutated.
 */
import { CommandError } from './command-error';

export class RecordList<T extends { id: string }> {
	private items: T[] | null = null;

	constructor(
		private readonly original: readonly T[],
		private readonly label: string
	) {}

	all(): readonly T[] {
		return this.items ?? this.original;
	}

	private writable(): T[] {
		this.items ??= this.original.slice();
		return this.items;
	}

	indexOf(id: string): number {
		return this.all().findIndex((r) => r.id === id);
	}

	has(id: string): boolean {
		return this.indexOf(id) >= 0;
	}

	get(id: string): T {
		const index = this.indexOf(id);
		if (index < 0) throw new CommandError(`unknown ${this.label} "${id}"`);
		return this.all()[index];
	}

	/** Replaces a record by id with `update(record)`; keeps the old object when nothing changed. */
	update(id: string, update: (record: T) => T): void {
		const index = this.indexOf(id);
		if (index < 0) throw new CommandError(`unknown ${this.label} "${id}"`);
		const next = update(this.all()[index]);
		if (next !== this.all()[index]) this.writable()[index] = next;
	}

	insert(records: readonly T[], index = this.all().length): void {
		for (const r of records)
			if (this.has(r.id)) throw new CommandError(`${this.label} "${r.id}" already exists`);
		this.writable().splice(index, 0, ...records);
	}

	remove(ids: Iterable<string>): void {
		const drop = new Set(ids);
		if (drop.size > 0) this.items = this.all().filter((r) => !drop.has(r.id));
	}
}
