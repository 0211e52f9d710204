/**
 * Minimum gap between two filled shapes in millimetres, for design rules (electrode spacing): 0
 * when they touch or overlap (an edge crossing, or a vertex of one inside the other's fill),
 * otherwise the smallest distance between their boundaries. Curves are flattened first, so the
 * result is accurate to the flattening tolerance (chords lie inside convex arcs). Segment pairs
 * whose bounding boxes are already farther apart than the best distance so far are skipped.
 */
import { EMPTY_BOUNDS, type Bounds } from './bounds';
import { flattenShape } from './flatten';
import { pointInRings } from './polygon';
import type { Shape } from './shape';

function ringBounds(ring: Float64Array): Bounds {
	const b = { ...EMPTY_BOUNDS };
	for (let i = 0; i < ring.length; i += 2) {
		b.minX = Math.min(b.minX, ring[i]);
		b.maxX = Math.max(b.maxX, ring[i]);
		b.minY = Math.min(b.minY, ring[i + 1]);
		b.maxY = Math.max(b.maxY, ring[i + 1]);
	}
	return b;
}

function pointSegment2(
	px: number,
	py: number,
	ax: number,
	ay: number,
	bx: number,
	by: number
): number {
	const dx = bx - ax;
	const dy = by - ay;
	const len2 = dx * dx + dy * dy;
	const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / len2));
	const x = ax + dx * t - px;
	const y = ay + dy * t - py;
	return x * x + y * y;
}

const orient = (ax: number, ay: number, bx: number, by: number, cx: number, cy: number) =>
	(bx - ax) * (cy - ay) - (by - ay) * (cx - ax);

/**
 * Relative size below which an orientation counts as zero: collinear edges (a slanted bar's edge
 * continuing in the next bar's) give orientations of rounding noise with either sign, which must
 * not read as a crossing.
 */
const COLLINEAR_EPS = 1e-9;

/** Squared distance between segments ab and cd (0 when they properly cross). */
function segmentSegment2(
	ax: number,
	ay: number,
	bx: number,
	by: number,
	cx: number,
	cy: number,
	dx: number,
	dy: number
): number {
	const eps = COLLINEAR_EPS * Math.hypot(bx - ax, by - ay) * Math.hypot(dx - cx, dy - cy);
	const d1 = orient(cx, cy, dx, dy, ax, ay);
	const d2 = orient(cx, cy, dx, dy, bx, by);
	const d3 = orient(ax, ay, bx, by, cx, cy);
	const d4 = orient(ax, ay, bx, by, dx, dy);
	const opposite = (p: number, q: number) => (p > eps && q < -eps) || (p < -eps && q > eps);
	// Touching and collinear overlaps are caught below: an endpoint then lies on the other segment.
	if (opposite(d1, d2) && opposite(d3, d4)) return 0;
	return Math.min(
		pointSegment2(ax, ay, cx, cy, dx, dy),
		pointSegment2(bx, by, cx, cy, dx, dy),
		pointSegment2(cx, cy, ax, ay, bx, by),
		pointSegment2(dx, dy, ax, ay, bx, by)
	);
}

function gapToBox2(minX: number, minY: number, maxX: number, maxY: number, b: Bounds): number {
	const gx = Math.max(0, minX - b.maxX, b.minX - maxX);
	const gy = Math.max(0, minY - b.maxY, b.minY - maxY);
	return gx * gx + gy * gy;
}

function ringToRing2(a: Float64Array, b: Float64Array, boundsB: Bounds, best2: number): number {
	const na = a.length;
	const nb = b.length;
	for (let i = 0; i < na; i += 2) {
		const ax = a[i],
			ay = a[i + 1],
			bx = a[(i + 2) % na],
			by = a[(i + 3) % na];
		const sMinX = Math.min(ax, bx),
			sMaxX = Math.max(ax, bx),
			sMinY = Math.min(ay, by),
			sMaxY = Math.max(ay, by);
		if (gapToBox2(sMinX, sMinY, sMaxX, sMaxY, boundsB) >= best2) continue;
		for (let j = 0; j < nb; j += 2) {
			const cx = b[j],
				cy = b[j + 1],
				dx = b[(j + 2) % nb],
				dy = b[(j + 3) % nb];
			const gx = Math.max(0, sMinX - Math.max(cx, dx), Math.min(cx, dx) - sMaxX);
			const gy = Math.max(0, sMinY - Math.max(cy, dy), Math.min(cy, dy) - sMaxY);
			if (gx * gx + gy * gy >= best2) continue;
			const d2 = segmentSegment2(ax, ay, bx, by, cx, cy, dx, dy);
			if (d2 < best2) {
				best2 = d2;
				if (best2 === 0) return 0;
			}
		}
	}
	return best2;
}

/** Flattened rings, outline first. */
export function minimumGapBetweenRings(
	a: readonly Float64Array[],
	b: readonly Float64Array[]
): number {
	if (pointInRings(b, { x: a[0][0], y: a[0][1] }) || pointInRings(a, { x: b[0][0], y: b[0][1] }))
		return 0;
	let best2 = Infinity;
	const boundsA = a.map(ringBounds);
	const boundsB = b.map(ringBounds);
	a.forEach((ra, i) => {
		b.forEach((rb, j) => {
			const ba = boundsA[i];
			if (gapToBox2(ba.minX, ba.minY, ba.maxX, ba.maxY, boundsB[j]) < best2)
				best2 = ringToRing2(ra, rb, boundsB[j], best2);
		});
	});
	return Math.sqrt(best2);
}

export function minimumGap(a: Shape, b: Shape, options: { tolerance_um?: number } = {}): number {
	return minimumGapBetweenRings(flattenShape(a, options), flattenShape(b, options));
}
