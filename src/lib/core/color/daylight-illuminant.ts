/*
 * CIE daylight illuminants (the D series) from the daylight basis, CIE 15:2004:
 *   x_D = −4.6070e9/T³ + 2.9678e6/T² + 0.09911e3/T + 0.244063       (4000 K ≤ T ≤ 7000 K)
 *   x_D = −2.0064e9/T³ + 1.9018e6/T² + 0.24748e3/T + 0.237040       (7000 K < T ≤ 25 000 K)
 *   y_D = −3.000·x_D² + 2.870·x_D − 0.275
 *   M = 0.0241 + 0.2562·x_D − 0.7341·y_D
 *   M1 = (−1.3515 − 1.7703·x_D + 5.9114·y_D)/M,  M2 = (0.0300 − 31.4424·x_D + 30.0717·y_D)/M
 *   S_D(λ) = S0(λ) + M1·S1(λ) + M2·S2(λ)        (S0, S1, S2 at 5 nm, 300–830 nm; 100 at 560 nm)
 * M1 and M2 are rounded to three decimals, as CIE 15 does for its tables; so computed, D65 at
 * 6504 K reproduces the tabulated D65 (tests/color). T is the correlated colour temperature.
 * Names: D50, D65, D75 … were fixed when c2 = 1.4380e-2 m·K; with c2 = 1.4388e-2 m·K (IPTS-68
 * and later) the same chromaticities lie at T = nominal · 1.4388/1.4380 (D65 → 6504 K).
 */
import { DAYLIGHT_BASIS } from './data/daylight-basis';
import { C2_CURRENT_mK, C2_IPTS48_mK, rescaleTemperature_K } from './radiation-constants';
import type { Chromaticity, Illuminant } from './types';
/** Validity range of the x_D fits, K. */
export const DAYLIGHT_CCT_MIN_K = 4000;
export const DAYLIGHT_CCT_MAX_K = 25000;

/** CCT on today's temperature scale of the D illuminant named by a nominal CCT (6500 → 6504 K). */
export function daylightCctFromNominal_K(nominal_K: number): number {
	return rescaleTemperature_K({
		temperature_K: nominal_K,
		fromC2_mK: C2_IPTS48_mK,
		toC2_mK: C2_CURRENT_mK
	});
}

/** Chromaticity (x_D, y_D) of CIE daylight at a correlated colour temperature. */
export function daylightChromaticity(cct_K: number): Chromaticity {
	if (!(cct_K >= DAYLIGHT_CCT_MIN_K && cct_K <= DAYLIGHT_CCT_MAX_K))
		throw new RangeError(
			`CIE daylight is defined for ${DAYLIGHT_CCT_MIN_K}–${DAYLIGHT_CCT_MAX_K} K, got ${cct_K} K`
		);
	const t = 1 / cct_K;
	const x =
		cct_K <= 7000
			? -4.607e9 * t ** 3 + 2.9678e6 * t ** 2 + 0.09911e3 * t + 0.244063
			: -2.0064e9 * t ** 3 + 1.9018e6 * t ** 2 + 0.24748e3 * t + 0.23704;
	return { x, y: -3.0 * x * x + 2.87 * x - 0.275 };
}

/** Weights M1, M2 of the basis functions S1, S2 for daylight of chromaticity (x_D, y_D). */
export function daylightBasisWeights(
	chromaticity: Chromaticity,
	rounding: { roundToThreeDecimals: boolean } = { roundToThreeDecimals: true }
): { M1: number; M2: number } {
	const { x, y } = chromaticity;
	const M = 0.0241 + 0.2562 * x - 0.7341 * y;
	const M1 = (-1.3515 - 1.7703 * x + 5.9114 * y) / M;
	const M2 = (0.03 - 31.4424 * x + 30.0717 * y) / M;
	if (!rounding.roundToThreeDecimals) return { M1, M2 };
	return { M1: Math.round(M1 * 1000) / 1000, M2: Math.round(M2 * 1000) / 1000 };
}

/** A CIE daylight illuminant at a CCT (today's scale: pass 6504 for D65), on 300–830 nm, 5 nm. */
export function daylightIlluminant(options: {
	cct_K: number;
	name?: string;
	roundToThreeDecimals?: boolean;
}): Illuminant {
	const { M1, M2 } = daylightBasisWeights(daylightChromaticity(options.cct_K), {
		roundToThreeDecimals: options.roundToThreeDecimals ?? true
	});
	const { s0, s1, s2, start_nm, step_nm } = DAYLIGHT_BASIS;
	const values = new Float64Array(s0.length);
	for (let i = 0; i < values.length; i++) values[i] = s0[i] + M1 * s1[i] + M2 * s2[i];
	return {
		name: options.name ?? `D(${Math.round(options.cct_K)} K)`,
		cct_K: options.cct_K,
		spectrum: { start_nm, step_nm, values }
	};
}

/** The D illuminant with a nominal name: daylightByNominalCct(6500) is D65 (6504 K). */
export function daylightByNominalCct(nominal_K: number): Illuminant {
	return daylightIlluminant({
		cct_K: daylightCctFromNominal_K(nominal_K),
		name: `D${Math.round(nominal_K / 100)}`
	});
}
