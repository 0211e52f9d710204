/**
 * Damped Newton minimisation of the discrete director energy (directorKernel.ts).
 *
 * Method [standard numerics, from memory]: Newton on the discretised Euler-Lagrange equations
 * with the exact Hessian B − Q·g gᵀ: B block-tridiagonal (2×2 blocks, blockTridiagonal.ts), the
 * rank-one capacitance coupling applied by Sherman-Morrison. When the Hessian is not positive
 * definite (a saddle such as the untilted state above threshold) the diagonal is shifted
 * (Levenberg-Marquardt) until it is, which keeps every step a descent direction; steps are capped
 * and accepted by an Armijo backtracking line search on G. A state stuck on a saddle with zero
 * gradient (zero pretilt, untilted) is nudged by a small sin(πz/d) tilt of the pretilt's sign.
 * Step sizes are measured as director rotations, max(|Δθ|, |cosθ·Δφ|): near a vertical director
 * the azimuth is undetermined and may move freely without any physical change.
 * Outcomes:
 * - 'converged': an unshifted (positive-definite) Newton step below tolerance_rad (or within 100×
 *   of it and no longer shrinking: the round-off floor), a strict local minimum of the discrete G;
 * - 'settled': high twist at high voltage. The mid-plane director becomes vertical and the twist
 *   collapses onto it; the energy keeps creeping down by moving twist between near-vertical nodes
 *   (twist costs ∝ cos²θ, so concentrating it where the director is vertical lowers G without a
 *   minimum being attained on the grid), so the Hessian stays indefinite. The iteration stops once some director is within
 *   0.6° of vertical and, for SETTLE_COUNT iterations in a row, the directors that are not
 *   vertical move less than settle_rad per step (or no descent remains). Continuing such solves
 *   for thousands of iterations moves the non-vertical directors by ≤ ≈ 1e-4 rad and the
 *   near-vertical ones (whose azimuth is optically irrelevant) by ≤ ≈ 1e-3 rad;
 * - 'not-converged': iteration limit or no descent possible.
 */
import { factorBlockTridiagonal, solveBlockTridiagonal } from './block-tridiagonal';
import { assembleDirector, energyOf, type DirectorWorkspace } from './director-kernel';

export interface NewtonSettings {
	/** Converged when the unshifted Newton step is below this, rad. */
	tolerance_rad: number;
	maxIterations: number;
	/** Largest director rotation of any node per iteration, rad. */
	maxStep_rad: number;
	/** Amplitude of the symmetry-breaking tilt nudge, rad. */
	nudge_rad: number;
	/** Step of the non-vertical directors below which a collapsing-twist state is settled, rad. */
	settle_rad: number;
}

export type DirectorStatus = 'converged' | 'settled' | 'not-converged';

export const DEFAULT_NEWTON_SETTINGS: NewtonSettings = Object.freeze({
	tolerance_rad: 1e-10,
	maxIterations: 200,
	maxStep_rad: 0.5,
	nudge_rad: 1e-3,
	settle_rad: 1e-5
});

export interface NewtonReport {
	status: DirectorStatus;
	iterations: number;
	/** Largest |∂G̃/∂x| at the last assembled state (dimensionless, energy unit K11/d). */
	gradientNorm: number;
	/** Largest director rotation max(|Δθ|, |cosθ·Δφ|) of the last step, rad. */
	lastStep_rad: number;
	/** True when the final Hessian was positive definite (no shift beyond the 1e-12 floor). */
	isMinimum: boolean;
	/** Dimensionless G̃ at the returned state. */
	energy: number;
}

const ARMIJO = 1e-4;
/**
 * Relative diagonal shift always applied: far below any physical stiffness, it regularises the
 * azimuth of nodes whose director is within ≈ 1e-4 rad of vertical, where φ is undetermined.
 */
const BASE_SHIFT = 1e-12;
/** |cos θ| below which a director counts as vertical (its azimuth optically irrelevant). */
const VERTICAL_COS = 1e-2;
/** Consecutive quiet iterations required before a collapsing-twist state counts as settled. */
const SETTLE_COUNT = 3;
const MAX_NUDGES = 4;
const FULL_STEP_BELOW_RAD = 1e-6;
/** A PD step within this factor of the tolerance that stopped shrinking is at round-off. */
const ROUND_OFF_FACTOR = 100;

