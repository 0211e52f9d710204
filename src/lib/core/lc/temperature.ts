/**
 * Temperature dependence of a nematic material through its order parameter.
 *
 * Model (all temperatures in K inside):
 * - Haller order parameter S(T) = (1 − T/T_NI)^β [Haller, Prog. Solid State Chem. 10:103 (1975)];
 *   the clearing point T_NI stands in for the fit's T_c, so S → 0 at T_NI. Quantities scale with
 *   s = S(T)/S(T_ref), so data at the reference temperature come back unchanged.
 * - Birefringence Δn ∝ S with the mean index n̄ = (n_e + 2n_o)/3 held fixed:
 *   n_e = n̄ + (2/3)Δn, n_o = n̄ − (1/3)Δn. Thermal expansion (the −B·T term of the
 *   four-parameter model, Li, Gauza & Wu, J. Appl. Phys. 96:19 (2004)) is neglected.
 * - Elastic constants K ∝ S² (mean-field) and Δε ∝ S with ε̄ = (ε∥ + 2ε⊥)/3 fixed; the
 *   Maier-Meier dipolar 1/T term is neglected, so the V_th temperature coefficient
 *   d ln V_th/dT = −β/(2(T_NI − T)) underestimates measured ones (use measured V10(T) when known).
 * - γ1: 'order-arrhenius' γ1 ∝ S·exp(E_a/k_B T) [Wu & Wu, Liq. Cryst. 8:171 (1990)] (default of
 *   the presets) or plain 'arrhenius' γ1 ∝ exp(E_a/k_B T).
 * At or above T_NI the material is isotropic: materialAt returns phase 'isotropic' with a message,
 * indicesAt returns n_e = n_o = n̄ flagged 'isotropic'; no NaN is ever produced. Below the
 * crystallisation point the model simply extrapolates (supercooled nematic).
 */
import { BOLTZMANN_EV_PER_K, celsiusToKelvin, N_PER_PN } from './constants';
import { cauchyIndex } from './dispersion';
import type { LcMaterial, MaterialState } from './material';
import { assertValidMaterial } from './validate';

/** Haller order parameter (1 − T/T_NI)^β, 0 at and above the clearing point. */
export function hallerOrder(material: LcMaterial, temperature_C: number): number {
	const ratio = celsiusToKelvin(temperature_C) / celsiusToKelvin(material.clearing_C);
	return ratio >= 1 ? 0 : Math.pow(1 - ratio, material.orderExponent);
}

/** S(T)/S(T_ref): 1 at the reference temperature, 0 at and above the clearing point. */
export function orderRatio(material: LcMaterial, temperature_C: number): number {
	return hallerOrder(material, temperature_C) / hallerOrder(material, material.reference_C);
}

/** exp[(E_a/k_B)(1/T − 1/T_ref)], the Arrhenius factor relative to the reference temperature. */
export function arrheniusFactor(options: {
	activation_eV: number;
	temperature_C: number;
	reference_C: number;
}): number {
	const inverseDifference_perK =
		1 / celsiusToKelvin(options.temperature_C) - 1 / celsiusToKelvin(options.reference_C);
	return Math.exp((options.activation_eV / BOLTZMANN_EV_PER_K) * inverseDifference_perK);
}

function checkTemperature(temperature_C: number): void {
	if (!Number.isFinite(temperature_C) || celsiusToKelvin(temperature_C) <= 0) {
		throw new Error(
			`temperature_C must be a finite temperature above absolute zero (got ${temperature_C})`
		);
	}
}

/** The material resolved at a temperature: SI constants in the nematic phase, or a flag above T_NI. */
export function materialAt(options: {
	material: LcMaterial;
	temperature_C: number;
}): MaterialState {
	const { material, temperature_C } = options;
	assertValidMaterial(material);
	checkTemperature(temperature_C);
	if (temperature_C >= material.clearing_C) {
		return {
			phase: 'isotropic',
			material,
			temperature_C,
			message:
				`'${material.id}' is isotropic at ${temperature_C} °C (clearing point ${material.clearing_C} °C): ` +
				'no director, no twisted-nematic effect'
		};
	}
	const s = orderRatio(material, temperature_C);
	const epsMean = (material.epsParallel + 2 * material.epsPerpendicular) / 3;
	const deltaEps = (material.epsParallel - material.epsPerpendicular) * s;
	const viscosityOrder = material.viscosityLaw === 'order-arrhenius' ? s : 1;
	return {
		phase: 'nematic',
		material,
		temperature_C,
		orderRatio: s,
		k11_N: material.k11_pN * N_PER_PN * s * s,
		k22_N: material.k22_pN * N_PER_PN * s * s,
		k33_N: material.k33_pN * N_PER_PN * s * s,
		epsParallel: epsMean + (2 / 3) * deltaEps,
		epsPerpendicular: epsMean - (1 / 3) * deltaEps,
		gamma1_Pas:
			material.gamma1_Pas *
			viscosityOrder *
			arrheniusFactor({
				activation_eV: material.activation_eV,
				temperature_C,
				reference_C: material.reference_C
			})
	};
}

/** Principal indices at a temperature and vacuum wavelength. */
export interface IndexPair {
	ne: number;
	no: number;
	phase: 'nematic' | 'isotropic';
}

/** Extraordinary and ordinary index; above T_NI both equal the mean index and phase is 'isotropic'. */
export function indicesAt(options: {
	material: LcMaterial;
	temperature_C: number;
	wavelength_nm: number;
}): IndexPair {
	const { material, temperature_C, wavelength_nm } = options;
	assertValidMaterial(material);
	checkTemperature(temperature_C);
	if (!(Number.isFinite(wavelength_nm) && wavelength_nm > 0)) {
		throw new Error(`wavelength_nm must be a positive finite number (got ${wavelength_nm})`);
	}
	const neRef = cauchyIndex(material.extraordinary, wavelength_nm);
	const noRef = cauchyIndex(material.ordinary, wavelength_nm);
	const mean = (neRef + 2 * noRef) / 3;
	if (temperature_C >= material.clearing_C) return { ne: mean, no: mean, phase: 'isotropic' };
	const deltaN = (neRef - noRef) * orderRatio(material, temperature_C);
	return { ne: mean + (2 / 3) * deltaN, no: mean - (1 / 3) * deltaN, phase: 'nematic' };
}
