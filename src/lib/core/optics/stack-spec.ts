/**
 * Description of a reflective TN stack, front to back: first surface (reflectance R_s), front
 * polarizer, LC cell, rear polarizer, reflector. Polarizer axes are in degrees from the entrance
 * director (lab x) toward lab y — the same sense as positive twist (see README.md).
 *
 * Display modes by polarizer orientation (guiding limit of a TN with twist Φ):
 * - positive (dark segments on a light ground, bright at 0 V): rear axis = front + Φ, i.e.
 *   crossed polarizers for a 90° TN;
 * - negative (light segments on a dark ground): rear axis = front + Φ + 90°, i.e. parallel
 *   polarizers for a 90° TN.
 * Arbitrary angles are allowed by writing the spec directly.
 */

import { FRONT_SURFACE_REFLECTANCE_DEFAULT } from './fresnel';
import { NEUTRAL_GREY_POLARIZER, type PolarizerSpec } from './polarizer-models';
import type { ReflectorSpec } from './reflector';

export interface PolarizerPlacement {
	polarizer: PolarizerSpec;
	/** Pass-axis azimuth from the entrance director, deg. */
	axis_deg: number;
}

export interface PolarizerPairSpec {
	front: PolarizerPlacement;
	rear: PolarizerPlacement;
}

export interface ReflectiveStackSpec extends PolarizerPairSpec {
	reflector: ReflectorSpec;
	/** R_s of the first surface, 0…1; default 0.0400, Fresnel for n = 1.5 (fresnel.ts). */
	frontSurfaceReflectance?: number;
}

export type DisplayMode = 'positive' | 'negative';

export interface ModeStackOptions {
	mode: DisplayMode;
	/** Cell twist Φ, deg (90 for a TN). */
	twist_deg: number;
	/** Front pass axis from the entrance director, deg; default 0 (along it). */
	frontAxis_deg?: number;
	/** Both polarizers; default the neutral-grey typical-values sheet. */
	polarizer?: PolarizerSpec;
	/** Default a brushed-metal reflector (typical values). */
	reflector?: ReflectorSpec;
	frontSurfaceReflectance?: number;
}

const HALF_TURN_deg = 180;
const QUARTER_TURN_deg = 90;

/** A stack whose polarizers set the given display mode. */
export function reflectiveStackForMode(options: ModeStackOptions): ReflectiveStackSpec {
	const frontAxis_deg = options.frontAxis_deg ?? 0;
	const offset_deg = options.mode === 'positive' ? 0 : QUARTER_TURN_deg;
	const rearAxis_deg = (frontAxis_deg + options.twist_deg + offset_deg) % HALF_TURN_deg;
	const polarizer = options.polarizer ?? NEUTRAL_GREY_POLARIZER;
	return {
		front: { polarizer, axis_deg: frontAxis_deg },
		rear: { polarizer, axis_deg: rearAxis_deg },
		reflector: options.reflector ?? { kind: 'brushedMetal' },
		frontSurfaceReflectance: options.frontSurfaceReflectance ?? FRONT_SURFACE_REFLECTANCE_DEFAULT
	};
}
