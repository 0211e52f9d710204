import { describe, expect, it } from 'vitest';
import { cellAt, type CellGeometry } from '../../src/lib/core/lc/cell';
import { VACUUM_PERMITTIVITY_F_PER_M } from '../../src/lib/core/lc/constants';
import { energyOfProfile, solveDirector } from '../../src/lib/core/lc/director';
import {
	CYANOBIPHENYL_EUTECTIC_HIGH_DN,
	GENERIC_REFLECTIVE_TN
} from '../../src/lib/core/lc/presets';
import type { NematicState } from '../../src/lib/core/lc/material';
import { sweepVoltage } from '../../src/lib/core/lc/sweep';
import { materialAt } from '../../src/lib/core/lc/temperature';
import { splayThreshold_V, twistedThreshold_V } from '../../src/lib/core/lc/threshold';
import { expectReference } from './reference';

const TN_GEOMETRY: CellGeometry = { gap_um: 6, twist_deg: 90, pretilt_deg: 2, gapToPitch: 0.1 };
const tnCell = (overrides: Partial<CellGeometry> = {}, material = GENERIC_REFLECTIVE_TN) =>
	cellAt({ geometry: { ...TN_GEOMETRY, ...overrides }, material, temperature_C: 25 });

/** Voltage where θ_m² extrapolates to zero: least-squares line through θ_m²(V) just above V_th. */
function extrapolatedOnset_V(cell: ReturnType<typeof tnCell>, guess_V: number): number {
	const voltages = [1.005, 1.01, 1.015, 1.02].map((factor) => factor * guess_V);
	const squares = voltages.map((voltage_V) => solveDirector({ cell, voltage_V }).midTilt_rad ** 2);
	const meanV = voltages.reduce((a, b) => a + b) / voltages.length;
	const meanS = squares.reduce((a, b) => a + b) / squares.length;
	let sxy = 0;
	let sxx = 0;
	voltages.forEach((v, i) => {
		sxy += (v - meanV) * (squares[i] - meanS);
		sxx += (v - meanV) ** 2;
	});
	const slope = sxy / sxx;
	expect(slope).toBeGreaterThan(0);
	return meanV - meanS / slope;
}

