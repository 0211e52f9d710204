/**
 * Director statics of a twisted-nematic cell at an RMS voltage: public entry points.
 *
 * Model: minimum of G = F_el − ½CV² under the constant-voltage condition (directorKernel.ts),
 * strong anchoring, any twist (tested 0-270°), pretilt, chiral dose d/p [Frank, Discuss. Faraday
 * Soc. 25:19 (1958); Deuling, Mol. Cryst. Liq. Cryst. 19:123 (1972)].
 * Numerics: damped Newton with a block-tridiagonal Hessian (directorNewton.ts). Without a warm
 * start the voltage is continued from 0 V through a ladder scaled by the analytic threshold, so
 * the state reached is the one connected to the field-free state (relevant where high twists are
 * hysteretic). Conventions: see profile.ts and cell.ts.
 */
import { assertValidGeometry, type DirectorCell } from './cell';
import { M_PER_UM } from './constants';
import { createDirectorWorkspace, energyOf, type DirectorWorkspace } from './director-kernel';
import { DEFAULT_NEWTON_SETTINGS, minimiseDirector, type NewtonSettings } from './director-newton';
import {
	extractSolution,
	loadConstants,
	loadInitialGuess,
	loadStartProfile
} from './director-setup';
import type { DirectorProfile, DirectorSolution } from './profile';
import { splayThreshold_V, twistedThreshold_V } from './threshold';

/** Default number of slabs N (N+1 nodes). */
export const DEFAULT_SLICES = 60;

export interface DirectorSettings {
	/** Number of slabs N across the gap (N+1 nodes), 8-4000; default 60. */
	slices?: number;
	/** Newton tolerance on the node angles, rad; default 1e-10. */
	tolerance_rad?: number;
	/** Newton iteration limit per voltage; default 200. */
	maxIterations?: number;
}

export function resolveSettings(settings: DirectorSettings): {
	slices: number;
	newton: NewtonSettings;
} {
	const slices = settings.slices ?? DEFAULT_SLICES;
	if (!(Number.isInteger(slices) && slices >= 8 && slices <= 4000)) {
		throw new Error(`slices must be an integer in 8-4000 (got ${slices})`);
	}
	return {
		slices,
		newton: {
			...DEFAULT_NEWTON_SETTINGS,
			tolerance_rad: settings.tolerance_rad ?? DEFAULT_NEWTON_SETTINGS.tolerance_rad,
			maxIterations: settings.maxIterations ?? DEFAULT_NEWTON_SETTINGS.maxIterations
		}
	};
}

export function checkCell(cell: DirectorCell): void {
	assertValidGeometry(cell);
	if (!cell.material || cell.material.phase !== 'nematic') {
		throw new Error('cell.material must be a nematic state (see materialAt / cellAt)');
	}
}

export function checkVoltage(voltage_V: number): void {
	if (!(Number.isFinite(voltage_V) && voltage_V >= 0)) {
		throw new Error(`voltage_V must be a finite RMS voltage ≥ 0 (got ${voltage_V})`);
	}
}

/** Voltages from 0 V up to the target, spaced on the scale of the analytic threshold. */
export function continuationLadder(cell: DirectorCell, voltage_V: number): number[] {
	const twisted = twistedThreshold_V(cell);
	const scale_V = twisted > 0 ? twisted : splayThreshold_V(cell.material);
	const ladder = [0];
	let factor = 0.9;
	// The factor grows geometrically, so 200 rungs reach any finite voltage over a positive scale.
	while (factor * scale_V < voltage_V && scale_V > 0 && ladder.length < 200) {
		ladder.push(factor * scale_V);
		factor = factor < 1.15 ? factor + 0.1 : factor * 1.25;
	}
	if (voltage_V > 0) ladder.push(voltage_V);
	return ladder;
}

/**
 * The ladder's rungs strictly between two voltages, in the direction of travel, then the target:
 * a jump from a solved state to a far voltage is walked in the same steps as a solve from 0 V,
 * so a large jump cannot strand the Newton iteration on the way (a monotone path keeps the branch).
 */
export function ladderBetween(cell: DirectorCell, from_V: number, to_V: number): number[] {
	const low = Math.min(from_V, to_V);
	const high = Math.max(from_V, to_V);
	const rungs = continuationLadder(cell, high).filter((v) => v > low && v < high);
	if (to_V < from_V) rungs.reverse();
	return [...rungs, to_V];
}

/** Solve on a workspace along a list of voltages, warm-starting each from the previous state. */
export function solveAlong(options: {
	ws: DirectorWorkspace;
	cell: DirectorCell;
	voltages_V: number[];
	newton: NewtonSettings;
}): DirectorSolution {
	const { ws, cell, voltages_V, newton } = options;
	let iterations = 0;
	let report = null;
	for (const voltage_V of voltages_V) {
		loadConstants(ws, cell, voltage_V);
		report = minimiseDirector(ws, newton);
		iterations += report.iterations;
	}
	if (report === null) throw new Error('solveAlong needs at least one voltage');
	return extractSolution({
		ws,
		cell,
		voltage_V: voltages_V[voltages_V.length - 1],
		convergence: {
			status: report.status,
			converged: report.status !== 'not-converged',
			iterations,
			continuationSteps: voltages_V.length,
			gradientNorm: report.gradientNorm,
			lastStep_rad: report.lastStep_rad,
			isMinimum: report.isMinimum
		}
	});
}

/**
 * Equilibrium director profile at one RMS voltage. With `start` the solve is warm-started from
 * that profile (resampled if its node count differs); without it the voltage is continued from 0 V.
 */
export function solveDirector(
	options: { cell: DirectorCell; voltage_V: number; start?: DirectorProfile } & DirectorSettings
): DirectorSolution {
	const { cell, voltage_V, start } = options;
	checkCell(cell);
	checkVoltage(voltage_V);
	const { slices, newton } = resolveSettings(options);
	const ws = createDirectorWorkspace(slices);
	if (start) {
		loadStartProfile(ws, cell, start);
		return solveAlong({ ws, cell, voltages_V: [voltage_V], newton });
	}
	loadInitialGuess(ws, cell, newton.nudge_rad);
	return solveAlong({ ws, cell, voltages_V: continuationLadder(cell, voltage_V), newton });
}

/** The solver's cold-start guess: pretilt plus a small sin(πz/d) tilt, linear twist. */
export function initialProfile(
	options: { cell: DirectorCell } & DirectorSettings
): DirectorProfile {
	checkCell(options.cell);
	const { slices, newton } = resolveSettings(options);
	const ws = createDirectorWorkspace(slices);
	loadInitialGuess(ws, options.cell, newton.nudge_rad);
	return {
		gap_m: options.cell.gap_um * M_PER_UM,
		tilt_rad: Float64Array.from(ws.theta),
		twist_rad: Float64Array.from(ws.phi)
	};
}

/** G = F_el − ½CV² per area (J/m²) of any profile on this cell, in the solver's discretisation. */
export function energyOfProfile(options: {
	cell: DirectorCell;
	voltage_V: number;
	profile: DirectorProfile;
}): number {
	const { cell, voltage_V, profile } = options;
	checkCell(cell);
	checkVoltage(voltage_V);
	const ws = createDirectorWorkspace(profile.tilt_rad.length - 1);
	loadConstants(ws, cell, voltage_V);
	ws.theta.set(profile.tilt_rad);
	ws.phi.set(profile.twist_rad);
	return (energyOf(ws, ws.theta, ws.phi) * cell.material.k11_N) / (cell.gap_um * M_PER_UM);
}
