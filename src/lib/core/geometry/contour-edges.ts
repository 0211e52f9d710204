/**
 * Edges of a closed contour as cubics. Edge i runs from point i to point (i + 1) mod n; its
 * control points are the start's `out` handle and the end's `in` handle (both relative to their
 * points). An edge with neither handle is straight.
 */
import type { Contour, Point } from '../design/schema';
import type { Cubic } from './bezier';

export const isStraightEdge = (from: Point, to: Point): boolean => !from.out && !to.in;

export function edgeCubic(contour: Contour, index: number): Cubic {
	const from = contour[index];
	const to = contour[(index + 1) % contour.length];
	return [
		from.x,
		from.y,
		from.x + (from.out?.[0] ?? 0),
		from.y + (from.out?.[1] ?? 0),
		to.x + (to.in?.[0] ?? 0),
		to.y + (to.in?.[1] ?? 0),
		to.x,
		to.y
	];
}

export function isStraightEdgeAt(contour: Contour, index: number): boolean {
	return isStraightEdge(contour[index], contour[(index + 1) % contour.length]);
}
