/**
 * Half-planes and convex clipping. A half-plane keeps the points p with n·p ≥ c (n a unit normal).
 * Clipping a convex polygon by a half-plane is one pass of Sutherland–Hodgman (Sutherland &
 * Hodgman, "Reentrant polygon clipping", CACM 1974); the result stays convex.
 */
import { dot, type XY } from './vec';

export interface HalfPlane {
	readonly normal: XY;
	readonly offset: number;
}

/** The half-plane on the `normal` side of the line through `point`, shifted by `shift_mm` along the normal. */
export function halfPlaneThrough(options: { point: XY; normal: XY; shift_mm?: number }): HalfPlane {
	return {
		normal: options.normal,
		offset: dot(options.normal, options.point) + (options.shift_mm ?? 0)
	};
}

export const signedDistanceToHalfPlane = (plane: HalfPlane, p: XY): number =>
	dot(plane.normal, p) - plane.offset;

export function clipConvexPolygon(polygon: readonly XY[], plane: HalfPlane): XY[] {
	const out: XY[] = [];
	for (let i = 0; i < polygon.length; i++) {
		const a = polygon[i];
		const b = polygon[(i + 1) % polygon.length];
		const da = signedDistanceToHalfPlane(plane, a);
		const db = signedDistanceToHalfPlane(plane, b);
		if (da >= 0) out.push(a);
		if (da >= 0 !== db >= 0) {
			const t = da / (da - db);
			out.push({ x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t });
		}
	}
	return out;
}

/** Drops consecutive vertices closer than `epsilon_mm` (clipping through a vertex duplicates it). */
export function dropDuplicateVertices(polygon: readonly XY[], epsilon_mm = 1e-9): XY[] {
	const out: XY[] = [];
	for (const p of polygon) {
		const last = out[out.length - 1];
		if (!last || Math.hypot(p.x - last.x, p.y - last.y) > epsilon_mm) out.push(p);
	}
	while (
		out.length > 1 &&
		Math.hypot(out[0].x - out[out.length - 1].x, out[0].y - out[out.length - 1].y) <= epsilon_mm
	)
		out.pop();
	return out;
}

/** Intersection of the lines p + s·u and q + t·v, or null when parallel. */
export function intersectLines(options: { p: XY; u: XY; q: XY; v: XY }): XY | null {
	const { p, u, q, v } = options;
	const det = u.x * v.y - u.y * v.x;
	if (Math.abs(det) < 1e-15) return null;
	const s = ((q.x - p.x) * v.y - (q.y - p.y) * v.x) / det;
	return { x: p.x + u.x * s, y: p.y + u.y * s };
}
