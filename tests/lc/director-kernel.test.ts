import { describe, expect, it } from 'vitest';
import {
	factorBlockTridiagonal,
	solveBlockTridiagonal
} from '../../src/lib/core/lc/block-tridiagonal';
import {
	assembleDirector,
	createDirectorWorkspace,
	energyOf,
	setWorkspaceConstants,
	type DirectorWorkspace
} from '../../src/lib/core/lc/director-kernel';

/** Dense Hessian entry (j, k) of B − Q·g gᵀ from the workspace's banded storage. */
function hessianEntry(ws: DirectorWorkspace, j: number, k: number): number {
	const bj = j >> 1;
	const bk = k >> 1;
	let value = 0;
	if (bj === bk) value = ws.diag[4 * bj + 2 * (j & 1) + (k & 1)];
	else if (bk === bj + 1) value = ws.upper[4 * bj + 2 * (j & 1) + (k & 1)];
	else if (bj === bk + 1) value = ws.upper[4 * bk + 2 * (k & 1) + (j & 1)];
	if ((j & 1) === 0 && (k & 1) === 0)
		value -= ws.rankOneWeight * ws.couplingTheta[bj] * ws.couplingTheta[bk];
	return value;
}

function distortedWorkspace(slices: number): DirectorWorkspace {
	const ws = createDirectorWorkspace(slices);
	setWorkspaceConstants(ws, {
		k11_N: 11e-12,
		k22_N: 6e-12,
		k33_N: 17e-12,
		epsPerpendicular: 5,
		epsParallel: 19,
		gapToPitch: 0.3,
		voltage_V: 2,
		epsilon0_Fm: 8.8541878128e-12
	});
	for (let i = 0; i <= slices; i++) {
		ws.theta[i] = 0.1 + 0.5 * Math.sin(0.7 * i);
		ws.phi[i] = (1.3 * i) / slices + 0.2 * Math.cos(i);
	}
	return ws;
}

describe('director energy kernel', () => {
	it('gradient and Hessian agree with central differences of G (tolerance 1e-7, energy unit K11/d)', () => {
		const slices = 12;
		const ws = distortedWorkspace(slices);
		const energy0 = assembleDirector(ws);
		expect(energyOf(ws, ws.theta, ws.phi)).toBeCloseTo(energy0, 12);
		const unknowns = 2 * (slices - 1);
		const gradient = Float64Array.from(ws.gradient);
		const hessian = Array.from({ length: unknowns }, (_, j) =>
			Array.from({ length: unknowns }, (_, k) => hessianEntry(ws, j, k))
		);
		const step = 1e-6;
		let worstGradient = 0;
		let worstHessian = 0;
		for (let k = 0; k < unknowns; k++) {
			const values = k % 2 === 0 ? ws.theta : ws.phi;
			const node = (k >> 1) + 1;
			const saved = values[node];
			values[node] = saved + step;
			const up = energyOf(ws, ws.theta, ws.phi);
			assembleDirector(ws);
			const gradientUp = Float64Array.from(ws.gradient);
			values[node] = saved - step;
			const down = energyOf(ws, ws.theta, ws.phi);
			assembleDirector(ws);
			const gradientDown = Float64Array.from(ws.gradient);
			values[node] = saved;
			worstGradient = Math.max(worstGradient, Math.abs((up - down) / (2 * step) - gradient[k]));
			for (let j = 0; j < unknowns; j++) {
				const numeric = (gradientUp[j] - gradientDown[j]) / (2 * step);
				worstHessian = Math.max(worstHessian, Math.abs(numeric - hessian[j][k]));
			}
		}
		console.log(
			`kernel derivatives: worst gradient error ${worstGradient.toExponential(2)}, Hessian ${worstHessian.toExponential(2)} (K11/d units)`
		);
		expect(worstGradient).toBeLessThan(1e-7);
		expect(worstHessian).toBeLessThan(1e-7);
	});

	it('block-tridiagonal solve matches a dense residual check and detects indefiniteness', () => {
		const blocks = 7;
		const diag = new Float64Array(4 * blocks);
		const upper = new Float64Array(4 * (blocks - 1));
		for (let k = 0; k < blocks; k++) diag.set([4 + k * 0.1, 0.3, 0.3, 3 - k * 0.05], 4 * k);
		for (let k = 0; k < blocks - 1; k++) upper.set([-1, 0.2, -0.4, -0.9], 4 * k);
		const schurInverse = new Float64Array(4 * blocks);
		expect(factorBlockTridiagonal({ schurInverse, diag, upper, blocks, shift: 0 })).toBe(true);
		const rhs = Float64Array.from({ length: 2 * blocks }, (_, j) => Math.sin(j + 1));
		const x = new Float64Array(2 * blocks);
		solveBlockTridiagonal({ out: x, schurInverse, upper, rhs, blocks });
		const entry = (j: number, k: number) => {
			const bj = j >> 1;
			const bk = k >> 1;
			if (bj === bk) return diag[4 * bj + 2 * (j & 1) + (k & 1)];
			if (bk === bj + 1) return upper[4 * bj + 2 * (j & 1) + (k & 1)];
			if (bj === bk + 1) return upper[4 * bk + 2 * (k & 1) + (j & 1)];
			return 0;
		};
		let worst = 0;
		for (let j = 0; j < 2 * blocks; j++) {
			let sum = 0;
			for (let k = 0; k < 2 * blocks; k++) sum += entry(j, k) * x[k];
			worst = Math.max(worst, Math.abs(sum - rhs[j]));
		}
		expect(worst).toBeLessThan(1e-13);
		// Aliasing out and rhs is allowed.
		const inPlace = Float64Array.from(rhs);
		solveBlockTridiagonal({ out: inPlace, schurInverse, upper, rhs: inPlace, blocks });
		for (let j = 0; j < 2 * blocks; j++) expect(inPlace[j]).toBeCloseTo(x[j], 14);
		// A negative diagonal entry makes the matrix indefinite; a large shift restores it.
		diag[4 * 3] = -2;
		expect(factorBlockTridiagonal({ schurInverse, diag, upper, blocks, shift: 0 })).toBe(false);
		expect(factorBlockTridiagonal({ schurInverse, diag, upper, blocks, shift: 10 })).toBe(true);
	});
});
