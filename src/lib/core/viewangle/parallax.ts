/**
 * Parallax shadow of a segment: the rear polarizer and reflector lie behind the rear glass
 * (thickness t, index n_g), so light crossing a dark segment on its way in meets the reflector
 * beside it, and the shadow seen on the way out is displaced along the viewing azimuth by
 * 2·t·tan θ_g with sin θ_g = sin θ / n_g (Snell's law; in and out legs). Physics check:
 * t = 0.7 mm, θ = 30°, n_g = 1.52 → 0.48 mm.
 *
 * The flag: a shadow offset above half the narrowest stroke width shows as a separate grey
 * edge beside the stroke rather than a slightly wider stroke. The half-stroke figure is this
 * tool's own choice (a judgement, not a published limit); it is checked at 30° off the normal,
 * a common reading angle for a panel-mounted meter [common practice].
 */
export const GLASS_INDEX = 1.52; // soda-lime glass, n_D ≈ 1.52 [common practice]
export const PARALLAX_STROKE_FRACTION = 0.5;
export const PARALLAX_CHECK_POLAR_deg = 30;

export function shadowOffset_mm(options: {
	rearGlass_mm: number;
	polar_deg: number;
	glassIndex?: number;
}): number {
	const { rearGlass_mm, polar_deg } = options;
	const n = options.glassIndex ?? GLASS_INDEX;
	if (!(rearGlass_mm >= 0) || !(polar_deg >= 0 && polar_deg < 90))
		throw new RangeError('rear glass must be ≥ 0 mm and the polar angle in [0, 90)');
	const sinG = Math.sin((polar_deg * Math.PI) / 180) / n;
	return (2 * rearGlass_mm * sinG) / Math.sqrt(1 - sinG * sinG);
}
