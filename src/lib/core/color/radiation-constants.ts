/*
 * Values of the second radiation constant c2 = h·c/k that colorimetric definitions were built on.
 * Illuminant A and the D-series names fixed c2 at the value of their day; CCTs quoted on today's
 * scale follow from T_now = T_then · c2_now / c2_then. Source: CIE 15:2004, Colorimetry, 3rd ed.
 * (the definitions of illuminant A and the D series; the c2 values of the temperature scales are
 * from memory of that text).
 */

/** c2 in the definition of illuminant A (1931), m·K. */
export const C2_ILLUMINANT_A_mK = 1.435e-2;
/** c2 of the International Practical Temperature Scale of 1948, when the D series was named, m·K. */
export const C2_IPTS48_mK = 1.438e-2;
/** c2 of IPTS-68 and later scales, used for all current CCTs, m·K. */
export const C2_CURRENT_mK = 1.4388e-2;

/** Convert a temperature quoted with one c2 to the scale of another (T·c2_to/c2_from). */
export function rescaleTemperature_K(options: {
	temperature_K: number;
	fromC2_mK: number;
	toC2_mK: number;
}): number {
	return (options.temperature_K * options.toC2_mK) / options.fromC2_mK;
}
