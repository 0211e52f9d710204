/**
 * A Patch is the diff of one edit, in the manner of a record store: for every changed record of an
 * ordered collection (electrodes, groups, commons, segmentLines; keyed by id) it holds
 * [before, after], each with the record's index in its array (before: in the old design, after: in
 * the new one; null for an insert or a remove). Whole-value document fields (name, glass, drive,
 * thresholds, viewing, cell, lighting — every top-level field of the schema that is not a record
 * collection, derived from the schema so new fields are covered) hold [before, after] values.
 *
 * Applying removes every record with a `before` and inserts every `after` at its index in
 * ascending order. Records not in the patch keep their relative order, so this reproduces the new
 * array exactly. Designs are immutable: applying returns a new design that shares every unchanged
 * record (and every unchanged array) with the old one.
 */
import {
	designSchema,
	type Design,
	type Electrode,
	type Group,
	type LineRef
} from '../design/schema';

export interface Placed<T> {
	readonly index: number;
	readonly record: T;
}

export type RecordDiff<T> = readonly [before: Placed<T> | null, after: Placed<T> | null];
export type CollectionDiff<T> = ReadonlyMap<string, RecordDiff<T>>;

export interface CollectionRecords {
	electrodes: Electrode;
	groups: Group;
	commons: LineRef;
	segmentLines: LineRef;
}
export type CollectionName = keyof CollectionRecords;
export const COLLECTIONS: readonly CollectionName[] = [
	'electrodes',
	'groups',
	'commons',
	'segmentLines'
];

/** Top-level fields replaced as whole values (format and version never change in an edit). */
export type DocumentField = Exclude<keyof Design, 'format' | 'version' | CollectionName>;
export const DOCUMENT_FIELDS: readonly DocumentField[] = Object.keys(designSchema.shape).filter(
	(key) =>
		key !== 'format' && key !== 'version' && !(COLLECTIONS as readonly string[]).includes(key)
) as DocumentField[];
export type FieldDiffs = {
	readonly [F in DocumentField]?: readonly [before: Design[F], after: Design[F]];
};

export type Patch = { readonly [C in CollectionName]?: CollectionDiff<CollectionRecords[C]> } & {
	readonly fields?: FieldDiffs;
};

export const EMPTY_PATCH: Patch = {};

export class PatchConflictError extends Error {
	constructor(message: string) {
		super(message);
		this.name = 'PatchConflictError';
	}
}

function applyToList<T extends { id: string }>(
	list: readonly T[],
	diff: CollectionDiff<T> | undefined,
	name: string
): readonly T[] {
	if (!diff || diff.size === 0) return list;
	const removed = new Set<string>();
	let present: Set<string> | null = null;
	const inserts: Placed<T>[] = [];
	for (const [id, [before, after]] of diff) {
		if (before) {
			if (list[before.index]?.id !== id)
				throw new PatchConflictError(`${name}: "${id}" is not at index ${before.index}`);
			removed.add(id);
		} else {
			present ??= new Set(list.map((r) => r.id));
			if (present.has(id)) throw new PatchConflictError(`${name}: "${id}" already exists`);
		}
		if (after) inserts.push(after);
	}
	const next = removed.size > 0 ? list.filter((r) => !removed.has(r.id)) : list.slice();
	inserts.sort((a, b) => a.index - b.index);
	for (const placed of inserts) {
		if (placed.index > next.length)
			throw new PatchConflictError(`${name}: index ${placed.index} is past the end`);
		next.splice(placed.index, 0, placed.record);
	}
	return next;
}

export function applyPatch(design: Design, patch: Patch): Design {
	const next: Design = { ...design };
	next.electrodes = applyToList(design.electrodes, patch.electrodes, 'electrodes') as Electrode[];
	next.groups = applyToList(design.groups, patch.groups, 'groups') as Group[];
	next.commons = applyToList(design.commons, patch.commons, 'commons') as LineRef[];
	next.segmentLines = applyToList(
		design.segmentLines,
		patch.segmentLines,
		'segmentLines'
	) as LineRef[];
	const fields = patch.fields ?? {};
	for (const field of DOCUMENT_FIELDS) {
		const change = fields[field];
		if (!change) continue;
		// An optional section taken back to "absent" leaves no key behind.
		if (change[1] === undefined) delete (next as Partial<Record<DocumentField, unknown>>)[field];
		else (next as Record<DocumentField, unknown>)[field] = change[1];
	}
	return next;
}
