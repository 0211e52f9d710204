/*
 * Luminance of a Lambertian (perfectly diffusing) reflector: L = ρ·E/π, with E the illuminance
 * on it (lx = lm/m²), ρ its luminous reflectance (0…1; the luminance factor Y/100 of
 * spectrum-to-xyz.ts) and L in cd/m² (= lm/(m²·sr)). The π is the projected solid angle of the
 * hemisphere. Source: any photometry text, e.g. CIE 17 (ILV) "luminance factor".
 */

/** Luminance (cd/m²) of a diffuse reflector of reflectance ρ under illuminance E (lx). */
export function lambertianLuminance_cdm2(options: {
	reflectance: number;
	illuminance_lx: number;
}): number {
	const { reflectance, illuminance_lx } = options;
	if (!(reflectance >= 0)) throw new RangeError(`Reflectance must be ≥ 0, got ${reflectance}`);
	if (!(illuminance_lx >= 0))
		throw new RangeError(`Illuminance must be ≥ 0 lx, got ${illuminance_lx}`);
	return (reflectance * illuminance_lx) / Math.PI;
}
