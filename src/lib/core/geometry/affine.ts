/**
 * 2-D affine transforms in the SVG/canvas convention: the tuple [a, b, c, d, e, f] maps (x, y) to
 * (a·x + c·y + e, b·x + d·y + f). Glass coordinates have y pointing down, so a positive rotation
 * angle turns clockwise as seen on screen. Bezier handles are vectors: they take only the linear
 * part (a, b, c, d).
 */
import type { Contour, Point } from '../design/schema';
import type { Shape } from './shape';
import { degToRad, type XY } from './vec';

export type Affine = readonly [a: number, b: number, c: number, d: number, e: number, f: number];

export const IDENTITY: Affine = [1, 0, 0, 1, 0, 0];

/** The transform that applies `first`, then `second`. */
export function composeAffine(first: Affine, second: Affine): Affine {
	const [a1, b1, c1, d1, e1, f1] = first;
	const [a2, b2, c2, d2, e2, f2] = second;
	return [
		a2 * a1 + c2 * b1,
		b2 * a1 + d2 * b1,
		a2 * c1 + c2 * d1,
		b2 * c1 + d2 * d1,
		a2 * e1 + c2 * f1 + e2,
		b2 * e1 + d2 * f1 + f2
	];
}

export const translation = (dx_mm: number, dy_mm: number): Affine => [1, 0, 0, 1, dx_mm, dy_mm];

/** Linear map `linear` (e = f = 0) applied about the fixed point `centre`. */
function about(linear: Affine, centre: XY): Affine {
	return composeAffine(
		composeAffine(translation(-centre.x, -centre.y), linear),
		translation(centre.x, centre.y)
	);
}

export function rotationAbout(options: { angle_deg: number; centre: XY }): Affine {
	const t = degToRad(options.angle_deg);
	// Exact values at quarter turns keep rotated rectangles exactly rectangular.
	const quarter = Math.round(options.angle_deg / 90);
	const exact = Math.abs(options.angle_deg - quarter * 90) < 1e-12;
	const cos = exact ? [1, 0, -1, 0][((quarter % 4) + 4) % 4] : Math.cos(t);
	const sin = exact ? [0, 1, 0, -1][((quarter % 4) + 4) % 4] : Math.sin(t);
	return about([cos, sin, -sin, cos, 0, 0], options.centre);
}

export function scalingAbout(options: { sx: number; sy: number; centre: XY }): Affine {
	return about([options.sx, 0, 0, options.sy, 0, 0], options.centre);
}

/** Horizontal flips left↔right across the vertical line x = centre.x; vertical flips top↔bottom. */
export function mirrorAbout(options: { direction: 'horizontal' | 'vertical'; centre: XY }): Affine {
	return options.direction === 'horizontal'
		? scalingAbout({ sx: -1, sy: 1, centre: options.centre })
		: scalingAbout({ sx: 1, sy: -1, centre: options.centre });
}

export function applyAffine(m: Affine, p: XY): XY {
	return { x: m[0] * p.x + m[2] * p.y + m[4], y: m[1] * p.x + m[3] * p.y + m[5] };
}

function applyToHandle(m: Affine, h: readonly [number, number]): [number, number] {
	return [m[0] * h[0] + m[2] * h[1], m[1] * h[0] + m[3] * h[1]];
}

export function transformPoint(m: Affine, p: Point): Point {
	const q = applyAffine(m, p);
	const out: Point = { x: q.x, y: q.y };
	if (p.in) out.in = applyToHandle(m, p.in);
	if (p.out) out.out = applyToHandle(m, p.out);
	return out;
}

export const transformContour = (m: Affine, contour: Contour): Contour =>
	contour.map((p) => transformPoint(m, p));

export function transformShape<S extends Shape>(m: Affine, shape: S): S {
	return {
		...shape,
		outline: transformContour(m, shape.outline),
		holes: shape.holes.map((h) => transformContour(m, h))
	};
}
