/**
 * 2×2 complex matrix kernels for Jones calculus (Jones, JOSA 31:488, 1941).
 *
 * Storage: a Jones matrix [[a, b], [c, d]] is a Float64Array(8), row-major, re/im interleaved:
 *   [a_re, a_im, b_re, b_im, c_re, c_im, d_re, d_im].
 * A Jones vector (E_x, E_y) is a Float64Array(4): [x_re, x_im, y_re, y_im].
 * Every kernel writes into `out` and returns it; all read their inputs into locals before
 * writing, so `out` may alias any input. None allocates.
 *
 * Conventions (shared by the whole optics folder, see README.md):
 * - time dependence e^{+iωt}, plane wave e^{i(ωt − kz)} (as in Yeh & Gu, Optics of Liquid
 *   Crystal Displays, 1999 — from memory), so a phase delay n·k0·d is the factor e^{−i·n·k0·d};
 * - rotation R(ψ) = [[cos ψ, sin ψ], [−sin ψ, cos ψ]] gives the components in axes turned by
 *   the azimuth ψ (measured from lab x toward lab y); an element whose axis lies at azimuth ψ
 *   has the lab matrix R(−ψ)·M_local·R(ψ).
 */

export const JONES_MATRIX_LENGTH = 8;
export const JONES_VECTOR_LENGTH = 4;

/** A new identity matrix. */
export function createMatrix(): Float64Array {
	return identity(new Float64Array(JONES_MATRIX_LENGTH));
}

/** A new zero vector. */
export function createVector(): Float64Array {
	return new Float64Array(JONES_VECTOR_LENGTH);
}

export function identity(out: Float64Array): Float64Array {
	out.fill(0);
	out[0] = 1;
	out[6] = 1;
	return out;
}

export function copy(out: Float64Array, a: Float64Array): Float64Array {
	for (let i = 0; i < JONES_MATRIX_LENGTH; i++) out[i] = a[i];
	return out;
}

/** out = a·b (matrix product), alias-safe. */
export function multiply(out: Float64Array, a: Float64Array, b: Float64Array): Float64Array {
	const a0 = a[0],
		a1 = a[1],
		a2 = a[2],
		a3 = a[3],
		a4 = a[4],
		a5 = a[5],
		a6 = a[6],
		a7 = a[7];
	const b0 = b[0],
		b1 = b[1],
		b2 = b[2],
		b3 = b[3],
		b4 = b[4],
		b5 = b[5],
		b6 = b[6],
		b7 = b[7];
	out[0] = a0 * b0 - a1 * b1 + a2 * b4 - a3 * b5;
	out[1] = a0 * b1 + a1 * b0 + a2 * b5 + a3 * b4;
	out[2] = a0 * b2 - a1 * b3 + a2 * b6 - a3 * b7;
	out[3] = a0 * b3 + a1 * b2 + a2 * b7 + a3 * b6;
	out[4] = a4 * b0 - a5 * b1 + a6 * b4 - a7 * b5;
	out[5] = a4 * b1 + a5 * b0 + a6 * b5 + a7 * b4;
	out[6] = a4 * b2 - a5 * b3 + a6 * b6 - a7 * b7;
	out[7] = a4 * b3 + a5 * b2 + a6 * b7 + a7 * b6;
	return out;
}

/** out = R(ψ) = [[cos ψ, sin ψ], [−sin ψ, cos ψ]]. */
export function rotation(out: Float64Array, psi_rad: number): Float64Array {
	const c = Math.cos(psi_rad);
	const s = Math.sin(psi_rad);
	out.fill(0);
	out[0] = c;
	out[2] = s;
	out[4] = -s;
	out[6] = c;
	return out;
}

/** out = diag(e^{−iΓ/2}, e^{+iΓ/2}): a retarder with its slow axis along the first coordinate. */
export function diagonalRetarder(out: Float64Array, retardation_rad: number): Float64Array {
	const c = Math.cos(retardation_rad / 2);
	const s = Math.sin(retardation_rad / 2);
	out.fill(0);
	out[0] = c;
	out[1] = -s;
	out[6] = c;
	out[7] = s;
	return out;
}

/** out = diag(tx, ty) with real amplitude factors. */
export function diagonalReal(out: Float64Array, tx: number, ty: number): Float64Array {
	out.fill(0);
	out[0] = tx;
	out[6] = ty;
	return out;
}

/** out = mᵀ (plain transpose, no conjugation), alias-safe. */
export function transpose(out: Float64Array, m: Float64Array): Float64Array {
	const b0 = m[2],
		b1 = m[3],
		c0 = m[4],
		c1 = m[5];
	out[0] = m[0];
	out[1] = m[1];
	out[2] = c0;
	out[3] = c1;
	out[4] = b0;
	out[5] = b1;
	out[6] = m[6];
	out[7] = m[7];
	return out;
}

/** det m = ad − bc, written as [re, im] into out (length ≥ 2). */
export function determinant(out: Float64Array, m: Float64Array): Float64Array {
	const re = m[0] * m[6] - m[1] * m[7] - (m[2] * m[4] - m[3] * m[5]);
	const im = m[0] * m[7] + m[1] * m[6] - (m[2] * m[5] + m[3] * m[4]);
	out[0] = re;
	out[1] = im;
	return out;
}

/** out = m·v for a Jones vector v, alias-safe. */
export function applyToVector(out: Float64Array, m: Float64Array, v: Float64Array): Float64Array {
	const x0 = v[0],
		x1 = v[1],
		y0 = v[2],
		y1 = v[3];
	out[0] = m[0] * x0 - m[1] * x1 + m[2] * y0 - m[3] * y1;
	out[1] = m[0] * x1 + m[1] * x0 + m[2] * y1 + m[3] * y0;
	out[2] = m[4] * x0 - m[5] * x1 + m[6] * y0 - m[7] * y1;
	out[3] = m[4] * x1 + m[5] * x0 + m[6] * y1 + m[7] * y0;
	return out;
}

/** Σ|m_ij|², the squared Frobenius norm. */
export function frobeniusNormSquared(m: Float64Array): number {
	let sum = 0;
	for (let i = 0; i < JONES_MATRIX_LENGTH; i++) sum += m[i] * m[i];
	return sum;
}

/** |E_x|² + |E_y|² of a Jones vector. */
export function vectorIntensity(v: Float64Array): number {
	return v[0] * v[0] + v[1] * v[1] + v[2] * v[2] + v[3] * v[3];
}
