/**
 * Exact axis-aligned bounds of Bezier contours (the curve itself, not its control points): each
 * cubic edge contributes its end points and the points where dx/dt or dy/dt vanishes. Used for
 * alignment, numeric entry of a selection's box and the spatial index.
 */
import type { Contour } from '../design/schema';
import { cubicExtremaParameters, cubicPoint } from './bezier';
import { EMPTY_BOUNDS, type Bounds } from './bounds';
import { edgeCubic, isStraightEdgeAt } from './contour-edges';
import { shapeContours, type Shape } from './shape';

function include(b: Bounds, x: number, y: number): void {
	if (x < b.minX) b.minX = x;
	if (y < b.minY) b.minY = y;
	if (x > b.maxX) b.maxX = x;
	if (y > b.maxY) b.maxY = y;
}

export function contourTightBounds(contour: Contour, into: Bounds = { ...EMPTY_BOUNDS }): Bounds {
	for (let i = 0; i < contour.length; i++) {
		include(into, contour[i].x, contour[i].y);
		if (isStraightEdgeAt(contour, i)) continue;
		const c = edgeCubic(contour, i);
		for (const t of cubicExtremaParameters(c)) {
			const q = cubicPoint(c, t);
			include(into, q.x, q.y);
		}
	}
	return into;
}

/** Bounds of several shapes' outlines (holes lie inside outlines). */
export function shapesTightBounds(shapes: readonly Shape[]): Bounds {
	const b = { ...EMPTY_BOUNDS };
	for (const s of shapes) contourTightBounds(s.outline, b);
	return b;
}

export function shapeTightBounds(shape: Shape): Bounds {
	const b = { ...EMPTY_BOUNDS };
	for (const c of shapeContours(shape)) contourTightBounds(c, b);
	return b;
}

export const isEmptyBounds = (b: Bounds): boolean => !(b.maxX >= b.minX && b.maxY >= b.minY);

export function boundsCentre(b: Bounds): { x: number; y: number } {
	return { x: (b.minX + b.maxX) / 2, y: (b.minY + b.maxY) / 2 };
}

export function boundsIntersect(a: Bounds, b: Bounds): boolean {
	return a.minX <= b.maxX && b.minX <= a.maxX && a.minY <= b.maxY && b.minY <= a.maxY;
}

export function expandBounds(b: Bounds, margin_mm: number): Bounds {
	return {
		minX: b.minX - margin_mm,
		minY: b.minY - margin_mm,
		maxX: b.maxX + margin_mm,
		maxY: b.maxY + margin_mm
	};
}
