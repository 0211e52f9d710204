/**
 * The glass drawing's ring shapes and boxes: rings are Float64Array [x0, y0, x1, y1, …] in
 * millimetres, closed implicitly, as `geometry/flatten.ts` produces them — a pad's or the glass's
 * rectangle, a straight lead of given width, a ring's bounding box. Booleans, offsets and areas of
 * rings are the one polygon engine's (`geometry/polygon-clipper.ts`).
 */
import { EMPTY_BOUNDS, type Bounds } from '../geometry/bounds';
import type { XY } from '../geometry/vec';

export function ringBounds(ring: Float64Array, into: Bounds = { ...EMPTY_BOUNDS }): Bounds {
	for (let i = 0; i < ring.length; i += 2) {
		if (ring[i] < into.minX) into.minX = ring[i];
		if (ring[i] > into.maxX) into.maxX = ring[i];
		if (ring[i + 1] < into.minY) into.minY = ring[i + 1];
		if (ring[i + 1] > into.maxY) into.maxY = ring[i + 1];
	}
	return into;
}

export const boundsOverlap = (a: Bounds, b: Bounds, slack_mm = 0): boolean =>
	a.minX <= b.maxX + slack_mm &&
	b.minX <= a.maxX + slack_mm &&
	a.minY <= b.maxY + slack_mm &&
	b.minY <= a.maxY + slack_mm;

export function rectRing(options: {
	x_mm: number;
	y_mm: number;
	width_mm: number;
	height_mm: number;
}): Float64Array {
	const { x_mm: x, y_mm: y, width_mm: w, height_mm: h } = options;
	return Float64Array.of(x, y, x + w, y, x + w, y + h, x, y + h);
}

/** The rectangle a straight lead of width `width_mm` covers from a to b, with square ends. */
export function leadRing(options: { a: XY; b: XY; width_mm: number }): Float64Array {
	const { a, b } = options;
	const half = options.width_mm / 2;
	const len = Math.hypot(b.x - a.x, b.y - a.y);
	const ux = len === 0 ? 1 : (b.x - a.x) / len;
	const uy = len === 0 ? 0 : (b.y - a.y) / len;
	const ax = a.x - ux * half,
		ay = a.y - uy * half,
		bx = b.x + ux * half,
		by = b.y + uy * half;
	const nx = -uy * half,
		ny = ux * half;
	return Float64Array.of(ax + nx, ay + ny, bx + nx, by + ny, bx - nx, by - ny, ax - nx, ay - ny);
}