/** Newton direction for B + shift·I − Q g gᵀ into ws.step; false if that matrix is not PD. */
function newtonDirection(ws: DirectorWorkspace, shift: number): boolean {
	const blocks = ws.slices - 1;
	const { schurInverse, diag, upper, gradient, step, scratchA, scratchRhs, couplingTheta } = ws;
	if (!factorBlockTridiagonal({ schurInverse, diag, upper, blocks, shift })) return false;
	for (let j = 0; j < 2 * blocks; j++) scratchRhs[j] = -gradient[j];
	solveBlockTridiagonal({ out: step, schurInverse, upper, rhs: scratchRhs, blocks });
	const weight = ws.rankOneWeight;
	if (weight === 0) return true;
	for (let k = 0; k < blocks; k++) {
		scratchRhs[2 * k] = couplingTheta[k];
		scratchRhs[2 * k + 1] = 0;
	}
	solveBlockTridiagonal({ out: scratchA, schurInverse, upper, rhs: scratchRhs, blocks });
	let gw = 0;
	let gy = 0;
	for (let k = 0; k < blocks; k++) {
		gw += couplingTheta[k] * scratchA[2 * k];
		gy += couplingTheta[k] * step[2 * k];
	}
	const denominator = 1 - weight * gw;
	if (!(denominator > 1e-12)) return false;
	const factor = (weight * gy) / denominator;
	for (let j = 0; j < 2 * blocks; j++) step[j] += factor * scratchA[j];
	return true;
}

function maxAbs(values: Float64Array): number {
	let m = 0;
	for (let j = 0; j < values.length; j++) {
		const a = Math.abs(values[j]);
		if (a > m) m = a;
	}
	return m;
}

/**
 * Largest director rotation max(|Δθ|, |cosθ·Δφ|) that ws.step would cause, over all nodes or,
 * with `skipVertical`, only over nodes whose director is not within VERTICAL_COS of vertical.
 */
function directorStep(ws: DirectorWorkspace, skipVertical = false): number {
	const { step, theta } = ws;
	let m = 0;
	for (let k = 0; k < ws.slices - 1; k++) {
		const c = Math.cos(theta[k + 1]);
		if (skipVertical && Math.abs(c) < VERTICAL_COS) continue;
		const a = Math.max(Math.abs(step[2 * k]), Math.abs(c * step[2 * k + 1]));
		if (a > m) m = a;
	}
	return m;
}

/** Smallest |cos θ| over the interior nodes. */
function minAbsCos(ws: DirectorWorkspace): number {
	let m = 1;
	for (let i = 1; i < ws.slices; i++) m = Math.min(m, Math.abs(Math.cos(ws.theta[i])));
	return m;
}

/** Largest azimuth change of ws.step, rad. */
function azimuthStep(ws: DirectorWorkspace): number {
	let m = 0;
	for (let k = 0; k < ws.slices - 1; k++) m = Math.max(m, Math.abs(ws.step[2 * k + 1]));
	return m;
}

/** Write x + alpha·step (interior nodes) into the trial arrays; boundaries copied. */
function fillTrial(ws: DirectorWorkspace, alpha: number): void {
	const { theta, phi, trialTheta, trialPhi, step } = ws;
	const n = ws.slices;
	trialTheta[0] = theta[0];
	trialPhi[0] = phi[0];
	trialTheta[n] = theta[n];
	trialPhi[n] = phi[n];
	for (let k = 0; k < n - 1; k++) {
		trialTheta[k + 1] = theta[k + 1] + alpha * step[2 * k];
		trialPhi[k + 1] = phi[k + 1] + alpha * step[2 * k + 1];
	}
}

/** Add the symmetry-breaking tilt a·sin(πz/d), signed like the pretilt (positive if zero). */
export function nudgeTilt(ws: DirectorWorkspace, amplitude_rad: number): void {
	const n = ws.slices;
	const sign = ws.theta[0] < 0 ? -1 : 1;
	for (let i = 1; i < n; i++) ws.theta[i] += sign * amplitude_rad * Math.sin((Math.PI * i) / n);
}

