/**
 * Euclidean distances in millimetres: point to segment (clamped orthogonal projection), segment to
 * segment (zero when they cross), nearest point on a polyline, and nearest point on a Bezier
 * contour (coarse sampling per edge, golden-section search on the squared distance, then Newton
 * steps on its derivative (B(t) − p)·B'(t) = 0 for full double precision).
 */
import type { Contour } from '../design/schema';
import { cubicCurvatureVector, cubicPoint, cubicTangent, type Cubic } from './bezier';
import { edgeCubic } from './contour-edges';
import type { XY } from './vec';

export interface Segment2 {
	readonly a: XY;
	readonly b: XY;
}

/** The closest point of segment ab to p, with its parameter t in [0, 1] and the distance. */
export function nearestOnSegment(
	p: XY,
	segment: Segment2
): { x: number; y: number; t: number; distance: number } {
	const { a, b } = segment;
	const dx = b.x - a.x;
	const dy = b.y - a.y;
	const len2 = dx * dx + dy * dy;
	const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
	const x = a.x + dx * t;
	const y = a.y + dy * t;
	return { x, y, t, distance: Math.hypot(p.x - x, p.y - y) };
}

export const distancePointToSegment = (p: XY, segment: Segment2): number =>
	nearestOnSegment(p, segment).distance;

const orient = (a: XY, b: XY, c: XY) => (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x);

/** Proper crossing; orientations within rounding noise of zero (collinear edges) do not count. */
export function segmentsCross(s: Segment2, t: Segment2): boolean {
	const eps =
		1e-9 * Math.hypot(s.b.x - s.a.x, s.b.y - s.a.y) * Math.hypot(t.b.x - t.a.x, t.b.y - t.a.y);
	const opposite = (p: number, q: number) => (p > eps && q < -eps) || (p < -eps && q > eps);
	return (
		opposite(orient(t.a, t.b, s.a), orient(t.a, t.b, s.b)) &&
		opposite(orient(s.a, s.b, t.a), orient(s.a, s.b, t.b))
	);
}

export function distanceSegmentToSegment(s: Segment2, t: Segment2): number {
	if (segmentsCross(s, t)) return 0;
	return Math.min(
		distancePointToSegment(s.a, t),
		distancePointToSegment(s.b, t),
		distancePointToSegment(t.a, s),
		distancePointToSegment(t.b, s)
	);
}

/** Nearest point on a closed flat polyline; `segment` is the index of the edge (i → i + 1). */
export function nearestOnRing(
	ring: Float64Array,
	p: XY
): { x: number; y: number; distance: number; segment: number } {
	let best = { x: NaN, y: NaN, distance: Infinity, segment: -1 };
	const n = ring.length / 2;
	for (let i = 0; i < n; i++) {
		const j = (i + 1) % n;
		const hit = nearestOnSegment(p, {
			a: { x: ring[2 * i], y: ring[2 * i + 1] },
			b: { x: ring[2 * j], y: ring[2 * j + 1] }
		});
		if (hit.distance < best.distance)
			best = { x: hit.x, y: hit.y, distance: hit.distance, segment: i };
	}
	return best;
}

export interface ContourHit {
	x: number;
	y: number;
	distance_mm: number;
	/** Edge from point `edgeIndex` to the next point. */
	edgeIndex: number;
	/** Bezier parameter along that edge, in [0, 1]. */
	t: number;
}

const SAMPLES_PER_EDGE = 24;
const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** Newton steps on (B(t) − p)·B'(t) = 0, kept inside the bracket [lo, hi]. */
function newtonRefine(c: Cubic, p: XY, bracket: { lo: number; hi: number; start: number }): number {
	let t = bracket.start;
	for (let k = 0; k < 4; k++) {
		const q = cubicPoint(c, t);
		const d1 = cubicTangent(c, t);
		const dd = cubicCurvatureVector(c, t);
		const g = (q.x - p.x) * d1.x + (q.y - p.y) * d1.y;
		const h = d1.x * d1.x + d1.y * d1.y + (q.x - p.x) * dd.x + (q.y - p.y) * dd.y;
		if (!(h > 0)) break;
		t = Math.min(bracket.hi, Math.max(bracket.lo, t - g / h));
	}
	return t;
}

/** The point of a Bezier contour nearest to p (exact for straight edges, ~1e-12 mm for curves). */
export function nearestPointOnContour(contour: Contour, p: XY): ContourHit {
	let best: ContourHit = { x: NaN, y: NaN, distance_mm: Infinity, edgeIndex: -1, t: 0 };
	for (let i = 0; i < contour.length; i++) {
		const c = edgeCubic(contour, i);
		const d2 = (t: number) => {
			const q = cubicPoint(c, t);
			return (q.x - p.x) ** 2 + (q.y - p.y) ** 2;
		};
		let bestK = 0;
		for (let k = 1; k <= SAMPLES_PER_EDGE; k++)
			if (d2(k / SAMPLES_PER_EDGE) < d2(bestK / SAMPLES_PER_EDGE)) bestK = k;
		const bracketLo = Math.max(0, (bestK - 1) / SAMPLES_PER_EDGE);
		const bracketHi = Math.min(1, (bestK + 1) / SAMPLES_PER_EDGE);
		let [lo, hi] = [bracketLo, bracketHi];
		for (let iter = 0; iter < 80 && hi - lo > 1e-14; iter++) {
			const m1 = hi - GOLDEN * (hi - lo);
			const m2 = lo + GOLDEN * (hi - lo);
			if (d2(m1) < d2(m2)) hi = m2;
			else lo = m1;
		}
		const golden = (lo + hi) / 2;
		const newton = newtonRefine(c, p, { lo: bracketLo, hi: bracketHi, start: golden });
		const t = d2(newton) <= d2(golden) + 1e-24 ? newton : golden;
		const q = cubicPoint(c, t);
		const distance_mm = Math.hypot(q.x - p.x, q.y - p.y);
		if (distance_mm < best.distance_mm) best = { x: q.x, y: q.y, distance_mm, edgeIndex: i, t };
	}
	return best;
}
