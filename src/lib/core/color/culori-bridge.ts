/*
 * The one bridge to culori (the only file that imports it):
 * - sRGB preview colours: XYZ under an illuminant → Bradford adaptation to the sRGB white
 *   (D65, x = 0.3127, y = 0.3290, IEC 61966-2-1) → culori's XYZ-D65 → sRGB conversion (its
 *   matrix is built on the same white, so the perfect white maps to #ffffff). The preview
 *   assumes a viewer adapted to the scene illuminant. Out-of-gamut colours are clamped per
 *   channel and flagged; hue may shift a little when clamping.
 * - culori's CIEDE2000 as an independent cross-check of delta-e-2000.ts. It converts its inputs
 *   to 'lab65' first, so colours are handed over tagged 'lab65' to pass through unchanged.
 */
import { clampRgb, convertXyz65ToRgb, differenceCiede2000, formatHex } from 'culori';
import { adaptXyzBradford } from './chromatic-adaptation';
import { xyToXyz } from './chromaticity';
import type { Lab, Xyz } from './types';

/** sRGB reference white, IEC 61966-2-1 (Y = 100 scale). */
export const SRGB_WHITE: Xyz = xyToXyz({ x: 0.3127, y: 0.329 }, 100);

/** Slack on the 0…1 range of encoded sRGB before a colour counts as out of gamut. */
const GAMUT_SLACK = 1e-6;

export interface SrgbPreview {
	/** '#rrggbb', clamped to the gamut. */
	readonly hex: string;
	/** False when any channel fell outside 0…1 before clamping. */
	readonly inGamut: boolean;
	/** Encoded sRGB channels before clamping (0…1 in gamut). */
	readonly r: number;
	readonly g: number;
	readonly b: number;
}

/** sRGB preview of tristimulus values `xyz` (Y = 100 scale) seen under a light of white `white`. */
export function xyzToSrgbPreview(colour: { xyz: Xyz; white: Xyz }): SrgbPreview {
	const { X, Y, Z } = adaptXyzBradford({
		xyz: colour.xyz,
		sourceWhite: colour.white,
		targetWhite: SRGB_WHITE
	});
	const rgb = convertXyz65ToRgb({ x: X / 100, y: Y / 100, z: Z / 100 });
	const inGamut = [rgb.r, rgb.g, rgb.b].every((c) => c >= -GAMUT_SLACK && c <= 1 + GAMUT_SLACK);
	return { hex: formatHex(clampRgb(rgb)), inGamut, r: rgb.r, g: rgb.g, b: rgb.b };
}

const culoriCiede2000 = differenceCiede2000();

/** CIEDE2000 as computed by culori (reference conditions), for cross-checking deltaE2000. */
export function deltaE2000ByCulori(reference: Lab, sample: Lab): number {
	return culoriCiede2000(
		{ mode: 'lab65', l: reference.L, a: reference.a, b: reference.b },
		{ mode: 'lab65', l: sample.L, a: sample.a, b: sample.b }
	);
}

/**
 * sRGB preview of a colour in a lit scene: `xyz` in absolute units (Y = luminance, cd/m²) under
 * a light of chromaticity `white` (Y = 100 scale), for a viewer adapted to a white of luminance
 * `adaptedWhite_cdm2`. The colour is scaled so the adapted white has Y = 100, then converted as
 * in xyzToSrgbPreview (Bradford to D65, culori's XYZ-D65 → sRGB). Brighter than the adapted
 * white (a strong veil or backlight) is out of gamut and clamped.
 */
export function sceneColourPreview(colour: {
	xyz_cdm2: Xyz;
	white: Xyz;
	adaptedWhite_cdm2: number;
}): SrgbPreview {
	const scale = 100 / colour.adaptedWhite_cdm2;
	const { X, Y, Z } = colour.xyz_cdm2;
	return xyzToSrgbPreview({
		xyz: { X: X * scale, Y: Y * scale, Z: Z * scale },
		white: colour.white
	});
}
