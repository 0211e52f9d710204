/**
 * Adds electrodes (from a drawing tool, a primitive shape or an import). Missing ids are
 * allocated as `prefix + n`; a given id that is taken gets a `-n` suffix. New electrodes go on
 * top of the draw order unless an index is given. Find the new ids with `insertedIds(patch)`.
 */
import type { Contour, Design, Electrode, ElectrodeKind } from '../design/schema';
import { requireThat } from './command-error';
import { editDesign } from './design-draft';
import { checkAssignment, checkContour } from './electrode-input';
import { IdAllocator } from './ids';
import type { Patch } from './patch';

export interface ElectrodeInput {
	id?: string;
	name?: string;
	kind?: ElectrodeKind;
	outline: Contour;
	holes?: readonly Contour[];
	common?: string | null;
	line?: string | null;
	locked?: boolean;
}

export function addElectrodes(
	design: Design,
	args: { electrodes: readonly ElectrodeInput[]; index?: number; idPrefix?: string }
): Patch {
	requireThat(args.electrodes.length > 0, 'no electrodes to add');
	const index = args.index ?? design.electrodes.length;
	requireThat(
		Number.isInteger(index) && index >= 0 && index <= design.electrodes.length,
		`index ${index} is outside the draw order`
	);
	const ids = IdAllocator.forCollection(design, 'electrodes');
	const records = args.electrodes.map((input): Electrode => {
		checkContour(input.outline, 'an outline');
		(input.holes ?? []).forEach((h) => checkContour(h, 'a hole'));
		checkAssignment(design, input);
		const id = input.id ? ids.claim(input.id) : ids.next(args.idPrefix ?? 'e');
		return {
			id,
			name: input.name ?? id,
			kind: input.kind ?? 'segment',
			outline: input.outline,
			holes: [...(input.holes ?? [])],
			common: input.common ?? null,
			line: input.line ?? null,
			locked: input.locked ?? false
		};
	});
	return editDesign(design, (draft) => draft.electrodes.insert(records, index));
}
