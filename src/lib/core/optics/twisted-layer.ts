/**
 * Closed-form Jones matrix of a uniformly twisted, untilted uniaxial layer at normal incidence
 * (Yeh & Gu, Optics of Liquid Crystal Displays, TN chapter — from memory; equivalent to Gooch &
 * Tarry, J. Phys. D 8:1575 (1975)):
 *   M = R(−Φ)·A,  A = [[cos X − i(Γ/2)·sinX/X,  Φ·sinX/X],
 *                      [−Φ·sinX/X,             cos X + i(Γ/2)·sinX/X]],
 *   Γ = 2π·Δn·d/λ,  X = sqrt(Φ² + (Γ/2)²).
 * Lab x is the entrance director; the director azimuth runs from 0 at entry to Φ at exit,
 * measured from x toward y (Φ > 0: azimuth grows with z, a right-handed helix for forward
 * propagation +z). Time dependence e^{+iωt}; the common phase e^{−iπ(n_e+n_o)d/λ} is dropped.
 * The handedness is pinned in tests against the sliced product and a guiding check
 * (x-polarised light leaves along (cos Φ, sin Φ) when Γ ≫ Φ).
 */

import { M_PER_NM } from './si';

export interface TwistedLayer {
	/** Total twist Φ from entrance to exit director. */
	twist_rad: number;
	/** Γ = 2π·Δn·d/λ. */
	retardation_rad: number;
}

const SINC_SERIES_LIMIT = 1e-4;

/** sin(x)/x, exact to double precision near 0. */
export function sinc(x: number): number {
	if (Math.abs(x) < SINC_SERIES_LIMIT) return 1 - (x * x) / 6;
	return Math.sin(x) / x;
}

/** out = A (the twist-frame part, without the exit rotation R(−Φ)). */
export function twistFrameMatrix(
	out: Float64Array,
	{ twist_rad, retardation_rad }: TwistedLayer
): Float64Array {
	const halfGamma = retardation_rad / 2;
	const x = Math.sqrt(twist_rad * twist_rad + halfGamma * halfGamma);
	const sx = sinc(x);
	const c = Math.cos(x);
	out[0] = c;
	out[1] = -halfGamma * sx;
	out[2] = twist_rad * sx;
	out[3] = 0;
	out[4] = -twist_rad * sx;
	out[5] = 0;
	out[6] = c;
	out[7] = halfGamma * sx;
	return out;
}

/** out = R(−Φ)·A, the lab-frame Jones matrix of the layer. */
export function jonesOfTwistedLayer(out: Float64Array, layer: TwistedLayer): Float64Array {
	twistFrameMatrix(out, layer);
	const c = Math.cos(layer.twist_rad);
	const s = Math.sin(layer.twist_rad);
	// R(−Φ) = [[c, −s], [s, c]]
	const a0 = out[0],
		a1 = out[1],
		b0 = out[2],
		b1 = out[3];
	const c0 = out[4],
		c1 = out[5],
		d0 = out[6],
		d1 = out[7];
	out[0] = c * a0 - s * c0;
	out[1] = c * a1 - s * c1;
	out[2] = c * b0 - s * d0;
	out[3] = c * b1 - s * d1;
	out[4] = s * a0 + c * c0;
	out[5] = s * a1 + c * c1;
	out[6] = s * b0 + c * d0;
	out[7] = s * b1 + c * d1;
	return out;
}

/** Γ = 2π·Δn·d/λ for a birefringence Δn over a thickness d. */
export function retardationOf({
	birefringence,
	thickness_m,
	wavelength_nm
}: {
	birefringence: number;
	thickness_m: number;
	wavelength_nm: number;
}): number {
	return (2 * Math.PI * birefringence * thickness_m) / (wavelength_nm * M_PER_NM);
}
