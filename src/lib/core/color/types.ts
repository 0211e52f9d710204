/*
 * Value types shared by the colour modules. Field names carry the space: X, Y, Z (CIE 1931/1964
 * tristimulus, Y = 100 for the perfect reflecting diffuser), x, y (chromaticity), u, v (CIE 1976
 * u′, v′), L, a, b (CIELAB relative to a stated white).
 */
import type { Spectrum } from './spectrum';

/** CIE tristimulus values; for reflecting samples Y is the luminance factor in % (white = 100). */
export interface Xyz {
	readonly X: number;
	readonly Y: number;
	readonly Z: number;
}

/** CIE 1931 (or 1964) chromaticity coordinates x, y. */
export interface Chromaticity {
	readonly x: number;
	readonly y: number;
}

/** CIE 1976 UCS chromaticity u′, v′. */
export interface ChromaticityUv {
	readonly u: number;
	readonly v: number;
}

/** CIE 1976 L*a*b*; only meaningful together with the white it was computed against. */
export interface Lab {
	readonly L: number;
	readonly a: number;
	readonly b: number;
}

/**
 * An illuminant: a relative spectral power distribution with a name.
 * Treat the spectrum as immutable: tristimulus weights are cached per illuminant object.
 */
export interface Illuminant {
	readonly name: string;
	readonly spectrum: Spectrum;
	/** Correlated colour temperature in kelvin, where the definition fixes one. */
	readonly cct_K?: number;
}
