/**
 * Reflectors behind the rear polarizer, in a normal-incidence luminance-factor model: light
 * reaching the reflector returns with reflectance ρ(λ); a fraction δ of it is depolarised, the
 * rest keeps its Jones vector (a normal-incidence mirror, −I in lab axes, common sign dropped;
 * see reciprocity.ts). Under diffuse illumination a Lambertian element's luminance factor at
 * normal viewing equals ρ, so the stack reflectance is a reflectance factor.
 * - diffuseWhite: Lambertian, fully depolarising (δ = 1).
 * - brushedMetal: silver-like, high ρ, partly polarisation-preserving.
 * - transflective: a diffuse element that reflects ρ and transmits t (ρ + t ≤ 1, the rest
 *   absorbed); the transmitted share is reported for a later backlight mode.
 * Defaults are TYPICAL VALUES [common practice], not product data.
 */

import {
	assertSpectralValue,
	assertUnitInterval,
	sampleSpectralValue,
	type SpectralValue
} from './spectral-value';

export type ReflectorSpec =
	| { kind: 'diffuseWhite'; reflectance?: SpectralValue }
	| { kind: 'brushedMetal'; reflectance?: SpectralValue; depolarizedFraction?: number }
	| {
			kind: 'transflective';
			reflectance?: SpectralValue;
			transmittance?: SpectralValue;
			depolarizedFraction?: number;
	  };

export const DIFFUSE_WHITE_REFLECTANCE = 0.8; // typical value [common practice] (ρ ≈ 0.8)
export const BRUSHED_METAL_REFLECTANCE = 0.9; // typical value for a silver-like brushed foil
export const BRUSHED_METAL_DEPOLARIZED_FRACTION = 0.3; // typical value
export const TRANSFLECTIVE_REFLECTANCE = 0.7; // typical 70/30 split
export const TRANSFLECTIVE_TRANSMITTANCE = 0.3;

export interface SampledReflector {
	reflectance: Float64Array;
	transmittance: Float64Array;
	/** δ, 0 (mirror-like) … 1 (fully depolarising). */
	depolarizedFraction: number;
}

function sampled(value: SpectralValue, wavelengths_nm: Float64Array, name: string): Float64Array {
	assertSpectralValue(value, name);
	const samples = sampleSpectralValue(value, wavelengths_nm);
	assertUnitInterval(samples, name);
	return samples;
}

export function sampleReflector(
	spec: ReflectorSpec,
	wavelengths_nm: Float64Array
): SampledReflector {
	const none = new Float64Array(wavelengths_nm.length);
	let result: SampledReflector;
	if (spec.kind === 'diffuseWhite') {
		const reflectance = sampled(
			spec.reflectance ?? DIFFUSE_WHITE_REFLECTANCE,
			wavelengths_nm,
			'reflectance'
		);
		result = { reflectance, transmittance: none, depolarizedFraction: 1 };
	} else if (spec.kind === 'brushedMetal') {
		const reflectance = sampled(
			spec.reflectance ?? BRUSHED_METAL_REFLECTANCE,
			wavelengths_nm,
			'reflectance'
		);
		const depolarizedFraction = spec.depolarizedFraction ?? BRUSHED_METAL_DEPOLARIZED_FRACTION;
		result = { reflectance, transmittance: none, depolarizedFraction };
	} else {
		const reflectance = sampled(
			spec.reflectance ?? TRANSFLECTIVE_REFLECTANCE,
			wavelengths_nm,
			'reflectance'
		);
		const transmittance = sampled(
			spec.transmittance ?? TRANSFLECTIVE_TRANSMITTANCE,
			wavelengths_nm,
			'transmittance'
		);
		for (let i = 0; i < wavelengths_nm.length; i++) {
			if (reflectance[i] + transmittance[i] > 1 + 1e-12) {
				throw new RangeError(
					`transflector reflects + transmits more than 1 at ${wavelengths_nm[i]} nm`
				);
			}
		}
		result = { reflectance, transmittance, depolarizedFraction: spec.depolarizedFraction ?? 1 };
	}
	const d = result.depolarizedFraction;
	if (!(d >= 0 && d <= 1)) throw new RangeError(`depolarizedFraction must lie in [0, 1], got ${d}`);
	return result;
}
