/**
 * Argument checks for a user-edited nematic material, each issue naming its parameter.
 *
 * Physical requirements enforced (see material.ts for the model):
 * - every number finite (no NaN, no ±Infinity);
 * - K11, K22, K33 > 0, γ1 > 0, activation energy ≥ 0, Haller exponent 0 < β < 1;
 * - ε⊥ ≥ 1 and ε∥ > ε⊥: a twisted-nematic cell switches only with positive Δε. Negative-Δε
 *   materials belong to vertically aligned modes, which this model does not cover;
 * - clearing point above the reference temperature, reference above absolute zero;
 * - n_e > n_o ≥ 1 across 400-700 nm (positive uniaxial birefringence).
 */
import { CELSIUS_ZERO_K } from './constants';
import { cauchyIndex } from './dispersion';
import type { LcMaterial } from './material';

export interface MaterialIssue {
	/** Name of the offending field, e.g. 'k11_pN' or 'extraordinary.a'. */
	parameter: string;
	message: string;
}

const NUMERIC_FIELDS = [
	'reference_C',
	'clearing_C',
	'orderExponent',
	'k11_pN',
	'k22_pN',
	'k33_pN',
	'epsParallel',
	'epsPerpendicular',
	'gamma1_Pas',
	'activation_eV'
] as const;

const CHECK_WAVELENGTHS_NM = [400, 450, 550, 650, 700];

/** All problems found in a material; an empty list means the material is usable. */
export function validateMaterial(material: LcMaterial): MaterialIssue[] {
	const issues: MaterialIssue[] = [];
	const add = (parameter: string, message: string) => issues.push({ parameter, message });

	if (typeof material.id !== 'string' || material.id.length === 0)
		add('id', 'id must be a non-empty string');
	for (const field of NUMERIC_FIELDS) {
		if (!Number.isFinite(material[field])) add(field, `${field} must be a finite number`);
	}
	for (const side of ['extraordinary', 'ordinary'] as const) {
		const fit = material[side];
		for (const key of ['a', 'b_um2', 'c_um4'] as const) {
			if (!fit || !Number.isFinite(fit[key]))
				add(`${side}.${key}`, `${side}.${key} must be a finite number`);
		}
	}
	if (issues.length > 0) return issues;

	for (const k of ['k11_pN', 'k22_pN', 'k33_pN'] as const) {
		if (material[k] <= 0) add(k, `${k} must be positive (got ${material[k]} pN)`);
	}
	if (material.epsPerpendicular < 1) {
		add('epsPerpendicular', `epsPerpendicular must be ≥ 1 (got ${material.epsPerpendicular})`);
	}
	if (material.epsParallel <= material.epsPerpendicular) {
		add(
			'epsParallel',
			`twisted-nematic switching needs positive dielectric anisotropy: epsParallel (${material.epsParallel}) ` +
				`must exceed epsPerpendicular (${material.epsPerpendicular}); negative-Δε materials are not supported`
		);
	}
	if (material.gamma1_Pas <= 0)
		add('gamma1_Pas', `gamma1_Pas must be positive (got ${material.gamma1_Pas} Pa·s)`);
	if (material.activation_eV < 0)
		add('activation_eV', `activation_eV must be ≥ 0 (got ${material.activation_eV} eV)`);
	if (!(material.orderExponent > 0 && material.orderExponent < 1)) {
		add(
			'orderExponent',
			`orderExponent (Haller β) must lie in (0, 1) (got ${material.orderExponent})`
		);
	}
	if (material.reference_C <= -CELSIUS_ZERO_K)
		add('reference_C', 'reference_C must be above absolute zero');
	if (material.clearing_C <= material.reference_C) {
		add(
			'clearing_C',
			`clearing_C (${material.clearing_C} °C) must lie above reference_C (${material.reference_C} °C): ` +
				'the data must describe the nematic phase'
		);
	}
	if (material.viscosityLaw !== 'arrhenius' && material.viscosityLaw !== 'order-arrhenius') {
		add('viscosityLaw', `viscosityLaw must be 'arrhenius' or 'order-arrhenius'`);
	}
	for (const wavelength_nm of CHECK_WAVELENGTHS_NM) {
		const ne = cauchyIndex(material.extraordinary, wavelength_nm);
		const no = cauchyIndex(material.ordinary, wavelength_nm);
		if (no < 1) {
			add('ordinary', `ordinary index ${no.toFixed(4)} < 1 at ${wavelength_nm} nm`);
			break;
		}
		if (ne <= no) {
			add(
				'extraordinary',
				`n_e (${ne.toFixed(4)}) must exceed n_o (${no.toFixed(4)}) at ${wavelength_nm} nm`
			);
			break;
		}
	}
	return issues;
}

/** Throws one error listing every issue; returns the material when it is usable. */
export function assertValidMaterial(material: LcMaterial): LcMaterial {
	const issues = validateMaterial(material);
	if (issues.length > 0) {
		const list = issues.map((issue) => `${issue.parameter}: ${issue.message}`).join('; ');
		throw new Error(`invalid liquid-crystal material '${material.id}': ${list}`);
	}
	return material;
}
