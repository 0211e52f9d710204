/**
 * Scales the selected electrodes by (sx, sy) about `origin` (default: the selection's centre).
 * Non-uniform factors are allowed; negative factors mirror; zero is refused (it would collapse
 * the outlines).
 */
import type { Design } from '../design/schema';
import { scalingAbout } from '../geometry/affine';
import { boundsCentre } from '../geometry/tight-bounds';
import type { XY } from '../geometry/vec';
import { requireThat } from './command-error';
import type { Patch } from './patch';
import { selectionBounds } from './selection';
import { transformElectrodes } from './transform-electrodes';

export function scaleElectrodes(
	design: Design,
	args: { ids: readonly string[]; sx: number; sy: number; origin?: XY }
): Patch {
	requireThat(
		Number.isFinite(args.sx) && Number.isFinite(args.sy) && args.sx !== 0 && args.sy !== 0,
		'expected finite, non-zero scale factors'
	);
	const centre = args.origin ?? boundsCentre(selectionBounds(design, args.ids));
	return transformElectrodes(design, {
		ids: args.ids,
		matrix: scalingAbout({ sx: args.sx, sy: args.sy, centre })
	});
}
