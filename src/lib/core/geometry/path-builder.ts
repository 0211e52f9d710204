/**
 * Builds closed contours from drawing calls (move, line, cubic, circular arc) in the document's
 * point-with-handles form. Circular arcs are split into pieces of at most 90° and each piece is a
 * cubic with handle length (4/3)·tan(θ/4)·r, which for a quarter circle is the classic
 * κ = 4(√2 − 1)/3 ≈ 0.5523 (radial error below 0.03 % of r; Riškus, ITC 2006).
 */
import type { Contour, Point } from '../design/schema';
import { splitCubic } from './bezier';
import { edgeCubic } from './contour-edges';
import { degToRad, type XY } from './vec';

/** Handle length of a quarter-circle cubic, relative to the radius. */
export const KAPPA = (4 / 3) * (Math.SQRT2 - 1);

const zero = (h: readonly [number, number] | undefined) => !h || (h[0] === 0 && h[1] === 0);

export class PathBuilder {
	private readonly points: Point[] = [];

	constructor(start: XY) {
		this.points.push({ x: start.x, y: start.y });
	}

	get current(): XY {
		return this.points[this.points.length - 1];
	}

	lineTo(p: XY): this {
		this.points.push({ x: p.x, y: p.y });
		return this;
	}

	/** Cubic to `to` with absolute control points c1, c2. */
	cubicTo(c1: XY, c2: XY, to: XY): this {
		const last = this.points[this.points.length - 1];
		last.out = [c1.x - last.x, c1.y - last.y];
		this.points.push({ x: to.x, y: to.y, in: [c2.x - to.x, c2.y - to.y] });
		return this;
	}

	/** Circular arc around `centre` from the current point, sweeping `sweep_deg` (positive = clockwise on screen). */
	arcAround(centre: XY, sweep_deg: number): this {
		const start = this.current;
		const r = Math.hypot(start.x - centre.x, start.y - centre.y);
		let angle = Math.atan2(start.y - centre.y, start.x - centre.x);
		const pieces = Math.max(1, Math.ceil(Math.abs(sweep_deg) / 90 - 1e-9));
		const step = degToRad(sweep_deg) / pieces;
		const h = (4 / 3) * Math.tan(step / 4) * r;
		for (let i = 0; i < pieces; i++) {
			const a0 = angle;
			const a1 = angle + step;
			const p0 = this.current;
			const p1 = { x: centre.x + r * Math.cos(a1), y: centre.y + r * Math.sin(a1) };
			this.cubicTo(
				{ x: p0.x - h * Math.sin(a0), y: p0.y + h * Math.cos(a0) },
				{ x: p1.x + h * Math.sin(a1), y: p1.y - h * Math.cos(a1) },
				p1
			);
			angle = a1;
		}
		return this;
	}

	/** Closes the contour; a last point equal to the first is merged into it. */
	close(): Contour {
		const pts = this.points.map((p) => ({ ...p }));
		const first = pts[0];
		const last = pts[pts.length - 1];
		if (pts.length > 1 && Math.hypot(first.x - last.x, first.y - last.y) < 1e-12) {
			if (last.in) first.in = last.in;
			pts.pop();
		}
		for (const p of pts) {
			if (zero(p.in)) delete p.in;
			if (zero(p.out)) delete p.out;
		}
		// A lens of two curved edges is a valid outline, but the document wants 3 points: split
		// curved edges at their middle (de Casteljau, the shape does not change).
		while (pts.length < 3 && pts.length >= 2) {
			const i = pts.findIndex((p, k) => p.out || pts[(k + 1) % pts.length].in);
			if (i < 0) break;
			splitEdgeInPlace(pts, i);
		}
		if (pts.length < 3) throw new RangeError('a closed contour needs at least 3 points');
		return pts;
	}
}

export const pathFrom = (start: XY): PathBuilder => new PathBuilder(start);

function splitEdgeInPlace(points: Point[], i: number): void {
	const j = (i + 1) % points.length;
	const [left, right] = splitCubic(edgeCubic(points, i), 0.5);
	const from = points[i];
	const to = points[j];
	from.out = [left[2] - from.x, left[3] - from.y];
	to.in = [right[4] - to.x, right[5] - to.y];
	const mid: Point = {
		x: left[6],
		y: left[7],
		in: [left[4] - left[6], left[5] - left[7]],
		out: [right[2] - left[6], right[3] - left[7]]
	};
	points.splice(i + 1, 0, mid);
}
