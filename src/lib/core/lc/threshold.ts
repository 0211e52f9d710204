/**
 * Analytic RMS thresholds of nematic cells with strong anchoring and zero pretilt.
 *
 * Model: linear stability of the untilted, uniformly twisted state under a uniform field
 * (the constant-voltage redistribution enters only at higher order in the tilt).
 * - Splay Fréedericksz, planar untwisted: V_c = π·sqrt(K11/(ε0Δε)), independent of the gap
 *   [Fréedericksz & Zolina, Trans. Faraday Soc. 29:919 (1933)].
 * - Twisted cell, total twist Φ, chiral dose d/p:
 *   V_th = π·sqrt(K_eff/(ε0Δε)), K_eff = K11 + (K33 − 2K22)(Φ/π)² + 4K22(d/p)(Φ/π)
 *   [Schadt & Helfrich, APL 18:127 (1971); Leslie 1970; general twist derived from the
 *   quadratic expansion of the Frank energy (Frank, Discuss. Faraday Soc. 25:19 (1958))].
 *   Φ = 90°, d/p = 0 gives the classic K11 + (K33 − 2K22)/4.
 * Sign convention: Φ > 0 means the azimuth increases from the entrance (z = 0) to the exit plate;
 * d/p > 0 is a dopant whose natural twist has that same sense. Opposite signs lower K_eff.
 */
import { RAD_PER_DEG, VACUUM_PERMITTIVITY_F_PER_M } from './constants';
import { dielectricAnisotropy, type NematicState } from './material';

/** The twist-related inputs of a threshold: a DirectorCell satisfies this shape. */
export interface TwistSpec {
	material: NematicState;
	/** Total twist from entrance to exit, degrees, signed. */
	twist_deg: number;
	/** Gap-to-pitch ratio d/p of the chiral dopant, signed; 0 without dopant. */
	gapToPitch?: number;
}

/** K_eff = K11 + (K33 − 2K22)(Φ/π)² + 4K22(d/p)(Φ/π), N. */
export function twistElasticConstant_N(spec: TwistSpec): number {
	const { material } = spec;
	const turns = (spec.twist_deg * RAD_PER_DEG) / Math.PI;
	const gapToPitch = spec.gapToPitch ?? 0;
	return (
		material.k11_N +
		(material.k33_N - 2 * material.k22_N) * turns * turns +
		4 * material.k22_N * gapToPitch * turns
	);
}

/** π·sqrt(K/(ε0Δε)) in V; 0 when K ≤ 0 (the untilted state is unstable without field). */
export function thresholdFromConstants(options: { elastic_N: number; deltaEps: number }): number {
	if (options.elastic_N <= 0) return 0;
	return Math.PI * Math.sqrt(options.elastic_N / (VACUUM_PERMITTIVITY_F_PER_M * options.deltaEps));
}

/** Splay Fréedericksz threshold of a planar, untwisted cell, V RMS. */
export function splayThreshold_V(material: NematicState): number {
	return thresholdFromConstants({
		elastic_N: material.k11_N,
		deltaEps: dielectricAnisotropy(material)
	});
}

/** Threshold of a twisted cell (any twist, chiral dose), V RMS; 0 if unstable at 0 V. */
export function twistedThreshold_V(spec: TwistSpec): number {
	return thresholdFromConstants({
		elastic_N: twistElasticConstant_N(spec),
		deltaEps: dielectricAnisotropy(spec.material)
	});
}
