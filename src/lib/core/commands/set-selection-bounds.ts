/**
 * Numeric entry of a selection's box: moves and stretches the selection so its exact bounds get
 * the given x, y (top-left, mm), width and height. Omitted values keep their current value.
 */
import type { Design } from '../design/schema';
import { composeAffine, scalingAbout, translation } from '../geometry/affine';
import { requireThat } from './command-error';
import type { Patch } from './patch';
import { selectionBounds } from './selection';
import { transformElectrodes } from './transform-electrodes';

export interface SelectionBoxEntry {
	ids: readonly string[];
	x_mm?: number;
	y_mm?: number;
	width_mm?: number;
	height_mm?: number;
}

export function setSelectionBounds(design: Design, args: SelectionBoxEntry): Patch {
	const b = selectionBounds(design, args.ids);
	const width = b.maxX - b.minX;
	const height = b.maxY - b.minY;
	const targetW = args.width_mm ?? width;
	const targetH = args.height_mm ?? height;
	requireThat(targetW > 0 && targetH > 0, 'expected a width and height above 0 mm');
	requireThat(width > 0 || args.width_mm === undefined, 'cannot stretch a selection of zero width');
	requireThat(
		height > 0 || args.height_mm === undefined,
		'cannot stretch a selection of zero height'
	);
	const sx = width > 0 ? targetW / width : 1;
	const sy = height > 0 ? targetH / height : 1;
	const matrix = composeAffine(
		scalingAbout({ sx, sy, centre: { x: b.minX, y: b.minY } }),
		translation((args.x_mm ?? b.minX) - b.minX, (args.y_mm ?? b.minY) - b.minY)
	);
	return transformElectrodes(design, { ids: args.ids, matrix });
}
