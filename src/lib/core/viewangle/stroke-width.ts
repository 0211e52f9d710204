/**
 * Stroke width of a segment electrode, estimated as 2·area / perimeter (exact for a long bar:
 * 2·w·L/(2L + 2w) → w as L ≫ w; a little under w for short bars). The narrowest segment sets the
 * parallax limit.
 */
import type { Design, Electrode } from '../design/schema';
import { flattenShape } from '../geometry/flatten';

function ringPerimeterAndArea(ring: Float64Array): { perimeter: number; area: number } {
	let perimeter = 0,
		twiceArea = 0;
	const n = ring.length / 2;
	for (let i = 0; i < n; i++) {
		const j = (i + 1) % n;
		const x0 = ring[2 * i],
			y0 = ring[2 * i + 1],
			x1 = ring[2 * j],
			y1 = ring[2 * j + 1];
		perimeter += Math.hypot(x1 - x0, y1 - y0);
		twiceArea += x0 * y1 - x1 * y0;
	}
	return { perimeter, area: Math.abs(twiceArea) / 2 };
}

export function strokeWidth_mm(electrode: Electrode): number {
	const rings = flattenShape({ outline: electrode.outline, holes: electrode.holes });
	let perimeter = 0,
		area = 0;
	rings.forEach((ring, i) => {
		const part = ringPerimeterAndArea(ring);
		perimeter += part.perimeter;
		area += i === 0 ? part.area : -part.area;
	});
	return perimeter > 0 ? (2 * Math.max(area, 0)) / perimeter : 0;
}

/** The narrowest segment electrode, or null when the design has none. */
export function narrowestSegment(design: Design): { id: string; width_mm: number } | null {
	let best: { id: string; width_mm: number } | null = null;
	for (const e of design.electrodes) {
		if (e.kind !== 'segment') continue;
		const width_mm = strokeWidth_mm(e);
		if (width_mm > 0 && (!best || width_mm < best.width_mm)) best = { id: e.id, width_mm };
	}
	return best;
}
