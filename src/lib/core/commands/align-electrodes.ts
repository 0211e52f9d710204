/**
 * Aligns the selection's units (whole selected groups, else single electrodes) to one edge or
 * centre line of the selection's bounds, or of a given box such as the viewing area. Exact curve
 * bounds are used, so a round electrode touches the line with its curve, not its handles.
 */
import type { Design } from '../design/schema';
import type { Bounds } from '../geometry/bounds';
import { translation } from '../geometry/affine';
import { shapesTightBounds } from '../geometry/tight-bounds';
import { editDesign } from './design-draft';
import type { Patch } from './patch';
import { selectedElectrodes, selectionUnits } from './selection';
import { transformInDraft } from './transform-electrodes';

export type AlignEdge = 'left' | 'centre' | 'right' | 'top' | 'middle' | 'bottom';

function offsetFor(edge: AlignEdge, unit: Bounds, to: Bounds): [number, number] {
	switch (edge) {
		case 'left':
			return [to.minX - unit.minX, 0];
		case 'right':
			return [to.maxX - unit.maxX, 0];
		case 'centre':
			return [(to.minX + to.maxX) / 2 - (unit.minX + unit.maxX) / 2, 0];
		case 'top':
			return [0, to.minY - unit.minY];
		case 'bottom':
			return [0, to.maxY - unit.maxY];
		case 'middle':
			return [0, (to.minY + to.maxY) / 2 - (unit.minY + unit.maxY) / 2];
	}
}

export function alignElectrodes(
	design: Design,
	args: { ids: readonly string[]; edge: AlignEdge; to?: Bounds }
): Patch {
	const target = args.to ?? shapesTightBounds(selectedElectrodes(design, args.ids));
	const units = selectionUnits(design, args.ids);
	return editDesign(design, (draft) => {
		for (const unit of units) {
			const [dx, dy] = offsetFor(args.edge, unit.bounds, target);
			if (dx !== 0 || dy !== 0) transformInDraft(draft, unit.ids, translation(dx, dy));
		}
	});
}
