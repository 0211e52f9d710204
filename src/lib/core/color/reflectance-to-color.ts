/*
 * The colour of a reflecting sample in one call, for the optics code:
 * spectral reflectance on a grid → X, Y, Z (CIE 15:2004, Y = luminance factor in %) → x, y →
 * CIELAB relative to the illuminant's white on the same grid → sRGB preview (culori bridge).
 * The weights k·S·x̄ etc. are cached per (illuminant, observer, grid), so repeated calls cost
 * three dot products plus the Lab and sRGB conversions. Black reports the white's chromaticity.
 */
import { xyzToLab } from './cielab';
import { xyzToXy } from './chromaticity';
import { xyzToSrgbPreview } from './culori-bridge';
import { illuminantByName } from './illuminant-by-name';
import { DEFAULT_OBSERVER, type ObserverName } from './observers';
import type { WavelengthGrid } from './spectrum';
import { reflectanceToXyz } from './spectrum-to-xyz';
import { tristimulusWeights } from './tristimulus-weights';
import type { Illuminant } from './types';

export interface ReflectanceColorRequest {
	/** Spectral reflectance factor (0…1) at each grid wavelength. */
	readonly reflectance: ArrayLike<number>;
	readonly grid: WavelengthGrid;
	/** An illuminant or its name ('D65', 'A', 'F11', 'D75' …). */
	readonly illuminant: Illuminant | string;
	/** Default 'CIE1931-2deg'. */
	readonly observer?: ObserverName;
}

export interface ReflectanceColor {
	/** Tristimulus values; Y is the luminance factor in % (perfect white = 100). */
	readonly X: number;
	readonly Y: number;
	readonly Z: number;
	/** Chromaticity. */
	readonly x: number;
	readonly y: number;
	/** CIELAB relative to the illuminant's white. */
	readonly L: number;
	readonly a: number;
	readonly b: number;
	/** sRGB preview, adapted to D65 (Bradford) and clamped. */
	readonly srgbHex: string;
	readonly srgbInGamut: boolean;
}

/** Colour of a reflectance spectrum under an illuminant, for one observer. */
export function reflectanceToColor(request: ReflectanceColorRequest): ReflectanceColor {
	const illuminant =
		typeof request.illuminant === 'string'
			? illuminantByName(request.illuminant)
			: request.illuminant;
	const weights = tristimulusWeights({
		illuminant,
		observer: request.observer ?? DEFAULT_OBSERVER,
		grid: request.grid
	});
	const xyz = reflectanceToXyz(weights, request.reflectance);
	const { white } = weights;
	const { x, y } = xyzToXy(xyz, xyzToXy(white));
	const { L, a, b } = xyzToLab(xyz, white);
	const preview = xyzToSrgbPreview({ xyz, white });
	const { X, Y, Z } = xyz;
	return { X, Y, Z, x, y, L, a, b, srgbHex: preview.hex, srgbInGamut: preview.inGamut };
}
