/**
 * Deterministic id allocation (no randomness, so commands are reproducible). New records take
 * `prefix + n` with the smallest free n ≥ 1; copies keep their original id when it is free and
 * otherwise take `stem-n` (a trailing "-n" of the original is dropped first). Ids follow the
 * document's rule: 1–64 characters of letters, digits and _ . : -.
 */
import type { Design } from '../design/schema';
import type { CollectionName } from './patch';

const MAX_ID_LENGTH = 64;
const sanitize = (text: string) =>
	text.replace(/[^A-Za-z0-9_.:-]/g, '_').slice(0, MAX_ID_LENGTH - 4) || 'id';

export class IdAllocator {
	private readonly taken: Set<string>;

	constructor(taken: Iterable<string>) {
		this.taken = new Set(taken);
	}

	static forCollection(design: Design, collection: CollectionName): IdAllocator {
		return new IdAllocator(design[collection].map((r) => r.id));
	}

	has(id: string): boolean {
		return this.taken.has(id);
	}

	/** Reserves an id that is known to be free (or throws). */
	reserve(id: string): string {
		if (this.taken.has(id)) throw new Error(`id "${id}" is taken`);
		this.taken.add(id);
		return id;
	}

	/** `prefix1`, `prefix2`, … : the first free one. */
	next(prefix: string): string {
		const stem = sanitize(prefix);
		for (let n = 1; ; n++) {
			const id = `${stem}${n}`;
			if (!this.taken.has(id)) return this.reserve(id);
		}
	}

	/** `wanted` itself when free, else `stem-2`, `stem-3`, … */
	claim(wanted: string): string {
		const clean =
			wanted.length <= MAX_ID_LENGTH && /^[A-Za-z0-9_.:-]+$/.test(wanted)
				? wanted
				: sanitize(wanted);
		if (!this.taken.has(clean)) return this.reserve(clean);
		const stem = sanitize(clean.replace(/-\d+$/, ''));
		for (let n = 2; ; n++) {
			const id = `${stem}-${n}`;
			if (!this.taken.has(id)) return this.reserve(id);
		}
	}
}

/** The first free `prefix + n` id of a collection. */
export function nextId(
	design: Design,
	prefix: string,
	collection: CollectionName = 'electrodes'
): string {
	return IdAllocator.forCollection(design, collection).next(prefix);
}
