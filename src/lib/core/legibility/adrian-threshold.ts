/**
 * Luminance difference threshold ΔL_th (cd/m²) for detecting a target of size α (arcmin) on a
 * background of luminance L_b (cd/m²): Adrian, "Visibility of targets: model for calculation",
 * Lighting Res. Technol. 21(4):181–188 (1989).
 *
 *   ΔL_th = k·(√Φ/α + √L)² · F_time · AF(age)
 *
 * with the three luminance ranges of √Φ (Ricco's law part) and √L (Weber's law part) below, the
 * age factor AF (23–75 years) and the exposure-time factor F_time (t < 2 s). k is the field
 * factor (k = 1: detection by 50 % of a young population, laboratory conditions).
 *
 * Limits: positive contrast (target brighter than the background). The paper's correction for
 * negative contrast is not applied; the dark-on-light segments of a positive-mode readout are
 * judged with the positive-contrast threshold, and the visibility level asked for (the reading
 * field factor) carries the margin. This is a disc-detection threshold, not a reading threshold.
 */
const log10 = Math.log10;

/** √Φ and √L of the model for a background luminance, cd/m². */
export function adrianRiccoWeber(background_cdm2: number): { sqrtPhi: number; sqrtL: number } {
	const lb = background_cdm2;
	if (!(lb > 0)) throw new RangeError(`background luminance must be > 0 cd/m², got ${lb}`);
	if (lb >= 0.6) {
		return {
			sqrtPhi: log10(4.1925 * lb ** 0.1556) + 0.1684 * lb ** 0.5867,
			sqrtL: 0.05946 * lb ** 0.466
		};
	}
	const x = log10(lb);
	if (lb > 0.00418) {
		return {
			sqrtPhi: 10 ** (-0.072 + 0.3372 * x + 0.0866 * x * x),
			sqrtL: 10 ** (-1.256 + 0.319 * x)
		};
	}
	return {
		sqrtPhi: 10 ** (0.028 + 0.173 * x),
		sqrtL: 10 ** (-0.891 + 0.5275 * x + 0.0227 * x * x)
	};
}

/** Age factor AF for an observer of `age_years` (defined for 23–75). */
export function adrianAgeFactor(age_years: number): number {
	if (!(age_years >= 23 && age_years <= 75))
		throw new RangeError(`the age factor is defined for 23–75 years, got ${age_years}`);
	if (age_years < 64) return (age_years - 19) ** 2 / 2160 + 0.99;
	return (age_years - 56.6) ** 2 / 116.3 + 1.43;
}

/** Exposure-time factor F_time = (a + t)/t for t < 2 s; 1 for longer looks. */
export function adrianTimeFactor(options: {
	size_arcmin: number;
	background_cdm2: number;
	time_s: number;
}): number {
	const { size_arcmin, background_cdm2, time_s } = options;
	if (time_s >= 2) return 1;
	if (!(time_s > 0)) throw new RangeError(`exposure time must be > 0 s, got ${time_s}`);
	const x = log10(size_arcmin) + 0.523;
	const aAlpha = 0.36 - (0.0972 * x * x) / (x * x - 2.513 * x + 2.7895);
	const y = log10(background_cdm2) + 6;
	const aL = 0.355 - (0.1217 * y * y) / (y * y - 10.4 * y + 52.28);
	const a = Math.sqrt(aAlpha * aAlpha + aL * aL) / 2.1;
	return (a + time_s) / time_s;
}

/** ΔL_th in cd/m²; `fieldFactor` k defaults to 1, `time_s` to a steady look (≥ 2 s). */
export function adrianThreshold_cdm2(options: {
	size_arcmin: number;
	background_cdm2: number;
	age_years: number;
	fieldFactor?: number;
	time_s?: number;
}): number {
	const { size_arcmin, background_cdm2, age_years } = options;
	if (!(size_arcmin > 0))
		throw new RangeError(`target size must be > 0 arcmin, got ${size_arcmin}`);
	const { sqrtPhi, sqrtL } = adrianRiccoWeber(background_cdm2);
	const time = adrianTimeFactor({ size_arcmin, background_cdm2, time_s: options.time_s ?? 2 });
	const k = options.fieldFactor ?? 1;
	return k * (sqrtPhi / size_arcmin + sqrtL) ** 2 * time * adrianAgeFactor(age_years);
}
