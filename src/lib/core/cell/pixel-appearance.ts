/**
 * What a viewer sees of one pixel state, in report form: luminance factor, chromaticity, CIELAB,
 * an sRGB preview, and the luminance under the design's diffuse illuminance (Lambertian: the
 * stack's reflectance factor scales E/π).
 */
import type { ReflectanceColor } from '../color/reflectance-to-color';
import { lambertianLuminance_cdm2 } from '../color/lambertian-luminance';
import type { PixelState } from './cell-optics';

export interface PixelAppearance {
	voltage_V: number;
	/** Luminance factor, % (a perfect white diffuser = 100). */
	Y: number;
	x: number;
	y: number;
	L: number;
	a: number;
	b: number;
	srgbHex: string;
	luminance_cdm2: number;
	/** Reflectance factor per wavelength of the cell grid, 0…1. */
	reflectance: number[];
}

export function pixelAppearance(state: PixelState, illuminance_lx: number): PixelAppearance {
	const c: ReflectanceColor = state.color;
	return {
		voltage_V: state.voltage_V,
		Y: c.Y,
		x: c.x,
		y: c.y,
		L: c.L,
		a: c.a,
		b: c.b,
		srgbHex: c.srgbHex,
		luminance_cdm2: lambertianLuminance_cdm2({ reflectance: c.Y / 100, illuminance_lx }),
		reflectance: Array.from(state.reflectance)
	};
}

/** Ratio of the brighter to the darker state, both including the first-surface reflection. */
export function contrastRatio(a: { Y: number }, b: { Y: number }): number {
	const hi = Math.max(a.Y, b.Y);
	const lo = Math.min(a.Y, b.Y);
	return lo > 0 ? hi / lo : Infinity;
}
