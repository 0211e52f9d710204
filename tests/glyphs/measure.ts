/**
 * Measurements taken from generated geometry (not from the generator's own numbers): gaps between
 * flattened outlines, widths across a direction, and horizontal extents along a scan line. Curves
 * are flattened at 0.05 µm, far below the 1 µm tolerance of the tests.
 */
import fc from 'fast-check';
import { flattenShape } from '../../src/lib/core/geometry/flatten';
import { minimumGapBetweenRings } from '../../src/lib/core/geometry/minimum-gap';
import type { ElectrodeDraft } from '../../src/lib/core/glyphs/glyph-types';
import { SEGMENT_STYLES } from '../../src/lib/core/glyphs/segment-params';

export const FLATTEN_um = 0.05;
export const TOLERANCE_mm = 1e-3;

export const ringsOf = (part: Pick<ElectrodeDraft, 'outline' | 'holes'>) =>
	flattenShape(part, { tolerance_um: FLATTEN_um });

/** Smallest gap over all pairs of parts, with the pair that has it. */
export function closestPair(parts: readonly ElectrodeDraft[]): { gap: number; pair: string } {
	const rings = parts.map(ringsOf);
	let best = { gap: Infinity, pair: '' };
	for (let i = 0; i < parts.length; i++) {
		for (let j = i + 1; j < parts.length; j++) {
			const gap = minimumGapBetweenRings(rings[i], rings[j]);
			if (gap < best.gap) best = { gap, pair: `${parts[i].key}–${parts[j].key}` };
		}
	}
	return best;
}

export function gapBetween(a: ElectrodeDraft, b: ElectrodeDraft): number {
	return minimumGapBetweenRings(ringsOf(a), ringsOf(b));
}

/** Extent of a part measured along the unit normal of direction (dx, dy). */
export function widthAcross(part: ElectrodeDraft, direction: { x: number; y: number }): number {
	const len = Math.hypot(direction.x, direction.y);
	const nx = -direction.y / len;
	const ny = direction.x / len;
	const ring = ringsOf(part)[0];
	let lo = Infinity;
	let hi = -Infinity;
	for (let i = 0; i < ring.length; i += 2) {
		const v = ring[i] * nx + ring[i + 1] * ny;
		lo = Math.min(lo, v);
		hi = Math.max(hi, v);
	}
	return hi - lo;
}

/** Smallest and largest value of f(x, y) over a part's flattened outline. */
export function rangeOf(
	part: ElectrodeDraft,
	f: (x: number, y: number) => number
): { min: number; max: number } {
	const ring = ringsOf(part)[0];
	let min = Infinity;
	let max = -Infinity;
	for (let i = 0; i < ring.length; i += 2) {
		const v = f(ring[i], ring[i + 1]);
		min = Math.min(min, v);
		max = Math.max(max, v);
	}
	return { min, max };
}

/** x where the horizontal line at y crosses the part's outline, smallest and largest. */
export function spanAtY(part: ElectrodeDraft, y: number): { min: number; max: number } {
	const ring = ringsOf(part)[0];
	let min = Infinity;
	let max = -Infinity;
	const n = ring.length;
	for (let i = 0; i < n; i += 2) {
		const [x0, y0, x1, y1] = [ring[i], ring[i + 1], ring[(i + 2) % n], ring[(i + 3) % n]];
		if ((y0 - y) * (y1 - y) > 0 || y0 === y1) continue;
		const x = x0 + ((y - y0) / (y1 - y0)) * (x1 - x0);
		min = Math.min(min, x);
		max = Math.max(max, x);
	}
	return { min, max };
}

export const styleArb = fc.constantFrom(...SEGMENT_STYLES);
