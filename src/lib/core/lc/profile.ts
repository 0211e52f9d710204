/**
 * Director profile and solution types shared by the solver and the optics.
 *
 * Convention (agreed with optics): values at N+1 equally spaced nodes from z = 0 (entrance,
 * front substrate, twist 0) to z = d (exit, twist = total twist). Tilt is measured from the
 * substrate plane, radians; twist is the azimuth in the substrate plane, radians, increasing
 * with z for a positive (right-handed about +z) twist.
 */

export interface DirectorProfile {
	gap_m: number;
	tilt_rad: Float64Array;
	twist_rad: Float64Array;
}

export interface DirectorConvergence {
	/**
	 * 'converged': strict local minimum to the tolerance. 'settled': high twist at high voltage, the
	 * twist collapsing onto a vertical mid-plane director (no attained minimum on the grid); stopped
	 * once the non-vertical directors move less than 1e-5 rad per step; within ≈ 1e-4 rad of the
	 * limit away from the vertical core (≈ 1e-3 rad in it). 'not-converged': iteration limit reached.
	 */
	status: 'converged' | 'settled' | 'not-converged';
	/** status !== 'not-converged': the profile is usable. */
	converged: boolean;
	/** Newton iterations summed over all continuation steps. */
	iterations: number;
	/** Voltage steps solved, this voltage included (1 for a warm start). */
	continuationSteps: number;
	/** Largest gradient component at the last iterate, in units of K11/d per node. */
	gradientNorm: number;
	/** Largest director rotation max(|Δθ|, |cosθ·Δφ|) of the last step, rad. */
	lastStep_rad: number;
	/** True when the Hessian at the result is positive definite: a stable state. */
	isMinimum: boolean;
}

export interface DirectorSolution extends DirectorProfile {
	/** RMS voltage across the LC layer, V. */
	voltage_V: number;
	/** Capacitance per area ε0/∫dz/ε_zz, F/m². */
	capacitance_Fm2: number;
	/** Tilt at the mid-plane z = d/2, rad. */
	midTilt_rad: number;
	/** Largest |tilt| over the nodes, rad. */
	maxTilt_rad: number;
	/** G = F_el − ½CV² per area, J/m² (up to the constant of the Frank energy). */
	energy_Jm2: number;
	convergence: DirectorConvergence;
}

/** Tilt at the mid-plane, interpolating when the node count is even (odd slab count). */
export function midPlaneValue(values: Float64Array): number {
	const slices = values.length - 1;
	const half = slices / 2;
	const lower = Math.floor(half);
	return lower === half ? values[lower] : 0.5 * (values[lower] + values[lower + 1]);
}

/** Resample equally spaced node values onto `nodes` equally spaced nodes (linear). */
export function resampleNodes(values: Float64Array, nodes: number): Float64Array {
	if (values.length === nodes) return Float64Array.from(values);
	const out = new Float64Array(nodes);
	const last = values.length - 1;
	for (let i = 0; i < nodes; i++) {
		const x = (i * last) / (nodes - 1);
		const j = Math.min(Math.floor(x), last - 1);
		const f = x - j;
		out[i] = (1 - f) * values[j] + f * values[j + 1];
	}
	return out;
}
