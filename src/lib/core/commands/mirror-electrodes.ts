/**
 * Mirrors the selected electrodes: 'horizontal' flips left↔right, 'vertical' flips top↔bottom,
 * about `centre` (default: the selection's centre, so the selection stays in place).
 */
import type { Design } from '../design/schema';
import { mirrorAbout } from '../geometry/affine';
import { boundsCentre } from '../geometry/tight-bounds';
import type { XY } from '../geometry/vec';
import type { Patch } from './patch';
import { selectionBounds } from './selection';
import { transformElectrodes } from './transform-electrodes';

export function mirrorElectrodes(
	design: Design,
	args: { ids: readonly string[]; direction: 'horizontal' | 'vertical'; centre?: XY }
): Patch {
	const centre = args.centre ?? boundsCentre(selectionBounds(design, args.ids));
	return transformElectrodes(design, {
		ids: args.ids,
		matrix: mirrorAbout({ direction: args.direction, centre })
	});
}
