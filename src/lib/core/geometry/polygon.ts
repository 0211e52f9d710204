/**
 * Polygon kernels on flat polylines [x0, y0, x1, y1, …] (closed implicitly). Signed area is the
 * shoelace sum ½·Σ(xᵢ·yᵢ₊₁ − xᵢ₊₁·yᵢ); with y pointing down on the glass a positive area means the
 * ring runs clockwise as seen on screen. Point-in-polygon is the even-odd crossing test, so a point
 * inside an outline and inside one of its holes is outside the shape. The centre of area is the
 * shoelace-weighted vertex sum, C = Σ(pᵢ + pᵢ₊₁)(xᵢyᵢ₊₁ − xᵢ₊₁yᵢ) / (6·A) (standard polygon
 * centroid formula).
 */
import { flattenShape } from './flatten';
import type { Shape } from './shape';
import type { XY } from './vec';

export function signedArea(ring: Float64Array): number {
	const n = ring.length;
	let sum = 0;
	for (let i = 0; i < n; i += 2) {
		const j = (i + 2) % n;
		sum += ring[i] * ring[j + 1] - ring[j] * ring[i + 1];
	}
	return sum / 2;
}

/** Centre of area of a simple ring (either winding); the mean vertex when it has no area. */
export function ringCentroid(ring: Float64Array): XY {
	const n = ring.length;
	let a = 0,
		cx = 0,
		cy = 0;
	for (let i = 0; i < n; i += 2) {
		const j = (i + 2) % n;
		const cross = ring[i] * ring[j + 1] - ring[j] * ring[i + 1];
		a += cross;
		cx += (ring[i] + ring[j]) * cross;
		cy += (ring[i + 1] + ring[j + 1]) * cross;
	}
	if (a !== 0) return { x: cx / (3 * a), y: cy / (3 * a) };
	let sx = 0,
		sy = 0;
	for (let i = 0; i < n; i += 2) {
		sx += ring[i];
		sy += ring[i + 1];
	}
	return { x: sx / Math.max(1, n / 2), y: sy / Math.max(1, n / 2) };
}

/** Filled area of outline minus holes, in mm² (holes assumed inside the outline and disjoint). */
export function shapeArea(shape: Shape, options: { tolerance_um?: number } = {}): number {
	const [outline, ...holes] = flattenShape(shape, options);
	return Math.abs(signedArea(outline)) - holes.reduce((sum, h) => sum + Math.abs(signedArea(h)), 0);
}

/** Even-odd crossing test against one ring; points exactly on an edge may fall either way. */
export function pointInRing(ring: Float64Array, p: XY): boolean {
	let inside = false;
	const n = ring.length;
	for (let i = 0, j = n - 2; i < n; j = i, i += 2) {
		const xi = ring[i],
			yi = ring[i + 1],
			xj = ring[j],
			yj = ring[j + 1];
		if (yi > p.y !== yj > p.y && p.x < ((xj - xi) * (p.y - yi)) / (yj - yi) + xi) inside = !inside;
	}
	return inside;
}

/** Even-odd test over all rings of a flattened shape (outline and holes). */
export function pointInRings(rings: readonly Float64Array[], p: XY): boolean {
	let inside = false;
	for (const ring of rings) if (pointInRing(ring, p)) inside = !inside;
	return inside;
}

export function pointInShape(
	shape: Shape,
	p: XY,
	options: { tolerance_um?: number } = {}
): boolean {
	return pointInRings(flattenShape(shape, options), p);
}
