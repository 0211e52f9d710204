/**
 * Symmetric block-tridiagonal systems with 2×2 blocks: block LDLᵀ factorisation and solve.
 *
 * Method: block Thomas algorithm (block Gaussian elimination without pivoting), valid and stable
 * for symmetric positive-definite matrices; a non-positive pivot block is reported, which is how
 * the Newton solver detects an indefinite Hessian. Blocks are row-major [a00, a01, a10, a11];
 * diag holds n blocks, upper holds n−1 blocks (row block k, column block k+1); the lower blocks
 * are the transposes of the upper ones. No allocation.
 */

/** Relative size below which a pivot determinant counts as singular. */
const PIVOT_TOLERANCE = 1e-13;

/**
 * Factor A + shift·I into inverse Schur blocks. Returns false if A + shift·I is not positive
 * definite (some Schur block has a non-positive pivot).
 */
export function factorBlockTridiagonal(options: {
	schurInverse: Float64Array;
	diag: Float64Array;
	upper: Float64Array;
	blocks: number;
	shift: number;
}): boolean {
	const { schurInverse: inv, diag, upper, blocks, shift } = options;
	for (let k = 0; k < blocks; k++) {
		let s00 = diag[4 * k] + shift;
		let s01 = diag[4 * k + 1];
		let s10 = diag[4 * k + 2];
		let s11 = diag[4 * k + 3] + shift;
		if (k > 0) {
			// S_k −= U_{k−1}ᵀ · S_{k−1}⁻¹ · U_{k−1}
			const p = 4 * (k - 1);
			const u00 = upper[p];
			const u01 = upper[p + 1];
			const u10 = upper[p + 2];
			const u11 = upper[p + 3];
			const m00 = inv[p] * u00 + inv[p + 1] * u10;
			const m01 = inv[p] * u01 + inv[p + 1] * u11;
			const m10 = inv[p + 2] * u00 + inv[p + 3] * u10;
			const m11 = inv[p + 2] * u01 + inv[p + 3] * u11;
			s00 -= u00 * m00 + u10 * m10;
			s01 -= u00 * m01 + u10 * m11;
			s10 -= u01 * m00 + u11 * m10;
			s11 -= u01 * m01 + u11 * m11;
		}
		const det = s00 * s11 - s01 * s10;
		if (!(s00 > 0 && s11 > 0 && det > PIVOT_TOLERANCE * s00 * s11)) return false;
		const q = 4 * k;
		inv[q] = s11 / det;
		inv[q + 1] = -s01 / det;
		inv[q + 2] = -s10 / det;
		inv[q + 3] = s00 / det;
	}
	return true;
}

/** Solve (A + shift·I)·out = rhs with the factors of factorBlockTridiagonal; out may alias rhs. */
export function solveBlockTridiagonal(options: {
	out: Float64Array;
	schurInverse: Float64Array;
	upper: Float64Array;
	rhs: Float64Array;
	blocks: number;
}): void {
	const { out, schurInverse: inv, upper, rhs, blocks } = options;
	// Forward: z_k = r_k − U_{k−1}ᵀ S_{k−1}⁻¹ z_{k−1}, stored in out.
	let prev0 = 0;
	let prev1 = 0;
	for (let k = 0; k < blocks; k++) {
		let z0 = rhs[2 * k];
		let z1 = rhs[2 * k + 1];
		if (k > 0) {
			const p = 4 * (k - 1);
			const w0 = inv[p] * prev0 + inv[p + 1] * prev1;
			const w1 = inv[p + 2] * prev0 + inv[p + 3] * prev1;
			z0 -= upper[p] * w0 + upper[p + 2] * w1;
			z1 -= upper[p + 1] * w0 + upper[p + 3] * w1;
		}
		out[2 * k] = z0;
		out[2 * k + 1] = z1;
		prev0 = z0;
		prev1 = z1;
	}
	// Back: x_k = S_k⁻¹ (z_k − U_k x_{k+1}).
	let next0 = 0;
	let next1 = 0;
	for (let k = blocks - 1; k >= 0; k--) {
		let r0 = out[2 * k];
		let r1 = out[2 * k + 1];
		if (k < blocks - 1) {
			const p = 4 * k;
			r0 -= upper[p] * next0 + upper[p + 1] * next1;
			r1 -= upper[p + 2] * next0 + upper[p + 3] * next1;
		}
		const q = 4 * k;
		const x0 = inv[q] * r0 + inv[q + 1] * r1;
		const x1 = inv[q + 2] * r0 + inv[q + 3] * r1;
		out[2 * k] = x0;
		out[2 * k + 1] = x1;
		next0 = x0;
		next1 = x1;
	}
}
