/**
 * Cubic Bezier kernels on a flat tuple [x0, y0, x1, y1, x2, y2, x3, y3] (absolute control
 * points). Evaluation is the Bernstein form; splitting is de Casteljau's construction, which
 * returns two cubics tracing exactly the same curve (Farin, "Curves and Surfaces for CAGD", §4.3).
 */
import type { XY } from './vec';

export type Cubic = readonly [number, number, number, number, number, number, number, number];

export function cubicPoint(c: Cubic, t: number): XY {
	const s = 1 - t;
	const b0 = s * s * s;
	const b1 = 3 * s * s * t;
	const b2 = 3 * s * t * t;
	const b3 = t * t * t;
	return {
		x: b0 * c[0] + b1 * c[2] + b2 * c[4] + b3 * c[6],
		y: b0 * c[1] + b1 * c[3] + b2 * c[5] + b3 * c[7]
	};
}

/** First derivative dP/dt. */
export function cubicTangent(c: Cubic, t: number): XY {
	const s = 1 - t;
	const k0 = 3 * s * s;
	const k1 = 6 * s * t;
	const k2 = 3 * t * t;
	return {
		x: k0 * (c[2] - c[0]) + k1 * (c[4] - c[2]) + k2 * (c[6] - c[4]),
		y: k0 * (c[3] - c[1]) + k1 * (c[5] - c[3]) + k2 * (c[7] - c[5])
	};
}

/** Second derivative d²P/dt². */
export function cubicCurvatureVector(c: Cubic, t: number): XY {
	const s = 1 - t;
	return {
		x: 6 * s * (c[4] - 2 * c[2] + c[0]) + 6 * t * (c[6] - 2 * c[4] + c[2]),
		y: 6 * s * (c[5] - 2 * c[3] + c[1]) + 6 * t * (c[7] - 2 * c[5] + c[3])
	};
}

/** de Casteljau split at t: [left, right], left ending and right starting at P(t). */
export function splitCubic(c: Cubic, t: number): [Cubic, Cubic] {
	const mix = (a: number, b: number) => a + (b - a) * t;
	const x01 = mix(c[0], c[2]),
		y01 = mix(c[1], c[3]);
	const x12 = mix(c[2], c[4]),
		y12 = mix(c[3], c[5]);
	const x23 = mix(c[4], c[6]),
		y23 = mix(c[5], c[7]);
	const xa = mix(x01, x12),
		ya = mix(y01, y12);
	const xb = mix(x12, x23),
		yb = mix(y12, y23);
	const xm = mix(xa, xb),
		ym = mix(ya, yb);
	return [
		[c[0], c[1], x01, y01, xa, ya, xm, ym],
		[xm, ym, xb, yb, x23, y23, c[6], c[7]]
	];
}

/** Roots in (0, 1) of a·t² + b·t + c = 0 (the derivative of one coordinate). */
function unitQuadraticRoots(a: number, b: number, c: number): number[] {
	const roots: number[] = [];
	if (Math.abs(a) < 1e-15) {
		if (Math.abs(b) > 1e-15) roots.push(-c / b);
	} else {
		const disc = b * b - 4 * a * c;
		if (disc >= 0) {
			const q = -0.5 * (b + Math.sign(b || 1) * Math.sqrt(disc));
			roots.push(q / a);
			if (q !== 0) roots.push(c / q);
		}
	}
	return roots.filter((t) => t > 0 && t < 1);
}

/** Parameters in (0, 1) where dx/dt = 0 or dy/dt = 0: the curve's axis-aligned extremes. */
export function cubicExtremaParameters(c: Cubic): number[] {
	const result: number[] = [];
	for (const k of [0, 1]) {
		const p0 = c[k],
			p1 = c[2 + k],
			p2 = c[4 + k],
			p3 = c[6 + k];
		const a = 3 * (-p0 + 3 * p1 - 3 * p2 + p3);
		const b = 6 * (p0 - 2 * p1 + p2);
		const cc = 3 * (p1 - p0);
		result.push(...unitQuadraticRoots(a, b, cc));
	}
	return result;
}
