/**
 * Builds the patch between two designs. Records are compared by reference (commands replace a
 * record only when they change it), so the diff costs O(n) for n records. A record kept unchanged
 * but moved in draw order is in the patch too: among the unchanged records, the longest run whose
 * order both arrays agree on (longest increasing subsequence, patience sorting) stays out of the
 * patch and all others are recorded as moves.
 */
import type { Design } from '../design/schema';
import { deepEqual } from './deep-equal';
import {
	COLLECTIONS,
	DOCUMENT_FIELDS,
	type CollectionDiff,
	type Patch,
	type RecordDiff
} from './patch';

/** Indices (into `values`) of one longest strictly increasing subsequence. */
function longestIncreasingRun(values: readonly number[]): Set<number> {
	const tails: number[] = [];
	const previous = new Array<number>(values.length).fill(-1);
	for (let i = 0; i < values.length; i++) {
		let lo = 0;
		let hi = tails.length;
		while (lo < hi) {
			const mid = (lo + hi) >> 1;
			if (values[tails[mid]] < values[i]) lo = mid + 1;
			else hi = mid;
		}
		if (lo > 0) previous[i] = tails[lo - 1];
		tails[lo] = i;
	}
	const keep = new Set<number>();
	for (let k = tails.length ? tails[tails.length - 1] : -1; k >= 0; k = previous[k]) keep.add(k);
	return keep;
}

export function diffRecordLists<T extends { id: string }>(
	before: readonly T[],
	after: readonly T[]
): CollectionDiff<T> | undefined {
	if (before === after) return undefined;
	const beforeIndex = new Map(before.map((r, i) => [r.id, i]));
	const afterIndex = new Map(after.map((r, i) => [r.id, i]));
	const diff = new Map<string, RecordDiff<T>>();
	const unchanged: { id: string; record: T; from: number; to: number }[] = [];
	before.forEach((record, from) => {
		const to = afterIndex.get(record.id);
		if (to === undefined) diff.set(record.id, [{ index: from, record }, null]);
		else if (after[to] !== record)
			diff.set(record.id, [
				{ index: from, record },
				{ index: to, record: after[to] }
			]);
		else unchanged.push({ id: record.id, record, from, to });
	});
	after.forEach((record, to) => {
		if (!beforeIndex.has(record.id)) diff.set(record.id, [null, { index: to, record }]);
	});
	const inOrder = unchanged.every((u, k) => k === 0 || unchanged[k - 1].to < u.to);
	if (!inOrder) {
		const keep = longestIncreasingRun(unchanged.map((u) => u.to));
		unchanged.forEach((u, k) => {
			if (!keep.has(k))
				diff.set(u.id, [
					{ index: u.from, record: u.record },
					{ index: u.to, record: u.record }
				]);
		});
	}
	return diff.size > 0 ? diff : undefined;
}

export function diffDesigns(before: Design, after: Design): Patch {
	const patch: Record<string, unknown> = {};
	for (const name of COLLECTIONS) {
		const diff = diffRecordLists<{ id: string }>(before[name], after[name]);
		if (diff) patch[name] = diff;
	}
	const fields: Record<string, unknown> = {};
	for (const field of DOCUMENT_FIELDS) {
		if (before[field] !== after[field] && !deepEqual(before[field], after[field]))
			fields[field] = [before[field], after[field]];
	}
	if (Object.keys(fields).length > 0) patch.fields = fields;
	return patch as Patch;
}
