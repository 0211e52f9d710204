/**
 * Rotates the selected electrodes by `angle_deg` about `centre` (default: the centre of the
 * selection's bounds). Positive angles turn clockwise on screen (y points down). Numeric entry of a
 * selection's angle is a rotation by the entered amount, since shapes store no angle.
 */
import type { Design } from '../design/schema';
import { rotationAbout } from '../geometry/affine';
import { boundsCentre } from '../geometry/tight-bounds';
import type { XY } from '../geometry/vec';
import { requireThat } from './command-error';
import type { Patch } from './patch';
import { selectionBounds } from './selection';
import { transformElectrodes } from './transform-electrodes';

export function rotateElectrodes(
	design: Design,
	args: { ids: readonly string[]; angle_deg: number; centre?: XY }
): Patch {
	requireThat(Number.isFinite(args.angle_deg), 'expected a finite angle');
	const centre = args.centre ?? boundsCentre(selectionBounds(design, args.ids));
	return transformElectrodes(design, {
		ids: args.ids,
		matrix: rotationAbout({ angle_deg: args.angle_deg, centre })
	});
}
