/**
 * Director profile across the cell gap, as produced by the director solver (which lives
 * elsewhere): tilt θ (out of the substrate plane) and twist φ (azimuth from lab x toward lab y)
 * at N + 1 equally spaced nodes z = 0 … d, z along forward propagation (the light's entry side
 * first). Angles in rad, gap in m.
 */

export interface DirectorProfile {
	gap_m: number;
	tilt_rad: Float64Array;
	twist_rad: Float64Array;
}

export interface UniformTwistOptions {
	gap_m: number;
	/** Total twist Φ from the entrance to the exit node. */
	twist_rad: number;
	/** Number of nodes (N + 1 ≥ 2). */
	nodes: number;
	/** Uniform tilt, default 0 (planar); π/2 gives a homeotropic layer. */
	tilt_rad?: number;
}

/** A linearly twisting profile with constant tilt: the cell at 0 V, and a test fixture. */
export function uniformTwistProfile({
	gap_m,
	twist_rad,
	nodes,
	tilt_rad = 0
}: UniformTwistOptions): DirectorProfile {
	if (!Number.isInteger(nodes) || nodes < 2)
		throw new RangeError(`nodes must be an integer ≥ 2, got ${nodes}`);
	const tilt = new Float64Array(nodes).fill(tilt_rad);
	const twist = new Float64Array(nodes);
	for (let k = 0; k < nodes; k++) twist[k] = (twist_rad * k) / (nodes - 1);
	const profile = { gap_m, tilt_rad: tilt, twist_rad: twist };
	assertDirectorProfile(profile);
	return profile;
}

/** Throw unless the profile is usable: ≥ 2 nodes, equal lengths, finite values, gap ≥ 0. */
export function assertDirectorProfile({ gap_m, tilt_rad, twist_rad }: DirectorProfile): void {
	if (!(gap_m >= 0 && Number.isFinite(gap_m)))
		throw new RangeError(`gap_m must be finite and ≥ 0, got ${gap_m}`);
	if (tilt_rad.length < 2 || tilt_rad.length !== twist_rad.length) {
		throw new RangeError('tilt_rad and twist_rad need the same length, at least 2 nodes');
	}
	for (let k = 0; k < tilt_rad.length; k++) {
		if (!Number.isFinite(tilt_rad[k]) || !Number.isFinite(twist_rad[k])) {
			throw new RangeError(`director profile has a non-finite angle at node ${k}`);
		}
	}
}
