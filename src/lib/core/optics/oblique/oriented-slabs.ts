/**
 * From a director profile (tilt θ and twist φ at equally spaced nodes, entry side first, as the
 * director solver gives it) to slabs with their director in the display frame (view-direction.ts).
 * Slab k between nodes k and k + 1 (cut into `subslices` equal parts) takes the tilt and azimuth
 * at its midpoint, linearly interpolated — the midpoint-retarder slabs of ../profile-jones.ts.
 *
 * The entrance director points along the front plate's rubbing direction (azimuth α_f) and rises
 * into the cell (c_z = sin θ > 0 at positive tilt). The twist runs clockwise as the viewer sees the
 * glass for a right-handed helix (sense +1: azimuth α_f + φ), anticlockwise for a left-handed one
 * (α_f − φ).
 */
import { assertDirectorProfile, type DirectorProfile } from '../director-profile';
import type { OrientedSlabs } from './uniaxial-slabs';

const RAD_PER_DEG = Math.PI / 180;

export function createOrientedSlabs(count: number): OrientedSlabs {
	return {
		count,
		thickness_m: 0,
		cx: new Float64Array(count),
		cy: new Float64Array(count),
		cz: new Float64Array(count)
	};
}

export function orientedSlabs(options: {
	profile: DirectorProfile;
	/** Front rubbing direction, deg in the display frame. */
	entrance_deg: number;
	/** +1 right-handed, −1 left-handed. */
	sense: 1 | -1;
	subslices?: number;
}): OrientedSlabs {
	const { profile, sense } = options;
	assertDirectorProfile(profile);
	const subslices = options.subslices ?? 1;
	if (!Number.isInteger(subslices) || subslices < 1)
		throw new RangeError(`subslices must be an integer ≥ 1, got ${subslices}`);
	const { tilt_rad, twist_rad } = profile;
	const intervals = tilt_rad.length - 1;
	const out = createOrientedSlabs(intervals * subslices);
	out.thickness_m = profile.gap_m / out.count;
	const entrance_rad = options.entrance_deg * RAD_PER_DEG;
	const start = twist_rad[0];
	let slab = 0;
	for (let k = 0; k < intervals; k++) {
		for (let j = 0; j < subslices; j++, slab++) {
			const t = (j + 0.5) / subslices;
			const tilt = tilt_rad[k] + t * (tilt_rad[k + 1] - tilt_rad[k]);
			const twist = twist_rad[k] + t * (twist_rad[k + 1] - twist_rad[k]) - start;
			const azimuth = entrance_rad + sense * twist;
			const c = Math.cos(tilt);
			out.cx[slab] = c * Math.cos(azimuth);
			out.cy[slab] = c * Math.sin(azimuth);
			out.cz[slab] = Math.sin(tilt);
		}
	}
	return out;
}
