/**
 * Nematic material description: the user-editable data of one liquid crystal at its
 * reference temperature, and the temperature-resolved state the kernels consume.
 *
 * Model: uniaxial nematic with extended-Cauchy dispersion n(λ) = A + B/λ² + C/λ⁴ (λ in µm)
 * [Li, Wen, Gauza, Lu & Wu, J. Display Technol. 1:51 (2005)], Frank constants K11, K22, K33,
 * static permittivities ε∥, ε⊥ (≈ 1 kHz), rotational viscosity γ1, clearing point T_NI.
 * Temperature scaling (Haller order parameter) lives in temperature.ts.
 *
 * Conventions: ε∥ is the permittivity along the director. Twisted-nematic switching needs
 * positive dielectric anisotropy Δε = ε∥ − ε⊥ > 0 (the field must tilt the director out of the
 * substrate plane); negative-Δε materials are rejected by validateMaterial.
 */

/** Extended Cauchy fit n(λ) = a + b_um2/λ² + c_um4/λ⁴ with λ in µm. */
export interface CauchyFit {
	a: number;
	b_um2: number;
	c_um4: number;
}

/**
 * How γ1 follows temperature.
 * - 'order-arrhenius': γ1 ∝ S·exp(E_a/k_B T) [Wu & Wu, Liq. Cryst. 8:171 (1990)] (default).
 * - 'arrhenius': γ1 ∝ exp(E_a/k_B T), for E_a fitted to a plain Arrhenius plot.
 */
export type ViscosityLaw = 'order-arrhenius' | 'arrhenius';

/** One nematic material at its reference temperature. Every field is user-editable. */
export interface LcMaterial {
	/** Stable identifier (kebab-case, neutral, no trade names). */
	id: string;
	/** Human-readable neutral label. */
	label: string;
	/** Where the numbers come from, and which are typical values or from memory. */
	source: string;
	/** Temperature at which the data below hold, °C. */
	reference_C: number;
	/** Nematic-isotropic transition (clearing point) T_NI, °C. */
	clearing_C: number;
	/** Haller exponent β in S = (1 − T/T_NI)^β (T in K), dimensionless. */
	orderExponent: number;
	/** Extraordinary index dispersion at reference_C. */
	extraordinary: CauchyFit;
	/** Ordinary index dispersion at reference_C. */
	ordinary: CauchyFit;
	/** Splay, twist and bend elastic constants, pN. */
	k11_pN: number;
	k22_pN: number;
	k33_pN: number;
	/** Relative static permittivity parallel to the director (≈ 1 kHz). */
	epsParallel: number;
	/** Relative static permittivity perpendicular to the director (≈ 1 kHz). */
	epsPerpendicular: number;
	/** Rotational viscosity γ1, Pa·s. */
	gamma1_Pas: number;
	/** Activation energy of γ1, eV. */
	activation_eV: number;
	/** Temperature law for γ1. */
	viscosityLaw: ViscosityLaw;
}

/** The material resolved at one temperature in the nematic phase, SI units. */
export interface NematicState {
	phase: 'nematic';
	material: LcMaterial;
	temperature_C: number;
	/** S(T)/S(T_ref), dimensionless; 1 at the reference temperature. */
	orderRatio: number;
	k11_N: number;
	k22_N: number;
	k33_N: number;
	epsParallel: number;
	epsPerpendicular: number;
	gamma1_Pas: number;
}

/** The material above its clearing point: no director, no birefringence, no switching. */
export interface IsotropicState {
	phase: 'isotropic';
	material: LcMaterial;
	temperature_C: number;
	message: string;
}

export type MaterialState = NematicState | IsotropicState;

/** Dielectric anisotropy Δε = ε∥ − ε⊥ of a resolved state. */
export function dielectricAnisotropy(state: NematicState): number {
	return state.epsParallel - state.epsPerpendicular;
}

/** Throws a descriptive error unless the state is nematic; returns it narrowed. */
export function requireNematic(state: MaterialState): NematicState {
	if (state.phase !== 'nematic') throw new Error(state.message);
	return state;
}
