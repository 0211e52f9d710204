/**
 * Bad electrode geometry for the glass: an outline that crosses itself or has no area (the plate
 * built from it would be wrong), and an electrode outside the seal's inner edge (no fluid there,
 * or off the glass). Self-crossing (or self-touching) is tested exactly on the flattened ring by the
 * geometry kernel `ring-crossings.ts`, on the polygon engine's 10 nm grid.
 */
import type { Design, Electrode, Rect } from '../design/schema';
import { flattenContour } from '../geometry/flatten';
import { signedArea } from '../geometry/polygon';
import { ringSelfCrossings } from '../geometry/ring-crossings';
import { ringBounds } from './rings';

export interface OutlineFault {
	electrode: Electrode;
	fault: 'self-crossing' | 'no-area' | 'off-glass';
}

export function outlineFaults(design: Design, sealInner: Rect): OutlineFault[] {
	const faults: OutlineFault[] = [];
	for (const e of design.electrodes) {
		const ring = flattenContour(e.outline, { tolerance_um: 5 });
		if (Math.abs(signedArea(ring)) < 1e-6) faults.push({ electrode: e, fault: 'no-area' });
		else if (ringSelfCrossings(ring, { limit: 1 }).length > 0)
			faults.push({ electrode: e, fault: 'self-crossing' });
		const b = ringBounds(ring);
		if (
			b.minX < sealInner.x_mm ||
			b.minY < sealInner.y_mm ||
			b.maxX > sealInner.x_mm + sealInner.width_mm ||
			b.maxY > sealInner.y_mm + sealInner.height_mm
		)
			faults.push({ electrode: e, fault: 'off-glass' });
	}
	return faults;
}
