/**
 * Flat-ring kernels for the glass drawing: rings are Float64Array [x0, y0, x1, y1, …] in
 * millimetres, closed implicitly, as `geometry/flatten.ts` produces them.
 *
 * - Outward offset by a mitred parallel shift of every edge (the classic polygon offset; a mitre
 *   longer than twice the offset is bevelled, so sharp corners do not spike). Valid while the
 *   offset is smaller than half the narrowest notch of the ring; the glass check reports rings that
 *   come out self-crossing.
 * - Area of a ring inside a convex polygon by Sutherland–Hodgman clipping (Sutherland & Hodgman,
 *   CACM 1974): exact for any simple subject ring against a convex clip window.
 */
import { EMPTY_BOUNDS, type Bounds } from '../geometry/bounds';
import { clipConvexPolygon, type HalfPlane } from '../geometry/half-plane';
import { signedArea } from '../geometry/polygon';
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

function offsetWithSign(ring: Float64Array, offset_mm: number, sign: number): Float64Array {
	const n = ring.length / 2;
	const out: number[] = [];
	for (let i = 0; i < n; i++) {
		const p = (i + n - 1) % n,
			q = (i + 1) % n;
		const x = ring[2 * i],
			y = ring[2 * i + 1];
		let d1x = x - ring[2 * p],
			d1y = y - ring[2 * p + 1];
		let d2x = ring[2 * q] - x,
			d2y = ring[2 * q + 1] - y;
		const l1 = Math.hypot(d1x, d1y) || 1,
			l2 = Math.hypot(d2x, d2y) || 1;
		d1x /= l1;
		d1y /= l1;
		d2x /= l2;
		d2y /= l2;
		const n1x = d1y * sign,
			n1y = -d1x * sign,
			n2x = d2y * sign,
			n2y = -d2x * sign;
		const cos = n1x * n2x + n1y * n2y;
		const k = offset_mm / (1 + cos);
		if (1 + cos > 0.5) out.push(x + (n1x + n2x) * k, y + (n1y + n2y) * k);
		else
			out.push(x + n1x * offset_mm, y + n1y * offset_mm, x + n2x * offset_mm, y + n2y * offset_mm);
	}
	return Float64Array.from(out);
}

/** The ring moved outwards by `offset_mm` (inwards when negative), whatever its winding. */
export function offsetRing(ring: Float64Array, offset_mm: number): Float64Array {
	if (offset_mm === 0) return ring;
	const sign = signedArea(ring) > 0 ? 1 : -1;
	return offsetWithSign(ring, offset_mm, sign);
}

export function ringToPoints(ring: Float64Array): XY[] {
	const out: XY[] = [];
	for (let i = 0; i < ring.length; i += 2) out.push({ x: ring[i], y: ring[i + 1] });
	return out;
}

/** Half-planes of a convex ring (either winding), each keeping the inside. */
export function convexHalfPlanes(ring: Float64Array): HalfPlane[] {
	const sign = signedArea(ring) > 0 ? 1 : -1;
	const planes: HalfPlane[] = [];
	const n = ring.length / 2;
	for (let i = 0; i < n; i++) {
		const ax = ring[2 * i],
			ay = ring[2 * i + 1];
		const bx = ring[(2 * i + 2) % ring.length],
			by = ring[(2 * i + 3) % ring.length];
		const len = Math.hypot(bx - ax, by - ay);
		if (len === 0) continue;
		const normal = { x: (-(by - ay) / len) * sign, y: ((bx - ax) / len) * sign };
		planes.push({ normal, offset: normal.x * ax + normal.y * ay });
	}
	return planes;
}

/** The part of `subject` inside the convex ring `window`, as a polygon (may be empty). */
export function clipToConvex(subject: Float64Array, window: Float64Array): XY[] {
	let poly = ringToPoints(subject);
	for (const plane of convexHalfPlanes(window)) {
		if (poly.length === 0) break;
		poly = clipConvexPolygon(poly, plane);
	}
	return poly;
}

export function polygonArea(poly: readonly XY[]): number {
	let sum = 0;
	for (let i = 0; i < poly.length; i++) {
		const a = poly[i],
			b = poly[(i + 1) % poly.length];
		sum += a.x * b.y - b.x * a.y;
	}
	return Math.abs(sum) / 2;
}

export function polygonCentroid(poly: readonly XY[]): XY {
	let cx = 0,
		cy = 0;
	for (const p of poly) {
		cx += p.x;
		cy += p.y;
	}
	return { x: cx / Math.max(1, poly.length), y: cy / Math.max(1, poly.length) };
}
