/**
 * Duplicates the selection with an offset (default 1 mm right and down). Copies get fresh ids and
 * go on top of the draw order; groups wholly inside the selection are duplicated with them.
 */
import type { Design } from '../design/schema';
import { translation } from '../geometry/affine';
import { requireThat } from './command-error';
import { copyRecords } from './copy-records';
import { editDesign } from './design-draft';
import { IdAllocator } from './ids';
import type { Patch } from './patch';
import { selectedElectrodes } from './selection';

export function duplicateElectrodes(
	design: Design,
	args: { ids: readonly string[]; dx_mm?: number; dy_mm?: number }
): Patch {
	const dx = args.dx_mm ?? 1;
	const dy = args.dy_mm ?? 1;
	requireThat(Number.isFinite(dx) && Number.isFinite(dy), 'expected a finite offset');
	const copies = copyRecords({
		electrodes: selectedElectrodes(design, args.ids),
		groups: design.groups,
		target: design,
		ids: {
			electrodes: IdAllocator.forCollection(design, 'electrodes'),
			groups: IdAllocator.forCollection(design, 'groups')
		},
		matrix: translation(dx, dy)
	});
	return editDesign(design, (draft) => {
		draft.electrodes.insert(copies.electrodes);
		draft.groups.insert(copies.groups);
	});
}
