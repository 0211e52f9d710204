/**
 * Arrays of the selection: a linear array of `count` instances stepped by (dx, dy) mm, and a grid
 * array of rows × cols instances with a column and row pitch. The selection itself is the first
 * instance; the others are copies with fresh ids (groups wholly inside the selection are copied
 * per instance), added on top of the draw order row by row.
 */
import type { Design } from '../design/schema';
import { LIMITS } from '../design/bounds';
import { translation } from '../geometry/affine';
import { requireThat } from './command-error';
import { copyRecords } from './copy-records';
import { editDesign } from './design-draft';
import { IdAllocator } from './ids';
import type { Patch } from './patch';
import { selectedElectrodes } from './selection';

/** Most electrodes one array may add: a full-glass dot matrix, far beyond a segment display. */
export const MAX_ARRAY_NEW_ELECTRODES = 2_000;

function arrayOf(
	design: Design,
	ids: readonly string[],
	offsets: readonly [number, number][]
): Patch {
	const electrodes = selectedElectrodes(design, ids);
	const added = electrodes.length * offsets.length;
	requireThat(
		added <= MAX_ARRAY_NEW_ELECTRODES,
		`the array would add ${added} electrodes; at most ${MAX_ARRAY_NEW_ELECTRODES} at once`
	);
	requireThat(
		design.electrodes.length + added <= LIMITS.electrodes,
		`the array would bring the design to ${design.electrodes.length + added} electrodes; ` +
			`a design holds at most ${LIMITS.electrodes}`
	);
	const allocators = {
		electrodes: IdAllocator.forCollection(design, 'electrodes'),
		groups: IdAllocator.forCollection(design, 'groups')
	};
	return editDesign(design, (draft) => {
		for (const [dx, dy] of offsets) {
			const copies = copyRecords({
				electrodes,
				groups: design.groups,
				target: design,
				ids: allocators,
				matrix: translation(dx, dy)
			});
			draft.electrodes.insert(copies.electrodes);
			draft.groups.insert(copies.groups);
		}
	});
}

export function linearArray(
	design: Design,
	args: { ids: readonly string[]; count: number; dx_mm: number; dy_mm: number }
): Patch {
	requireThat(
		Number.isInteger(args.count) && args.count >= 2 && args.count <= 1000,
		'expected a count from 2 to 1000'
	);
	requireThat(Number.isFinite(args.dx_mm) && Number.isFinite(args.dy_mm), 'expected a finite step');
	const offsets = Array.from({ length: args.count - 1 }, (_, k): [number, number] => [
		(k + 1) * args.dx_mm,
		(k + 1) * args.dy_mm
	]);
	return arrayOf(design, args.ids, offsets);
}

export function gridArray(
	design: Design,
	args: { ids: readonly string[]; rows: number; cols: number; pitchX_mm: number; pitchY_mm: number }
): Patch {
	const ok = (n: number) => Number.isInteger(n) && n >= 1 && n <= 1000;
	requireThat(
		ok(args.rows) && ok(args.cols) && args.rows * args.cols >= 2,
		'expected whole rows and columns, 2 or more instances'
	);
	requireThat(
		args.rows * args.cols - 1 <= MAX_ARRAY_NEW_ELECTRODES,
		`${args.rows} × ${args.cols} instances is more than an array may make (${MAX_ARRAY_NEW_ELECTRODES + 1})`
	);
	requireThat(
		Number.isFinite(args.pitchX_mm) && Number.isFinite(args.pitchY_mm),
		'expected a finite pitch'
	);
	const offsets: [number, number][] = [];
	for (let r = 0; r < args.rows; r++) {
		for (let c = 0; c < args.cols; c++)
			if (r > 0 || c > 0) offsets.push([c * args.pitchX_mm, r * args.pitchY_mm]);
	}
	return arrayOf(design, args.ids, offsets);
}
