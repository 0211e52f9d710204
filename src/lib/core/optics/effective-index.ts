/**
 * Effective extraordinary index seen at normal incidence by light polarised in the plane that
 * contains the director, for a director tilted by θ out of the substrate plane (index
 * ellipsoid; standard, e.g. Yeh & Gu, Optics of Liquid Crystal Displays, ch. on uniaxial
 * media — from memory):
 *   n_eff(θ) = n_e·n_o / sqrt(n_o²·cos²θ + n_e²·sin²θ)
 * θ = 0 (director in the plane) gives n_e; θ = π/2 (homeotropic) gives n_o.
 */

import type { RefractiveIndices } from './indices';

export function effectiveExtraordinaryIndex(
	tilt_rad: number,
	{ ne, no }: RefractiveIndices
): number {
	const c = Math.cos(tilt_rad);
	const s = Math.sin(tilt_rad);
	return (ne * no) / Math.sqrt(no * no * c * c + ne * ne * s * s);
}
