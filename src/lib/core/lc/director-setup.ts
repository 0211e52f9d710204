/**
 * Loading a cell, a voltage and a starting profile into a director workspace, and reading a
 * solution out of it (SI at this edge, dimensionless inside the kernel).
 *
 * Initial guess (standard continuation practice, from memory): tilt = pretilt + a small sin(πz/d)
 * perturbation of the pretilt's sign (never the symmetric untilted state), twist linear from 0 to
 * the total twist.
 * Warm starts are resampled to the workspace's nodes and get the cell's boundary values.
 */
import type { DirectorCell } from './cell';
import { M_PER_UM, RAD_PER_DEG, VACUUM_PERMITTIVITY_F_PER_M } from './constants';
import { energyOf, setWorkspaceConstants, type DirectorWorkspace } from './director-kernel';
import { nudgeTilt } from './director-newton';
import {
	midPlaneValue,
	resampleNodes,
	type DirectorConvergence,
	type DirectorProfile,
	type DirectorSolution
} from './profile';

export function loadConstants(ws: DirectorWorkspace, cell: DirectorCell, voltage_V: number): void {
	const m = cell.material;
	setWorkspaceConstants(ws, {
		k11_N: m.k11_N,
		k22_N: m.k22_N,
		k33_N: m.k33_N,
		epsPerpendicular: m.epsPerpendicular,
		epsParallel: m.epsParallel,
		gapToPitch: cell.gapToPitch,
		voltage_V,
		epsilon0_Fm: VACUUM_PERMITTIVITY_F_PER_M
	});
}

function applyBoundaries(ws: DirectorWorkspace, cell: DirectorCell): void {
	const n = ws.slices;
	const pretilt_rad = cell.pretilt_deg * RAD_PER_DEG;
	ws.theta[0] = pretilt_rad;
	ws.theta[n] = pretilt_rad;
	ws.phi[0] = 0;
	ws.phi[n] = cell.twist_deg * RAD_PER_DEG;
}

/** Pretilt plus a small perturbation, linear twist. */
export function loadInitialGuess(
	ws: DirectorWorkspace,
	cell: DirectorCell,
	nudge_rad: number
): void {
	const n = ws.slices;
	const pretilt_rad = cell.pretilt_deg * RAD_PER_DEG;
	const twist_rad = cell.twist_deg * RAD_PER_DEG;
	for (let i = 0; i <= n; i++) {
		ws.theta[i] = pretilt_rad;
		ws.phi[i] = (twist_rad * i) / n;
	}
	applyBoundaries(ws, cell);
	nudgeTilt(ws, nudge_rad);
}

/** A previous profile (any node count), with this cell's boundary values imposed. */
export function loadStartProfile(
	ws: DirectorWorkspace,
	cell: DirectorCell,
	start: DirectorProfile
): void {
	const nodes = ws.slices + 1;
	if (start.tilt_rad.length < 2 || start.tilt_rad.length !== start.twist_rad.length) {
		throw new Error(
			'start profile needs matching tilt_rad and twist_rad arrays of at least 2 nodes'
		);
	}
	ws.theta.set(resampleNodes(start.tilt_rad, nodes));
	ws.phi.set(resampleNodes(start.twist_rad, nodes));
	applyBoundaries(ws, cell);
}

function maxAbs(values: Float64Array): number {
	let m = 0;
	for (let i = 0; i < values.length; i++) m = Math.max(m, Math.abs(values[i]));
	return m;
}

/** Copy the workspace state into a fresh solution object (SI). */
export function extractSolution(options: {
	ws: DirectorWorkspace;
	cell: DirectorCell;
	voltage_V: number;
	convergence: DirectorConvergence;
}): DirectorSolution {
	const { ws, cell, voltage_V, convergence } = options;
	const gap_m = cell.gap_um * M_PER_UM;
	const energy = energyOf(ws, ws.theta, ws.phi);
	const tilt_rad = Float64Array.from(ws.theta);
	const twist_rad = Float64Array.from(ws.phi);
	return {
		gap_m,
		tilt_rad,
		twist_rad,
		voltage_V,
		capacitance_Fm2: VACUUM_PERMITTIVITY_F_PER_M / (gap_m * ws.integral),
		midTilt_rad: midPlaneValue(tilt_rad),
		maxTilt_rad: maxAbs(tilt_rad),
		energy_Jm2: (energy * cell.material.k11_N) / gap_m,
		convergence
	};
}
