/**
 * Preset nematic materials, named neutrally by chemistry and role.
 *
 * Sources, per value:
 * - [S] Extended Cauchy coefficients of the three literature materials at 25 °C: Li, Wen, Gauza,
 *   Lu & Wu, J. Display Technol. 1:51-61 (2005), as reproduced in published tabulations.
 * - "from memory": handbook-typical values quoted without a checked primary source; they are
 *   plausibility-level only (typically ±15-30 %). Replace them with the fluid's data sheet.
 * - "typical value": the generic reflective-TN preset is a set of representative numbers for
 *   commercial meter-glass mixtures (Δn ≈ 0.10-0.12, T_NI ≈ 90 °C, V_th ≈ 1.3-1.6 V,
 *   γ1 ≈ 0.15 Pa·s, E_a ≈ 0.35 eV), not a measured material.
 * Where the literature data were taken at different temperatures (permittivities often at 20 °C,
 * dispersion at 25 °C) the preset treats all of them as holding at reference_C.
 */
import type { LcMaterial } from './material';

function freezeMaterial(material: LcMaterial): LcMaterial {
	Object.freeze(material.extraordinary);
	Object.freeze(material.ordinary);
	return Object.freeze(material);
}

/** High-Δn cyanobiphenyl eutectic (the literature material E7). */
export const CYANOBIPHENYL_EUTECTIC_HIGH_DN: LcMaterial = freezeMaterial({
	id: 'cyanobiphenyl-eutectic-high-dn',
	label: 'High-Δn cyanobiphenyl eutectic',
	source:
		'Literature material E7. Dispersion: Li, Wen, Gauza, Lu & Wu, J. Display Technol. 1:51 (2005), 25 °C. ' +
		'T_NI, β, K, ε, γ1: from memory. E_a: assumed typical display-mixture value.',
	reference_C: 25,
	clearing_C: 60, // from memory: 58-61 °C quoted
	orderExponent: 0.22, // from memory: Haller fits of cyanobiphenyls give 0.16-0.25
	extraordinary: { a: 1.6933, b_um2: 0.0078, c_um4: 0.0028 }, // Li et al. 2005
	ordinary: { a: 1.499, b_um2: 0.0072, c_um4: 0.0003 }, // Li et al. 2005
	k11_pN: 11.1, // from memory
	k22_pN: 6.5, // from memory (5.9-7.4 quoted; ±15 % between sources)
	k33_pN: 17.1, // from memory
	epsParallel: 19.0, // from memory, 1 kHz, 20 °C
	epsPerpendicular: 5.2, // from memory, 1 kHz, 20 °C
	gamma1_Pas: 0.2, // from memory: 0.19-0.23 Pa·s at 20-25 °C
	activation_eV: 0.35, // assumed: 0.3-0.45 eV typical of display mixtures
	viscosityLaw: 'order-arrhenius'
});

/** Single-compound cyanobiphenyl (the literature material 5CB). */
export const CYANOBIPHENYL_SINGLE: LcMaterial = freezeMaterial({
	id: 'cyanobiphenyl-single',
	label: 'Single-compound cyanobiphenyl',
	source:
		'Literature material 5CB. Dispersion: Li, Wen, Gauza, Lu & Wu, J. Display Technol. 1:51 (2005), 25 °C. ' +
		'T_NI: secondary compilations. β: Li, Gauza & Wu fit, from memory. K, ε, γ1: from memory. ' +
		'E_a: assumed typical value.',
	reference_C: 25,
	clearing_C: 35.2, // secondary compilations (low authority): 35.0-35.3 °C
	orderExponent: 0.1889, // from memory: Li, Gauza & Wu, J. Appl. Phys. 96:19 (2004), 589 nm fit
	extraordinary: { a: 1.6708, b_um2: 0.0081, c_um4: 0.0024 }, // Li et al. 2005
	ordinary: { a: 1.5139, b_um2: 0.0052, c_um4: 0.0008 }, // Li et al. 2005
	k11_pN: 6.4, // from memory: Bradshaw, Raynes, Bunning & Faber, J. Phys. (Paris) 46:1513 (1985)
	k22_pN: 3.0, // from memory, same source
	k33_pN: 10.0, // from memory, same source
	epsParallel: 18.5, // from memory: 18.5-19.7 quoted near 25 °C
	epsPerpendicular: 7.0, // from memory: 6.7-7.0 quoted near 25 °C
	gamma1_Pas: 0.09, // from memory: 0.08-0.10 Pa·s at 25 °C
	activation_eV: 0.35, // assumed: 0.3-0.45 eV typical
	viscosityLaw: 'order-arrhenius'
});

