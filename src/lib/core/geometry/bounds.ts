/**
 * Axis-aligned bounds of contours, including Bezier control points (a safe superset of the curve).
 */
import type { Contour } from '../design/schema';

export interface Bounds {
	minX: number;
	minY: number;
	maxX: number;
	maxY: number;
}

export const EMPTY_BOUNDS: Bounds = {
	minX: Infinity,
	minY: Infinity,
	maxX: -Infinity,
	maxY: -Infinity
};

export function contourBounds(contour: Contour, into: Bounds = { ...EMPTY_BOUNDS }): Bounds {
	for (const p of contour) {
		for (const [dx, dy] of [[0, 0], p.in ?? [0, 0], p.out ?? [0, 0]]) {
			into.minX = Math.min(into.minX, p.x + dx);
			into.minY = Math.min(into.minY, p.y + dy);
			into.maxX = Math.max(into.maxX, p.x + dx);
			into.maxY = Math.max(into.maxY, p.y + dy);
		}
	}
	return into;
}

export function unionBounds(items: readonly Contour[]): Bounds {
	const bounds = { ...EMPTY_BOUNDS };
	for (const contour of items) contourBounds(contour, bounds);
	return bounds;
}