describe('director statics: reference checks', () => {
	it('stays undistorted well below threshold (zero pretilt): max tilt < 1e-6 rad', () => {
		const cell = tnCell({ pretilt_deg: 0, gapToPitch: 0 }, CYANOBIPHENYL_EUTECTIC_HIGH_DN);
		const solution = solveDirector({ cell, voltage_V: 0.5 * twistedThreshold_V(cell) });
		console.log(`0.5·V_th, zero pretilt: max tilt ${solution.maxTilt_rad.toExponential(2)} rad`);
		expect(solution.maxTilt_rad).toBeLessThan(1e-6);
		expect(solution.convergence.status).toBe('converged');
	});

	it('onset of mid-plane tilt reproduces the analytic 90° TN and splay thresholds within 0.1 %', () => {
		// Analytic references: Schadt & Helfrich, APL 18:127 (1971) (90° TN) and Fréedericksz &
		// Zolina, Trans. Faraday Soc. 29:919 (1933) (splay). The discrete solver's onset is found by
		// extrapolating θ_m² linearly to zero just above threshold (zero pretilt, no dopant).
		const rows = [];
		for (const material of [CYANOBIPHENYL_EUTECTIC_HIGH_DN, GENERIC_REFLECTIVE_TN]) {
			const twisted = tnCell({ pretilt_deg: 0, gapToPitch: 0 }, material);
			const analyticTn_V = twistedThreshold_V(twisted);
			rows.push({
				name: `${material.id} 90° TN`,
				actual: extrapolatedOnset_V(twisted, analyticTn_V) / analyticTn_V - 1,
				expected: 0
			});
			const planar = tnCell({ pretilt_deg: 0, gapToPitch: 0, twist_deg: 0 }, material);
			const analyticSplay_V = splayThreshold_V(planar.material);
			rows.push({
				name: `${material.id} splay`,
				actual: extrapolatedOnset_V(planar, analyticSplay_V) / analyticSplay_V - 1,
				expected: 0
			});
		}
		expectReference({
			label: 'solver onset / analytic threshold − 1',
			source: 'Schadt & Helfrich 1971; Fréedericksz & Zolina 1933',
			unit: '(relative)',
			// Measured worst 3.4e-4 (60 slices, onset extrapolated from θ_m²); 1e-3 leaves room for
			// the extrapolation's dependence on the probe voltages, not for a wrong threshold.
			tolerance: 1e-3,
			rows
		});
	});

	it('tilts the mid-plane beyond 80° at 5·V_th', () => {
		for (const material of [CYANOBIPHENYL_EUTECTIC_HIGH_DN, GENERIC_REFLECTIVE_TN]) {
			const cell = tnCell({}, material);
			const solution = solveDirector({ cell, voltage_V: 5 * twistedThreshold_V(cell) });
			expect((solution.midTilt_rad * 180) / Math.PI).toBeGreaterThan(80);
		}
	});

	it('capacitance rises monotonically from ε0ε⊥/d toward ε0ε∥/d', () => {
		const cell = tnCell();
		const vth_V = twistedThreshold_V(cell);
		const gap_m = cell.gap_um * 1e-6;
		const cPerp = (VACUUM_PERMITTIVITY_F_PER_M * cell.material.epsPerpendicular) / gap_m;
		const cPar = (VACUUM_PERMITTIVITY_F_PER_M * cell.material.epsParallel) / gap_m;
		const factors = [0, 0.25, 0.5, 0.75, 0.9, 1, 1.1, 1.5, 2, 3, 5, 10, 20];
		const sweep = sweepVoltage({ cell, voltages_V: factors.map((f) => f * vth_V) });
		for (let i = 1; i < sweep.length; i++) {
			expect(sweep[i].capacitance_Fm2).toBeGreaterThan(sweep[i - 1].capacitance_Fm2);
		}
		// Below threshold within 1 % of ε0ε⊥/d (the 2° pretilt adds ≈ 0.2 %).
		for (const solution of sweep.filter((s) => s.voltage_V <= 0.5 * vth_V)) {
			expect(Math.abs(solution.capacitance_Fm2 / cPerp - 1)).toBeLessThan(0.01);
		}
		for (const solution of sweep) expect(solution.capacitance_Fm2).toBeLessThanOrEqual(cPar);
		expect(sweep[sweep.length - 1].capacitance_Fm2).toBeGreaterThan(0.95 * cPar);
		console.log(
			`C(0)/C⊥ = ${(sweep[0].capacitance_Fm2 / cPerp).toFixed(5)}, C(20 V_th)/C∥ = ${(sweep[sweep.length - 1].capacitance_Fm2 / cPar).toFixed(5)}`
		);
	});

	it('keeps the twist linear at 0 V in a 90° cell', () => {
		// Zero pretilt: exactly linear (tolerance 1e-9 rad). With 2° pretilt the tilt sags slightly
		// in the middle (K33 > 2K22 and the dopant), so f2(θ) varies and the twist bends by
		// ≈ 5e-5 rad: tolerance 1e-3 rad.
		for (const [pretilt_deg, tolerance_rad] of [
			[0, 1e-9],
			[2, 1e-3]
		]) {
			const solution = solveDirector({ cell: tnCell({ pretilt_deg }), voltage_V: 0 });
			const slices = solution.twist_rad.length - 1;
			let worst = 0;
			solution.twist_rad.forEach((phi, i) => {
				worst = Math.max(worst, Math.abs(phi - ((Math.PI / 2) * i) / slices));
			});
			console.log(`0 V twist nonlinearity, pretilt ${pretilt_deg}°: ${worst.toExponential(2)} rad`);
			expect(worst).toBeLessThan(tolerance_rad);
		}
	});

	it('returns a minimum of G: perturbations raise the energy', () => {
		const cell = tnCell();
		const voltage_V = 2 * twistedThreshold_V(cell);
		const solution = solveDirector({ cell, voltage_V });
		expect(solution.convergence.isMinimum).toBe(true);
		const g0 = energyOfProfile({ cell, voltage_V, profile: solution });
		expect(g0).toBeCloseTo(solution.energy_Jm2, 18);
		const slices = solution.tilt_rad.length - 1;
		for (let trial = 0; trial < 12; trial++) {
			const tilt = Float64Array.from(solution.tilt_rad);
			const twist = Float64Array.from(solution.twist_rad);
			for (let i = 1; i < slices; i++) {
				const z = i / slices;
				tilt[i] += 1e-3 * Math.sin((trial + 1) * Math.PI * z + trial);
				twist[i] += 1e-3 * Math.sin((trial + 2) * Math.PI * z) * (trial % 3 === 0 ? 0 : 1);
			}
			const g = energyOfProfile({
				cell,
				voltage_V,
				profile: { gap_m: solution.gap_m, tilt_rad: tilt, twist_rad: twist }
			});
			expect(g).toBeGreaterThan(g0);
		}
	});
});