/** Low-Δn cyclohexyl nematic (the literature material 5PCH), a proxy for low-Δn TN mixtures. */
export const CYCLOHEXYL_LOW_DN: LcMaterial = freezeMaterial({
	id: 'cyclohexyl-low-dn',
	label: 'Low-Δn cyclohexyl nematic',
	source:
		'Literature material 5PCH. Dispersion: Li, Wen, Gauza, Lu & Wu, J. Display Technol. 1:51 (2005), 25 °C. ' +
		'T_NI, β, K, ε, γ1: from memory (±30 %). E_a: assumed typical value.',
	reference_C: 25,
	clearing_C: 54.6, // from memory
	orderExponent: 0.2, // from memory: typical Haller exponent
	extraordinary: { a: 1.5801, b_um2: 0.0073, c_um4: 0.0003 }, // Li et al. 2005
	ordinary: { a: 1.4718, b_um2: 0.0049, c_um4: 0.0002 }, // Li et al. 2005
	k11_pN: 8.5, // from memory
	k22_pN: 5.1, // from memory
	k33_pN: 16.2, // from memory
	epsParallel: 13.8, // from memory
	epsPerpendicular: 4.8, // from memory
	gamma1_Pas: 0.12, // from memory
	activation_eV: 0.35, // assumed: 0.3-0.45 eV typical
	viscosityLaw: 'order-arrhenius'
});

/**
 * Generic reflective-TN mixture: typical values, not a measured fluid. Δn(589 nm) = 0.111,
 * 90° threshold V_th = 1.43 V without dopant (1.50 V at d/p = 0.1), T_NI 90 °C.
 */
export const GENERIC_REFLECTIVE_TN: LcMaterial = freezeMaterial({
	id: 'generic-reflective-tn',
	label: 'Generic reflective-TN mixture (typical values)',
	source:
		'Typical values for commercial reflective twisted-nematic mixtures (Δn 0.10-0.12, T_NI ≈ 90 °C, ' +
		'V_th 1.3-1.6 V, γ1 ≈ 0.15 Pa·s, E_a ≈ 0.35 eV); dispersion shaped like the low-Δn cyclohexyl fit. ' +
		'Not a measured material.',
	reference_C: 25,
	clearing_C: 90, // typical value
	orderExponent: 0.2, // typical value
	extraordinary: { a: 1.582, b_um2: 0.0075, c_um4: 0.0004 }, // typical value, Δn(589 nm) = 0.111
	ordinary: { a: 1.48, b_um2: 0.005, c_um4: 0.0002 }, // typical value
	k11_pN: 10, // typical value
	k22_pN: 5.5, // typical value
	k33_pN: 15, // typical value
	epsParallel: 10, // typical value
	epsPerpendicular: 4, // typical value; Δε = 6
	gamma1_Pas: 0.15, // typical value at 25 °C
	activation_eV: 0.35, // typical value
	viscosityLaw: 'order-arrhenius'
});

/** All presets, in display order. */
export const LC_PRESETS: readonly LcMaterial[] = Object.freeze([
	GENERIC_REFLECTIVE_TN,
	CYCLOHEXYL_LOW_DN,
	CYANOBIPHENYL_EUTECTIC_HIGH_DN,
	CYANOBIPHENYL_SINGLE
]);

/** The preset with this id, or undefined. */
export function presetById(id: string): LcMaterial | undefined {
	return LC_PRESETS.find((material) => material.id === id);
}
