/**
 * Bad electrode geometry for the glass: an outline that crosses itself or has no area (the plate
 * built from it would be wrong), and an electrode outside the seal's inner edge (no fluid there,
 * or off the glass). Self-crossing is tested on the flattened ring, edge against non-adjacent edge.
 */
import type { Design, Electrode, Rect } from '../design/schema';
import { flattenContour } from '../geometry/flatten';
import { signedArea } from '../geometry/polygon';
import { ringBounds } from './rings';

function crosses(ring: Float64Array): boolean {
	const n = ring.length / 2;
	const orient = (a: number, b: number, c: number) =>
		(ring[2 * b] - ring[2 * a]) * (ring[2 * c + 1] - ring[2 * a + 1]) -
		(ring[2 * b + 1] - ring[2 * a + 1]) * (ring[2 * c] - ring[2 * a]);
	for (let i = 0; i < n; i++) {
		const i2 = (i + 1) % n;
		for (let j = i + 2; j < n; j++) {
			const j2 = (j + 1) % n;
			if (j2 === i) continue;
			const d1 = orient(j, j2, i),
				d2 = orient(j, j2, i2),
				d3 = orient(i, i2, j),
				d4 = orient(i, i2, j2);
			if (d1 * d2 < 0 && d3 * d4 < 0) return true;
		}
	}
	return false;
}

export interface OutlineFault {
	electrode: Electrode;
	fault: 'self-crossing' | 'no-area' | 'off-glass';
}

const MAX_CHECKED_POINTS = 4000;

export function outlineFaults(design: Design, sealInner: Rect): OutlineFault[] {
	const faults: OutlineFault[] = [];
	for (const e of design.electrodes) {
		const ring = flattenContour(e.outline, { tolerance_um: 5 });
		if (Math.abs(signedArea(ring)) < 1e-6) faults.push({ electrode: e, fault: 'no-area' });
		else if (ring.length / 2 <= MAX_CHECKED_POINTS && crosses(ring))
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
