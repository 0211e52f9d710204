/**
 * Filled area of one plate's ITO: the union of all its conductors (electrodes with their holes,
 * back-plate pieces, leads, pads, transfer points), by the boolean kernel of `geometry/paper-kernel.ts`
 * (overlaps counted once), in mm². Nets are united one at a time and summed: two nets never overlap
 * on a sound plate (the glass check reports any that touch).
 */
import type { Contour } from '../design/schema';
import { uniteShapes } from '../geometry/paper-kernel';
import { shapeArea } from '../geometry/polygon';
import type { Shape } from '../geometry/shape';
import type { Net } from './artwork';

function ringToContour(ring: Float64Array): Contour {
	const out: Contour = [];
	for (let i = 0; i < ring.length; i += 2) out.push({ x: ring[i], y: ring[i + 1] });
	return out;
}

export function netArea_mm2(net: Net): number {
	const shapes: Shape[] = [];
	for (const c of net.conductors) {
		if (c.evenOdd)
			shapes.push({
				outline: ringToContour(c.rings[0]),
				holes: c.rings.slice(1).map(ringToContour)
			});
		else for (const r of c.rings) shapes.push({ outline: ringToContour(r), holes: [] });
	}
	return uniteShapes(shapes).reduce((sum, s) => sum + shapeArea(s), 0);
}

export const plateArea_mm2 = (nets: readonly Net[]): number =>
	nets.reduce((sum, net) => sum + netArea_mm2(net), 0);
