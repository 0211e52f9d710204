/**
 * Linear (partial) polarizer: principal intensity transmittances k1 along the pass axis and k2
 * along the block axis, amplitude factors √k1 and √k2. With its pass axis at azimuth α (from
 * lab x toward lab y) its Jones matrix is R(−α)·diag(√k1, √k2)·R(α) (Jones 1941; R as in
 * complex2x2.ts). The matrix is real and symmetric, so it is its own transpose and the backward
 * pass sees the same polarizer.
 *
 * Pair algebra for unpolarised light (standard polarizer algebra, from memory; re-derived from
 * the Jones matrices in tests/optics/polarizer.test.ts):
 *   single T_s = (k1 + k2)/2, parallel pair T_p = (k1² + k2²)/2, crossed pair T_c = k1·k2,
 *   polarizing efficiency PE = (k1 − k2)/(k1 + k2).
 */

export interface PrincipalTransmittances {
	/** Intensity transmittance for light polarised along the pass axis, 0…1. */
	k1: number;
	/** Intensity transmittance for light polarised along the block axis, 0…1. */
	k2: number;
}

export interface PolarizerAtAxis extends PrincipalTransmittances {
	/** Pass-axis azimuth from lab x (the entrance director) toward lab y. */
	axis_rad: number;
}

/** out = R(−α)·diag(√k1, √k2)·R(α). */
export function polarizerJones(
	out: Float64Array,
	{ k1, k2, axis_rad }: PolarizerAtAxis
): Float64Array {
	const t1 = Math.sqrt(k1);
	const t2 = Math.sqrt(k2);
	const c = Math.cos(axis_rad);
	const s = Math.sin(axis_rad);
	const offDiagonal = (t1 - t2) * c * s;
	out.fill(0);
	out[0] = t1 * c * c + t2 * s * s;
	out[2] = offDiagonal;
	out[4] = offDiagonal;
	out[6] = t1 * s * s + t2 * c * c;
	return out;
}

/** T_s: unpolarised light through one polarizer. */
export function singlePolarizerTransmittance({ k1, k2 }: PrincipalTransmittances): number {
	return (k1 + k2) / 2;
}

/** T_p: unpolarised light through two equal polarizers with parallel pass axes. */
export function parallelPairTransmittance({ k1, k2 }: PrincipalTransmittances): number {
	return (k1 * k1 + k2 * k2) / 2;
}

/** T_c: unpolarised light through two equal polarizers with crossed pass axes. */
export function crossedPairTransmittance({ k1, k2 }: PrincipalTransmittances): number {
	return k1 * k2;
}

/** PE = (k1 − k2)/(k1 + k2). */
export function polarizingEfficiency({ k1, k2 }: PrincipalTransmittances): number {
	return (k1 - k2) / (k1 + k2);
}
