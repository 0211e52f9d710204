/** Fixtures and independent oracles shared by the optics tests (no test-runner imports). */

/**
 * Gooch–Tarry leak of a 90° TN between parallel polarizers, polarizer ∥ entrance director:
 * T_NB = sin²((π/2)·sqrt(1 + u²))/(1 + u²), u = 2·d·Δn/λ (Gooch & Tarry, J. Phys. D 8:1575
 * (1975)). General twist θ: sin²(θ·sqrt(1+u²))/(1+u²), u = π·d·Δn/(θ·λ).
 */
export function goochTarryLeak(twist_rad: number, u: number): number {
	const s = Math.sin(twist_rad * Math.sqrt(1 + u * u));
	return (s * s) / (1 + u * u);
}

/** Test fixture only (not a material model): a mild Cauchy-like LC dispersion, λ in nm. */
export function fixtureIndicesAt(wavelength_nm: number): { ne: number; no: number } {
	const inv_um2 = 1 / ((wavelength_nm / 1000) * (wavelength_nm / 1000));
	return { ne: 1.58 + 0.012 * inv_um2, no: 1.48 + 0.005 * inv_um2 };
}

/** 380, 385, …, 780 nm: 81 wavelengths. */
export function visibleGrid_nm(): Float64Array {
	return Float64Array.from({ length: 81 }, (_, i) => 380 + 5 * i);
}

/** Test fixture only: an on-state-like profile (tilt up to ~85° mid-gap, twist bunched mid-gap). */
export function fixtureOnProfile(
	nodes: number,
	gap_m = 5e-6
): {
	gap_m: number;
	tilt_rad: Float64Array;
	twist_rad: Float64Array;
} {
	const pretilt_rad = (2 * Math.PI) / 180;
	const tilt_rad = new Float64Array(nodes);
	const twist_rad = new Float64Array(nodes);
	const steep = 8;
	for (let k = 0; k < nodes; k++) {
		const z = k / (nodes - 1);
		tilt_rad[k] = pretilt_rad + ((83 * Math.PI) / 180) * Math.sin(Math.PI * z);
		twist_rad[k] =
			(Math.PI / 2) * (0.5 + (0.5 * Math.tanh(steep * (z - 0.5))) / Math.tanh(steep / 2));
	}
	return { gap_m, tilt_rad, twist_rad };
}

type Complex = [number, number];
type Matrix2 = [Complex, Complex, Complex, Complex];

const cmul = (a: Complex, b: Complex): Complex => [
	a[0] * b[0] - a[1] * b[1],
	a[0] * b[1] + a[1] * b[0]
];
const cadd = (a: Complex, b: Complex): Complex => [a[0] + b[0], a[1] + b[1]];

function mat(m: ArrayLike<number>): Matrix2 {
	return [
		[m[0], m[1]],
		[m[2], m[3]],
		[m[4], m[5]],
		[m[6], m[7]]
	];
}
function matmul(a: Matrix2, b: Matrix2): Matrix2 {
	return [
		cadd(cmul(a[0], b[0]), cmul(a[1], b[2])),
		cadd(cmul(a[0], b[1]), cmul(a[1], b[3])),
		cadd(cmul(a[2], b[0]), cmul(a[3], b[2])),
		cadd(cmul(a[2], b[1]), cmul(a[3], b[3]))
	];
}
function adjoint(a: Matrix2): Matrix2 {
	return [
		[a[0][0], -a[0][1]],
		[a[2][0], -a[2][1]],
		[a[1][0], -a[1][1]],
		[a[3][0], -a[3][1]]
	];
}
const PAULI: Matrix2[] = [
	[
		[1, 0],
		[0, 0],
		[0, 0],
		[1, 0]
	],
	[
		[1, 0],
		[0, 0],
		[0, 0],
		[-1, 0]
	],
	[
		[0, 0],
		[1, 0],
		[1, 0],
		[0, 0]
	],
	[
		[0, 0],
		[0, -1],
		[0, 1],
		[0, 0]
	]
];

/** Mueller matrix of a Jones matrix, M_ij = ½·tr(σ_i·J·σ_j·J†) — an independent route to intensities. */
export function muellerOfJones(jones: ArrayLike<number>): number[][] {
	const j = mat(jones);
	const jAdj = adjoint(j);
	return PAULI.map((si) =>
		PAULI.map((sj) => {
			const p = matmul(matmul(matmul(si, j), sj), jAdj);
			return 0.5 * (p[0][0] + p[3][0]);
		})
	);
}

export function muellerTimesVector(m: number[][], s: number[]): number[] {
	return m.map((row) => row.reduce((sum, x, k) => sum + x * s[k], 0));
}
