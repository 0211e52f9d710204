/**
 * Algebra on patches: inverse, composition (squash), no-op test and ids a patch inserts.
 *
 * Squashing p (A → B) then q (B → C) keeps, per id, p's `before` and q's `after`. A record that only
 * one patch touched needs its index carried through the other patch: an untouched record's rank
 * among untouched records is the same in both arrays, so its index maps by subtracting the
 * removed positions below it and then skipping the inserted positions (see `carryIndex`).
 */
import { deepEqual } from './deep-equal';
import {
	COLLECTIONS,
	DOCUMENT_FIELDS,
	type CollectionDiff,
	type CollectionName,
	type FieldDiffs,
	type Patch,
	type Placed,
	type RecordDiff
} from './patch';

type AnyDiff = CollectionDiff<{ id: string }>;
type MutablePatch = { -readonly [K in keyof Patch]: Patch[K] };

export function invertPatch(patch: Patch): Patch {
	const inverted: MutablePatch = {};
	for (const name of COLLECTIONS) {
		const diff = patch[name] as AnyDiff | undefined;
		if (diff)
			(inverted as Record<string, unknown>)[name] = new Map(
				[...diff].map(([id, [b, a]]) => [id, [a, b] as const])
			);
	}
	if (patch.fields) {
		const fields: Record<string, unknown> = {};
		for (const [k, [b, a]] of Object.entries(patch.fields)) fields[k] = [a, b];
		inverted.fields = fields as FieldDiffs;
	}
	return inverted;
}

const sortedIndices = (diff: AnyDiff, side: 0 | 1) =>
	[...diff.values()].flatMap((d) => (d[side] ? [d[side]!.index] : [])).sort((a, b) => a - b);

/** Index of an untouched record after a change that removed `removed` and inserted `inserted` (both sorted). */
function carryIndex(
	index: number,
	removed: readonly number[],
	inserted: readonly number[]
): number {
	let rank = index;
	for (const r of removed) if (r < index) rank--;
	let position = rank;
	for (const i of inserted) {
		if (i <= position) position++;
		else break;
	}
	return position;
}

function composeDiffs(p: AnyDiff | undefined, q: AnyDiff | undefined): AnyDiff | undefined {
	if (!p || p.size === 0) return q;
	if (!q || q.size === 0) return p;
	const pRemoved = sortedIndices(p, 0);
	const pInserted = sortedIndices(p, 1);
	const qRemoved = sortedIndices(q, 0);
	const qInserted = sortedIndices(q, 1);
	const moved = <T>(placed: Placed<T> | null, removed: number[], inserted: number[]) =>
		placed && { index: carryIndex(placed.index, removed, inserted), record: placed.record };
	const out = new Map<string, RecordDiff<{ id: string }>>();
	for (const [id, [before, after]] of p) {
		const later = q.get(id);
		out.set(id, later ? [before, later[1]] : [before, moved(after, qRemoved, qInserted)]);
	}
	for (const [id, [before, after]] of q) {
		if (!p.has(id)) out.set(id, [moved(before, pInserted, pRemoved), after]);
	}
	for (const [id, [before, after]] of out) if (!before && !after) out.delete(id);
	return out;
}

export function squashPatches(patches: readonly Patch[]): Patch {
	return patches.reduce((acc, next) => {
		const result: MutablePatch = {};
		for (const name of COLLECTIONS) {
			const diff = composeDiffs(
				acc[name] as AnyDiff | undefined,
				next[name] as AnyDiff | undefined
			);
			if (diff && diff.size > 0) (result as Record<string, unknown>)[name] = diff;
		}
		const fields: Record<string, unknown> = { ...(acc.fields ?? {}) };
		for (const [k, [b, a]] of Object.entries(next.fields ?? {})) {
			const earlier = (acc.fields as Record<string, readonly [unknown, unknown]> | undefined)?.[k];
			fields[k] = [earlier ? earlier[0] : b, a];
		}
		if (Object.keys(fields).length > 0) result.fields = fields as FieldDiffs;
		return result;
	}, {} as Patch);
}

/** True when applying the patch gives back an equal design. */
export function isNoopPatch(patch: Patch): boolean {
	for (const name of COLLECTIONS) {
		for (const [before, after] of (patch[name] as AnyDiff | undefined)?.values() ?? []) {
			if (
				!before ||
				!after ||
				before.index !== after.index ||
				!deepEqual(before.record, after.record)
			)
				return false;
		}
	}
	return DOCUMENT_FIELDS.every(
		(f) => !patch.fields?.[f] || deepEqual(patch.fields[f]![0], patch.fields[f]![1])
	);
}

/** Ids a patch adds to a collection, in their new draw order. */
export function insertedIds(patch: Patch, collection: CollectionName = 'electrodes'): string[] {
	const diff = patch[collection] as AnyDiff | undefined;
	return [...(diff ?? [])]
		.filter(([, [before, after]]) => !before && after)
		.sort((a, b) => a[1][1]!.index - b[1][1]!.index)
		.map(([id]) => id);
}

/** Ids a patch removes from a collection. */
export function removedIds(patch: Patch, collection: CollectionName = 'electrodes'): string[] {
	const diff = patch[collection] as AnyDiff | undefined;
	return [...(diff ?? [])].filter(([, [before, after]]) => before && !after).map(([id]) => id);
}
