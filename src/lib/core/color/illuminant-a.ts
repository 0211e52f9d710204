/*
 * CIE standard illuminant A (typical tungsten-filament light), defined by formula:
 *   S_A(λ) = 100 · (560/λ)^5 · [exp(c2/(560 nm · T)) − 1] / [exp(c2/(λ · T)) − 1]
 * with T = 2848 K and c2 = 1.435e-2 m·K, the values in force when A was defined; λ in nm.
 * Source: CIE S 014-2:2006 (ISO/CIE 11664-2), CIE 15:2004 (IES describes A as a
 * blackbody at 2856 K with c2 = 1.4388e-2 m·K; that differs by up to 0.08 % in relative power,
 * so the CIE formula is used.) Checks: S_A(560) = 100, S_A(400) = 14.70804, S_A(580) = 114.43634.
 */
import { C2_CURRENT_mK, C2_ILLUMINANT_A_mK, rescaleTemperature_K } from './radiation-constants';
import { spectrumFromFunction, wavelengthGrid } from './spectrum';
import type { Illuminant } from './types';

/** Temperature of illuminant A on the scale of its definition, K. */
export const ILLUMINANT_A_TEMPERATURE_K = 2848;
/** Wavelength at which the relative power is 100, nm. */
const NORMALIZATION_WAVELENGTH_nm = 560;
const NM_PER_M = 1e9;

/** c2/T expressed in nm, so the exponent is simply C2_OVER_T_nm / λ_nm. */
const C2_OVER_T_nm = (C2_ILLUMINANT_A_mK * NM_PER_M) / ILLUMINANT_A_TEMPERATURE_K;
const PLANCK_DENOMINATOR_AT_560 = Math.expm1(C2_OVER_T_nm / NORMALIZATION_WAVELENGTH_nm);

/** Relative spectral power of illuminant A at one wavelength (100 at 560 nm). */
export function illuminantARelativePower(wavelength_nm: number): number {
	if (!(wavelength_nm > 0))
		throw new RangeError(`Wavelength must be positive, got ${wavelength_nm} nm`);
	return (
		100 *
		(NORMALIZATION_WAVELENGTH_nm / wavelength_nm) ** 5 *
		(PLANCK_DENOMINATOR_AT_560 / Math.expm1(C2_OVER_T_nm / wavelength_nm))
	);
}

/** The grid on which the CIE tabulates A: 300–830 nm at 1 nm. */
export const ILLUMINANT_A_GRID = wavelengthGrid({ start_nm: 300, end_nm: 830, step_nm: 1 });

/** Illuminant A sampled from its formula on the CIE's 1 nm grid. */
export function illuminantA(): Illuminant {
	return {
		name: 'A',
		cct_K: rescaleTemperature_K({
			temperature_K: ILLUMINANT_A_TEMPERATURE_K,
			fromC2_mK: C2_ILLUMINANT_A_mK,
			toC2_mK: C2_CURRENT_mK
		}),
		spectrum: spectrumFromFunction(ILLUMINANT_A_GRID, illuminantARelativePower)
	};
}
