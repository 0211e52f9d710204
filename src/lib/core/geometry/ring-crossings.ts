/**
 * Self-crossing detection for one ring, exact on the 10 nm integer grid of `polygon-clipper.ts`.
 * Two edges that are not neighbours cross when they share any point (proper crossing, a vertex on
 * the other edge, or a collinear overlap); neighbours cross when they fold back over each other.
 * Orientation tests use integer cross products (|Δ| < 2²⁶ on both axes keeps them exact in doubles,
 * i.e. rings within ±335 mm; larger rings are still checked, with rounding possible at the limit).
 * Edges are swept in order of their left end, so typical rings cost O(n log n + k).
 */
import { CLIP_UNITS_PER_mm, regionToIntPaths } from './polygon-clipper';
import type { XY } from './vec';

const orient = (ax: number, ay: number, bx: number, by: number, cx: number, cy: number) =>
	Math.sign((bx - ax) * (cy - ay) - (by - ay) * (cx - ax));

const onSegment = (ax: number, ay: number, bx: number, by: number, px: number, py: number) =>
	Math.min(ax, bx) <= px &&
	px <= Math.max(ax, bx) &&
	Math.min(ay, by) <= py &&
	py <= Math.max(ay, by);

function segmentsMeet(p: number[], q: number[]): boolean {
	const [ax, ay, bx, by] = p;
	const [cx, cy, dx, dy] = q;
	const o1 = orient(ax, ay, bx, by, cx, cy);
	const o2 = orient(ax, ay, bx, by, dx, dy);
	const o3 = orient(cx, cy, dx, dy, ax, ay);
	const o4 = orient(cx, cy, dx, dy, bx, by);
	if (o1 * o2 < 0 && o3 * o4 < 0) return true;
	if (o1 === 0 && onSegment(ax, ay, bx, by, cx, cy)) return true;
	if (o2 === 0 && onSegment(ax, ay, bx, by, dx, dy)) return true;
	if (o3 === 0 && onSegment(cx, cy, dx, dy, ax, ay)) return true;
	return o4 === 0 && onSegment(cx, cy, dx, dy, bx, by);
}

/** Neighbouring edges a→b, b→c fold back when c lies on the line a→b and the path turns back. */
function foldsBack(
	ax: number,
	ay: number,
	bx: number,
	by: number,
	cx: number,
	cy: number
): boolean {
	if (orient(ax, ay, bx, by, cx, cy) !== 0) return false;
	return (bx - ax) * (cx - bx) + (by - ay) * (cy - by) < 0;
}

/**
 * Points (mm) where a ring touches or crosses itself, at most `limit` (default 16) of them; an
 * empty list means the ring is simple. Rings with fewer than 3 distinct points return [].
 */
export function ringSelfCrossings(ring: Float64Array, options: { limit?: number } = {}): XY[] {
	const limit = options.limit ?? 16;
	const path = regionToIntPaths([ring])[0];
	const n = path.length;
	if (n < 3) return [];
	const edges = path.map((p, i) => {
		const q = path[(i + 1) % n];
		return [p.X, p.Y, q.X, q.Y];
	});
	const found: XY[] = [];
	const at = (x: number, y: number) => ({ x: x / CLIP_UNITS_PER_mm, y: y / CLIP_UNITS_PER_mm });
	for (let i = 0; i < n && found.length < limit; i++) {
		const e = edges[i];
		const f = edges[(i + 1) % n];
		if (foldsBack(e[0], e[1], e[2], e[3], f[2], f[3])) found.push(at(e[2], e[3]));
	}
	const left = edges.map((e) => Math.min(e[0], e[2]));
	const order = edges.map((_, i) => i).sort((i, j) => left[i] - left[j]);
	let active: number[] = [];
	for (const i of order) {
		const e = edges[i];
		active = active.filter((j) => Math.max(edges[j][0], edges[j][2]) >= left[i]);
		for (const j of active) {
			if (found.length >= limit) return found;
			if ((i + 1) % n === j || (j + 1) % n === i) continue;
			const f = edges[j];
			if (Math.max(e[1], e[3]) < Math.min(f[1], f[3])) continue;
			if (Math.max(f[1], f[3]) < Math.min(e[1], e[3])) continue;
			if (segmentsMeet(e, f)) found.push(crossingPoint(e, f, at));
		}
		active.push(i);
	}
	return found;
}

function crossingPoint(e: number[], f: number[], at: (x: number, y: number) => XY): XY {
	const rx = e[2] - e[0],
		ry = e[3] - e[1],
		sx = f[2] - f[0],
		sy = f[3] - f[1];
	const denom = rx * sy - ry * sx;
	if (denom === 0) return at(f[0], f[1]); // collinear overlap: report where the other edge starts
	const t = ((f[0] - e[0]) * sy - (f[1] - e[1]) * sx) / denom;
	return at(e[0] + t * rx, e[1] + t * ry);
}