describe('director statics: contract and robustness', () => {
	it('honours the profile convention shared with the optics', () => {
		const cell = tnCell({ twist_deg: -90, gapToPitch: -0.1, pretilt_deg: 3 });
		const solution = solveDirector({ cell, voltage_V: 2, slices: 80 });
		expect(solution.tilt_rad).toBeInstanceOf(Float64Array);
		expect(solution.tilt_rad.length).toBe(81);
		expect(solution.twist_rad.length).toBe(81);
		expect(solution.gap_m).toBeCloseTo(6e-6, 18);
		expect(solution.twist_rad[0]).toBe(0);
		expect(solution.twist_rad[80]).toBeCloseTo(-Math.PI / 2, 15);
		expect(solution.tilt_rad[0]).toBeCloseTo((3 * Math.PI) / 180, 15);
		expect(solution.tilt_rad[80]).toBeCloseTo((3 * Math.PI) / 180, 15);
		// The left-handed cell is the mirror image of the right-handed one.
		const mirror = solveDirector({ cell: tnCell({ pretilt_deg: 3 }), voltage_V: 2, slices: 80 });
		for (let i = 0; i <= 80; i++) {
			expect(solution.tilt_rad[i]).toBeCloseTo(mirror.tilt_rad[i], 9);
			expect(solution.twist_rad[i]).toBeCloseTo(-mirror.twist_rad[i], 9);
		}
	});

	it('converges for twists 0-270° with matching dopant, up to 10·V_th', () => {
		const outcomes: Record<string, number> = {};
		for (const twist_deg of [0, 90, 180, 240, 270]) {
			const cell = tnCell(
				{ twist_deg, gapToPitch: (0.25 * twist_deg) / 90 },
				CYANOBIPHENYL_EUTECTIC_HIGH_DN
			);
			const vth_V = twistedThreshold_V(cell);
			const sweep = sweepVoltage({
				cell,
				voltages_V: [0, 0.5, 1, 1.05, 1.5, 2, 3, 5, 10].map((f) => f * vth_V)
			});
			for (const solution of sweep) {
				expect(solution.convergence.converged).toBe(true);
				expect(Number.isFinite(solution.energy_Jm2)).toBe(true);
				outcomes[solution.convergence.status] = (outcomes[solution.convergence.status] ?? 0) + 1;
			}
		}
		console.log('twist 0-270° sweep outcomes', outcomes);
	});

	it('is second-order accurate in the slab count', () => {
		const cell = tnCell();
		const voltage_V = 2 * twistedThreshold_V(cell);
		const mid = (slices: number) => solveDirector({ cell, voltage_V, slices }).midTilt_rad;
		const fine = mid(480);
		const errors = [60, 120, 240].map((slices) => Math.abs(mid(slices) - fine));
		console.log(
			`mid-tilt discretisation error vs N = 480: ${errors.map((e) => e.toExponential(2)).join(', ')} rad (N = 60, 120, 240)`
		);
		expect(errors[0]).toBeLessThan(1e-4);
		expect(errors[0] / errors[1]).toBeGreaterThan(3);
	});

	it('sweeps agree with independent solves, and warm starts with other node counts', () => {
		const cell = tnCell();
		const voltages_V = [3, 1.2, 2, 0.5];
		const sweep = sweepVoltage({ cell, voltages_V });
		voltages_V.forEach((voltage_V, i) => {
			const alone = solveDirector({ cell, voltage_V });
			expect(Math.abs(alone.midTilt_rad - sweep[i].midTilt_rad)).toBeLessThan(1e-8);
			expect(sweep[i].voltage_V).toBe(voltage_V);
		});
		const coarse = solveDirector({ cell, voltage_V: 2, slices: 20 });
		const warm = solveDirector({ cell, voltage_V: 2, start: coarse });
		expect(warm.tilt_rad.length).toBe(61);
		expect(warm.convergence.continuationSteps).toBe(1);
		expect(Math.abs(warm.midTilt_rad - sweep[2].midTilt_rad)).toBeLessThan(1e-8);
	});

	it('rejects unusable inputs with clear errors', () => {
		const cell = tnCell();
		expect(() => solveDirector({ cell, voltage_V: -1 })).toThrow(/voltage_V/);
		expect(() => solveDirector({ cell, voltage_V: Number.NaN })).toThrow(/voltage_V/);
		expect(() => solveDirector({ cell, voltage_V: 1, slices: 3 })).toThrow(/slices/);
		expect(() => solveDirector({ cell: { ...cell, gap_um: 0 }, voltage_V: 1 })).toThrow(/gap_um/);
		const hot = materialAt({ material: GENERIC_REFLECTIVE_TN, temperature_C: 120 });
		expect(() =>
			cellAt({ geometry: TN_GEOMETRY, material: GENERIC_REFLECTIVE_TN, temperature_C: 120 })
		).toThrow(/isotropic/);
		expect(() =>
			solveDirector({
				cell: { ...cell, material: hot as unknown as NematicState },
				voltage_V: 1
			})
		).toThrow(/nematic/);
	});
});
