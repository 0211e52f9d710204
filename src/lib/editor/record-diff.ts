/**
 * Diffing lists of records by identity: the design is immutable, so a record that did not change
 * is the very same object, and a view only rebuilds what is new or replaced. O(n) per call.
 */

export interface RecordDiff<T extends { id: string }> {
	added: T[];
	changed: T[];
	removed: string[];
	/** True when the surviving records are no longer in the same relative order. */
	reordered: boolean;
}

export function diffRecords<T extends { id: string }>(
	previous: ReadonlyMap<string, T>,
	next: readonly T[]
): RecordDiff<T> {
	const added: T[] = [];
	const changed: T[] = [];
	const seen = new Set<string>();
	for (const record of next) {
		seen.add(record.id);
		const before = previous.get(record.id);
		if (before === undefined) added.push(record);
		else if (before !== record) changed.push(record);
	}
	const removed: string[] = [];
	for (const id of previous.keys()) if (!seen.has(id)) removed.push(id);
	let reordered = false;
	const survivors = next.filter((r) => previous.has(r.id)).map((r) => r.id);
	let i = 0;
	for (const id of previous.keys()) {
		if (!seen.has(id)) continue;
		if (survivors[i++] !== id) {
			reordered = true;
			break;
		}
	}
	return { added, changed, removed, reordered };
}
