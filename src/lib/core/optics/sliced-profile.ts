/**
 * Slabs of a director profile, precomputed once per profile so that the per-wavelength loop
 * only needs the indices. Node interval k (between nodes k and k + 1) is cut into `subslices`
 * equal slabs; tilt and twist are interpolated linearly between nodes; a slab takes the tilt at
 * its midpoint (with subslices = 1: the mean of its two nodes), and
 * - for the 'retarder' slab model, the azimuth at its midpoint;
 * - for the 'twisted' slab model, the twist across it (twistStep), treated as uniform.
 * Azimuths are stored relative to the entrance node, so lab x is always the entrance director.
 */

import { assertDirectorProfile, type DirectorProfile } from './director-profile';

export interface SlicedProfile {
	count: number;
	thickness_m: number;
	/** cos²θ and sin²θ of each slab's midpoint tilt. */
	cosSqTilt: Float64Array;
	sinSqTilt: Float64Array;
	/** cos 2φ and sin 2φ of each slab's midpoint azimuth (retarder model). */
	cos2Azimuth: Float64Array;
	sin2Azimuth: Float64Array;
	/** Twist across each slab (twisted model). */
	twistStep_rad: Float64Array;
	/** Exit azimuth relative to the entrance director. */
	exitAzimuth_rad: number;
}

/** Zeroed buffers for `count` slabs. */
export function createSlicedProfile(count: number): SlicedProfile {
	return {
		count,
		thickness_m: 0,
		cosSqTilt: new Float64Array(count),
		sinSqTilt: new Float64Array(count),
		cos2Azimuth: new Float64Array(count),
		sin2Azimuth: new Float64Array(count),
		twistStep_rad: new Float64Array(count),
		exitAzimuth_rad: 0
	};
}

export interface SliceOptions {
	/** Slabs per node interval, integer ≥ 1 (default 1). */
	subslices?: number;
	/** Buffers to reuse when their slab count matches (no allocation then). */
	reuse?: SlicedProfile;
}

export function sliceDirectorProfile(
	profile: DirectorProfile,
	options: SliceOptions = {}
): SlicedProfile {
	assertDirectorProfile(profile);
	const subslices = options.subslices ?? 1;
	if (!Number.isInteger(subslices) || subslices < 1) {
		throw new RangeError(`subslices must be an integer ≥ 1, got ${subslices}`);
	}
	const { gap_m, tilt_rad, twist_rad } = profile;
	const intervals = tilt_rad.length - 1;
	const count = intervals * subslices;
	const out =
		options.reuse && options.reuse.count === count ? options.reuse : createSlicedProfile(count);
	const entry = twist_rad[0];
	out.thickness_m = gap_m / count;
	out.exitAzimuth_rad = twist_rad[intervals] - entry;
	let slab = 0;
	for (let k = 0; k < intervals; k++) {
		const tilt0 = tilt_rad[k],
			dTilt = tilt_rad[k + 1] - tilt_rad[k];
		const twist0 = twist_rad[k] - entry,
			dTwist = twist_rad[k + 1] - twist_rad[k];
		for (let j = 0; j < subslices; j++, slab++) {
			const mid = (j + 0.5) / subslices;
			const tilt = tilt0 + mid * dTilt;
			const azimuth = twist0 + mid * dTwist;
			const c = Math.cos(tilt);
			out.cosSqTilt[slab] = c * c;
			out.sinSqTilt[slab] = 1 - c * c;
			out.cos2Azimuth[slab] = Math.cos(2 * azimuth);
			out.sin2Azimuth[slab] = Math.sin(2 * azimuth);
			out.twistStep_rad[slab] = dTwist / subslices;
		}
	}
	return out;
}
