/**
 * Pastes a clipboard payload on top of the draw order, offset by (dx, dy) mm. Ids that clash with
 * the target get a `-n` suffix (group members following `<group>.<part>` move with their group),
 * and common/line assignments the target design does not have are dropped, so pasting works
 * between designs.
 */
import type { Design } from '../design/schema';
import { translation } from '../geometry/affine';
import { requireThat } from './command-error';
import type { ClipboardPayload } from './clipboard';
import { copyRecords } from './copy-records';
import { editDesign } from './design-draft';
import { IdAllocator } from './ids';
import type { Patch } from './patch';

export function pasteClipboard(
	design: Design,
	args: { payload: ClipboardPayload; dx_mm?: number; dy_mm?: number }
): Patch {
	const dx = args.dx_mm ?? 0;
	const dy = args.dy_mm ?? 0;
	requireThat(Number.isFinite(dx) && Number.isFinite(dy), 'expected a finite offset');
	const copies = copyRecords({
		electrodes: args.payload.electrodes,
		groups: args.payload.groups,
		target: design,
		ids: {
			electrodes: IdAllocator.forCollection(design, 'electrodes'),
			groups: IdAllocator.forCollection(design, 'groups')
		},
		matrix: dx !== 0 || dy !== 0 ? translation(dx, dy) : undefined,
		unassignUnknown: true
	});
	return editDesign(design, (draft) => {
		draft.electrodes.insert(copies.electrodes);
		draft.groups.insert(copies.groups);
	});
}
