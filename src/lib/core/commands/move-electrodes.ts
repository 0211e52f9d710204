/** Translates the selected electrodes by (dx, dy) millimetres. */
import type { Design } from '../design/schema';
import { translation } from '../geometry/affine';
import { requireThat } from './command-error';
import type { Patch } from './patch';
import { transformElectrodes } from './transform-electrodes';

export function moveElectrodes(
	design: Design,
	args: { ids: readonly string[]; dx_mm: number; dy_mm: number }
): Patch {
	requireThat(
		Number.isFinite(args.dx_mm) && Number.isFinite(args.dy_mm),
		'expected a finite offset'
	);
	return transformElectrodes(design, {
		ids: args.ids,
		matrix: translation(args.dx_mm, args.dy_mm)
	});
}
