/**
 * Flattening of Bezier contours to closed polylines by adaptive de Casteljau subdivision: a piece
 * is accepted when both inner control points lie within the tolerance of its chord, which bounds
 * the distance of the curve from the chord (the curve lies in the control polygon's convex hull).
 * Output is a flat Float64Array [x0, y0, x1, y1, …] in millimetres without the closing repeat.
 * The tolerance is in micrometres.
 */
import type { Contour } from '../design/schema';
import { splitCubic, type Cubic } from './bezier';
import { edgeCubic, isStraightEdgeAt } from './contour-edges';
import { shapeContours, type Shape } from './shape';

export const DEFAULT_FLATTEN_TOLERANCE_um = 1;
const MAX_DEPTH = 18;

function distanceToChord(c: Cubic, px: number, py: number): number {
	const dx = c[6] - c[0];
	const dy = c[7] - c[1];
	const chord = Math.hypot(dx, dy);
	if (chord < 1e-15) return Math.hypot(px - c[0], py - c[1]);
	return Math.abs((px - c[0]) * dy - (py - c[1]) * dx) / chord;
}

function pushCubic(c: Cubic, tolerance_mm: number, depth: number, out: number[]): void {
	const flat = Math.max(distanceToChord(c, c[2], c[3]), distanceToChord(c, c[4], c[5]));
	if (flat <= tolerance_mm || depth >= MAX_DEPTH) {
		out.push(c[6], c[7]);
		return;
	}
	const [left, right] = splitCubic(c, 0.5);
	pushCubic(left, tolerance_mm, depth + 1, out);
	pushCubic(right, tolerance_mm, depth + 1, out);
}

export function flattenContour(
	contour: Contour,
	options: { tolerance_um?: number } = {}
): Float64Array {
	const tolerance_mm = (options.tolerance_um ?? DEFAULT_FLATTEN_TOLERANCE_um) / 1000;
	const n = contour.length;
	const out: number[] = [contour[0].x, contour[0].y];
	for (let i = 0; i < n; i++) {
		if (isStraightEdgeAt(contour, i)) {
			const to = contour[(i + 1) % n];
			out.push(to.x, to.y);
		} else {
			pushCubic(edgeCubic(contour, i), tolerance_mm, 0, out);
		}
	}
	out.length -= 2; // the last edge ends where the polyline started
	return Float64Array.from(out);
}

export function flattenShape(
	shape: Shape,
	options: { tolerance_um?: number } = {}
): Float64Array[] {
	return shapeContours(shape).map((c) => flattenContour(c, options));
}
