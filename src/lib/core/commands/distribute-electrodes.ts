/**
 * Distributes the selection's units (whole selected groups, else single electrodes) with equal
 * gaps between their bounds along one axis. The first and last unit (by their leading edge) stay;
 * the ones between move. Needs three units or more.
 */
import type { Design } from '../design/schema';
import { translation } from '../geometry/affine';
import { requireThat } from './command-error';
import { editDesign } from './design-draft';
import type { Patch } from './patch';
import { selectionUnits } from './selection';
import { transformInDraft } from './transform-electrodes';

export function distributeElectrodes(
	design: Design,
	args: { ids: readonly string[]; axis: 'horizontal' | 'vertical' }
): Patch {
	const horizontal = args.axis === 'horizontal';
	const lo = (b: { minX: number; minY: number }) => (horizontal ? b.minX : b.minY);
	const hi = (b: { maxX: number; maxY: number }) => (horizontal ? b.maxX : b.maxY);
	const units = selectionUnits(design, args.ids).sort(
		(a, b) => lo(a.bounds) - lo(b.bounds) || hi(a.bounds) - hi(b.bounds)
	);
	requireThat(units.length >= 3, 'distributing needs three or more items');
	const span = hi(units[units.length - 1].bounds) - lo(units[0].bounds);
	const sizes = units.reduce((sum, u) => sum + hi(u.bounds) - lo(u.bounds), 0);
	const gap = (span - sizes) / (units.length - 1);
	return editDesign(design, (draft) => {
		let cursor = hi(units[0].bounds) + gap;
		for (const unit of units.slice(1, -1)) {
			const shift = cursor - lo(unit.bounds);
			if (shift !== 0)
				transformInDraft(
					draft,
					unit.ids,
					translation(horizontal ? shift : 0, horizontal ? 0 : shift)
				);
			cursor += hi(unit.bounds) - lo(unit.bounds) + gap;
		}
	});
}
