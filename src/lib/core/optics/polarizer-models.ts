/**
 * Polarizer specifications over wavelength: ideal, tabulated/constant k1(λ), k2(λ), or a
 * parametric neutral-grey iodine-PVA-like model.
 *
 * The iodine-PVA-like model carries TYPICAL VALUES, not a product's data [common practice:
 * display-grade iodine-PVA sheet, single transmittance T_s ≈ 42–44 %, polarizing efficiency
 * ≥ 99.9 % (display grade, from memory)]:
 *   x = (λ − 550 nm)/200 nm,  k1(λ) = k1_550 − 0.04·x²,  k2(λ) = k2_550·(1 + 2x²),
 * with k1_550 = 0.87 and k2_550 = 1e-4: T_s = 0.435 at 550 nm, 0.424 at 400 and 700 nm;
 * PE ≥ 99.9 % from 380 to 780 nm. The mild parabolic fall-off of k1 and rise of k2 toward the
 * ends of the visible mimic the shape of such sheets without claiming any measured curve.
 */

import type { PrincipalTransmittances } from './polarizer';
import {
	assertSpectralValue,
	assertUnitInterval,
	sampleSpectralValue,
	type SpectralValue
} from './spectral-value';

export interface IodinePvaParameters {
	/** Pass-axis intensity transmittance at 550 nm. */
	k1At550?: number;
	/** Block-axis intensity transmittance at 550 nm. */
	k2At550?: number;
}

export type PolarizerSpec =
	| { kind: 'ideal' }
	| { kind: 'principal'; k1: SpectralValue; k2: SpectralValue }
	| ({ kind: 'iodinePva' } & IodinePvaParameters);

export const IDEAL_POLARIZER: PolarizerSpec = { kind: 'ideal' };
/** The default: neutral-grey iodine-PVA-like sheet, typical values (see header). */
export const NEUTRAL_GREY_POLARIZER: PolarizerSpec = { kind: 'iodinePva' };

const K1_AT_550 = 0.87; // typical value, see header
const K2_AT_550 = 1e-4; // typical value, see header
const CENTRE_nm = 550;
const HALF_WIDTH_nm = 200;
const K1_FALL = 0.04;
const K2_RISE = 2;

/** k1, k2 of the iodine-PVA-like model at one wavelength. */
export function iodinePvaTransmittances(
	wavelength_nm: number,
	params: IodinePvaParameters = {}
): PrincipalTransmittances {
	const x = (wavelength_nm - CENTRE_nm) / HALF_WIDTH_nm;
	const k1 = (params.k1At550 ?? K1_AT_550) - K1_FALL * x * x;
	const k2 = (params.k2At550 ?? K2_AT_550) * (1 + K2_RISE * x * x);
	return { k1: Math.min(1, Math.max(0, k1)), k2: Math.min(1, Math.max(0, k2)) };
}

export interface SampledPolarizer {
	k1: Float64Array;
	k2: Float64Array;
}

/** k1(λ), k2(λ) of a specification on a wavelength grid; throws if any lies outside [0, 1]. */
export function samplePolarizer(
	spec: PolarizerSpec,
	wavelengths_nm: Float64Array
): SampledPolarizer {
	const n = wavelengths_nm.length;
	let k1: Float64Array;
	let k2: Float64Array;
	if (spec.kind === 'ideal') {
		k1 = new Float64Array(n).fill(1);
		k2 = new Float64Array(n);
	} else if (spec.kind === 'principal') {
		assertSpectralValue(spec.k1, 'polarizer k1');
		assertSpectralValue(spec.k2, 'polarizer k2');
		k1 = sampleSpectralValue(spec.k1, wavelengths_nm);
		k2 = sampleSpectralValue(spec.k2, wavelengths_nm);
	} else {
		k1 = new Float64Array(n);
		k2 = new Float64Array(n);
		for (let i = 0; i < n; i++) {
			const k = iodinePvaTransmittances(wavelengths_nm[i], spec);
			k1[i] = k.k1;
			k2[i] = k.k2;
		}
	}
	assertUnitInterval(k1, 'polarizer k1');
	assertUnitInterval(k2, 'polarizer k2');
	return { k1, k2 };
}