/** Minimise G from the state in ws.theta/ws.phi (boundary nodes fixed); updates it in place. */
export function minimiseDirector(ws: DirectorWorkspace, settings: NewtonSettings): NewtonReport {
	const n = ws.slices;
	const shiftFloor = 1e-6 * 2 * n;
	let nudges = 0;
	let previousStep = Infinity;
	let quietCount = 0;
	const report: NewtonReport = {
		status: 'not-converged',
		iterations: 0,
		gradientNorm: Infinity,
		lastStep_rad: Infinity,
		isMinimum: false,
		energy: energyOf(ws, ws.theta, ws.phi)
	};
	for (let iteration = 1; iteration <= settings.maxIterations; iteration++) {
		const energy = assembleDirector(ws);
		const gradientNorm = maxAbs(ws.gradient);
		const baseShift = BASE_SHIFT * maxAbs(ws.diag);
		let shift = baseShift;
		while (!newtonDirection(ws, shift)) {
			shift = shift <= baseShift ? Math.max(shiftFloor, 4 * baseShift) : shift * 4;
			if (shift > 1e12) break;
		}
		const indefinite = shift > baseShift;
		let stepMax = directorStep(ws);
		report.iterations = iteration;
		report.gradientNorm = gradientNorm;
		report.lastStep_rad = stepMax;
		report.isMinimum = !indefinite;
		report.energy = energy;
		// Round-off floor: a positive-definite step near tolerance that no longer shrinks.
		const atFloor =
			stepMax < ROUND_OFF_FACTOR * settings.tolerance_rad && stepMax > 0.5 * previousStep;
		previousStep = stepMax;
		if (!indefinite && (stepMax < settings.tolerance_rad || atFloor)) {
			fillTrial(ws, 1);
			ws.theta.set(ws.trialTheta);
			ws.phi.set(ws.trialPhi);
			report.status = 'converged';
			report.energy = energyOf(ws, ws.theta, ws.phi);
			return report;
		}
		const collapsing = indefinite && minAbsCos(ws) < VERTICAL_COS;
		quietCount = collapsing && directorStep(ws, true) < settings.settle_rad ? quietCount + 1 : 0;
		if (quietCount >= SETTLE_COUNT) {
			report.status = 'settled';
			return report;
		}
		if (indefinite && stepMax < settings.tolerance_rad) {
			if (nudges++ >= MAX_NUDGES) return report;
			nudgeTilt(ws, settings.nudge_rad);
			continue;
		}
		// Cap the director rotation, and the azimuth change at π so no node winds a full turn.
		const scale = Math.min(1, settings.maxStep_rad / stepMax, Math.PI / azimuthStep(ws));
		if (scale < 1) {
			for (let j = 0; j < ws.step.length; j++) ws.step[j] *= scale;
			stepMax *= scale;
		}
		if (!indefinite && stepMax < FULL_STEP_BELOW_RAD) {
			// Quadratic-convergence regime: energy differences are at round-off, take the full step.
			fillTrial(ws, 1);
			ws.theta.set(ws.trialTheta);
			ws.phi.set(ws.trialPhi);
			continue;
		}
		let slope = 0;
		for (let j = 0; j < ws.step.length; j++) slope += ws.gradient[j] * ws.step[j];
		let alpha = 1;
		let accepted = false;
		while (alpha > 1e-10) {
			fillTrial(ws, alpha);
			const trialEnergy = energyOf(ws, ws.trialTheta, ws.trialPhi);
			if (trialEnergy <= energy + ARMIJO * alpha * slope) {
				accepted = true;
				break;
			}
			alpha *= 0.5;
		}
		if (!accepted) {
			if (collapsing) {
				report.status = 'settled';
				return report;
			}
			if (indefinite && nudges++ < MAX_NUDGES) {
				nudgeTilt(ws, settings.nudge_rad);
				continue;
			}
			return report;
		}
		ws.theta.set(ws.trialTheta);
		ws.phi.set(ws.trialPhi);
		report.lastStep_rad = alpha * stepMax;
	}
	report.energy = energyOf(ws, ws.theta, ws.phi);
	return report;
}
