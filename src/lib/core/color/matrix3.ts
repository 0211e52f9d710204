/*
 * 3×3 matrix kernels on row-major Float64Array(9), gl-matrix style: results go to `out`, which
 * may alias an input. Used for chromatic adaptation; no allocation inside the kernels (entries
 * are read by index: destructuring a typed array goes through its iterator and is slow).
 */
import type { Xyz } from './types';

export type Matrix3 = Float64Array;

/** A Matrix3 from three rows. */
export function matrix3FromRows(rows: readonly (readonly number[])[]): Matrix3 {
	if (rows.length !== 3 || rows.some((row) => row.length !== 3))
		throw new RangeError('A 3×3 matrix needs three rows of three numbers');
	return Float64Array.from(rows.flat());
}

/** out = a·b. */
export function multiplyMatrix3(out: Matrix3, a: Matrix3, b: Matrix3): Matrix3 {
	const a0 = a[0],
		a1 = a[1],
		a2 = a[2],
		a3 = a[3],
		a4 = a[4],
		a5 = a[5],
		a6 = a[6],
		a7 = a[7],
		a8 = a[8];
	const b0 = b[0],
		b1 = b[1],
		b2 = b[2],
		b3 = b[3],
		b4 = b[4],
		b5 = b[5],
		b6 = b[6],
		b7 = b[7],
		b8 = b[8];
	out[0] = a0 * b0 + a1 * b3 + a2 * b6;
	out[1] = a0 * b1 + a1 * b4 + a2 * b7;
	out[2] = a0 * b2 + a1 * b5 + a2 * b8;
	out[3] = a3 * b0 + a4 * b3 + a5 * b6;
	out[4] = a3 * b1 + a4 * b4 + a5 * b7;
	out[5] = a3 * b2 + a4 * b5 + a5 * b8;
	out[6] = a6 * b0 + a7 * b3 + a8 * b6;
	out[7] = a6 * b1 + a7 * b4 + a8 * b7;
	out[8] = a6 * b2 + a7 * b5 + a8 * b8;
	return out;
}

/** out = m⁻¹ (adjugate over determinant); throws for a singular matrix. */
export function invertMatrix3(out: Matrix3, m: Matrix3): Matrix3 {
	const m0 = m[0],
		m1 = m[1],
		m2 = m[2],
		m3 = m[3],
		m4 = m[4],
		m5 = m[5],
		m6 = m[6],
		m7 = m[7],
		m8 = m[8];
	const c0 = m4 * m8 - m5 * m7;
	const c3 = m5 * m6 - m3 * m8;
	const c6 = m3 * m7 - m4 * m6;
	const det = m0 * c0 + m1 * c3 + m2 * c6;
	if (det === 0 || !Number.isFinite(det)) throw new RangeError('Matrix is singular');
	out[0] = c0 / det;
	out[1] = (m2 * m7 - m1 * m8) / det;
	out[2] = (m1 * m5 - m2 * m4) / det;
	out[3] = c3 / det;
	out[4] = (m0 * m8 - m2 * m6) / det;
	out[5] = (m2 * m3 - m0 * m5) / det;
	out[6] = c6 / det;
	out[7] = (m1 * m6 - m0 * m7) / det;
	out[8] = (m0 * m4 - m1 * m3) / det;
	return out;
}

/** m·(X, Y, Z)ᵀ. */
export function transformXyz(m: Matrix3, xyz: Xyz): Xyz {
	const { X, Y, Z } = xyz;
	return {
		X: m[0] * X + m[1] * Y + m[2] * Z,
		Y: m[3] * X + m[4] * Y + m[5] * Z,
		Z: m[6] * X + m[7] * Y + m[8] * Z
	};
}
