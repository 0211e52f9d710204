import { describe, expect, it } from 'vitest';
import { expectWithin } from '../helpers/tolerance';
import {
	capacitancePerArea_pF_per_mm2,
	parallelPlateCapacitance_F
} from '../../src/lib/core/load/capacitance';
import { electrodeLoads } from '../../src/lib/core/load/electrode-capacitance';
import { pixelPermittivity } from '../../src/lib/core/load/fluid-permittivity';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design, Electrode } from '../../src/lib/core/design/schema';

/** Vacuum permittivity, F/m: CODATA 2018 recommended value (Tiesinga et al., RMP 93, 025010, 2021). */
const EPS0_CODATA_2018 = 8.8541878128e-12;

describe('parallel-plate capacitance of a pixel', () => {
	it('matches C = ε0·εr·A/d with the CODATA ε0, worked by hand', () => {
		// 1 cm² plates 10 µm apart in vacuum: 8.8541878128e-12 × 1e-4 / 1e-5 = 88.541878128 pF.
		// 2 mm² across 6 µm of εr 7: 8.8541878128e-12 × 7 × 2e-6 / 6e-6 = 20.6597715632 pF.
		expectWithin(
			[
				{
					label: '1 cm², 10 µm, εr 1',
					expected: 88.541878128,
					actual: parallelPlateCapacitance_F({ area_mm2: 100, gap_um: 10, permittivity: 1 }) * 1e12
				},
				{
					label: '2 mm², 6 µm, εr 7',
					expected: (EPS0_CODATA_2018 * 7 * 2e-6) / 6e-6 / 1e-12,
					actual: parallelPlateCapacitance_F({ area_mm2: 2, gap_um: 6, permittivity: 7 }) * 1e12
				}
			],
			{ tolerance: 1e-9, unit: 'pF', source: 'parallel-plate formula, CODATA 2018 ε0' }
		);
	});

	it('gives the handbook capacitance-per-area figures', () => {
		// Handbook figures for TN glass, rounded to 0.1 pF/mm² (physics-notes §9 [D]); recomputed by
		// hand: ε0·εr/d per mm² = 8.854e-12 × εr × 1e-6 / (d·1e-6) F.
		//   ε⊥ 5.2, 5 µm → 9.208 pF/mm²; ε⊥ 5.2, 7 µm → 6.577; εr 7, 6 µm → 10.330;
		//   ε∥ 19, 7 µm → 24.03; ε∥ 19, 5 µm → 33.65 (the quoted "24–34").
		const cases = [
			{ label: 'εr 5.2, 5 µm', expected: 9.2, permittivity: 5.2, gap_um: 5 },
			{ label: 'εr 5.2, 7 µm', expected: 6.6, permittivity: 5.2, gap_um: 7 },
			{ label: 'εr 7, 6 µm', expected: 10.3, permittivity: 7, gap_um: 6 },
			{ label: 'εr 19, 7 µm', expected: 24, permittivity: 19, gap_um: 7 },
			{ label: 'εr 19, 5 µm', expected: 34, permittivity: 19, gap_um: 5 }
		].map((c) => ({ ...c, actual: capacitancePerArea_pF_per_mm2(c) }));
		// Tolerance: the handbook rounds to 0.1 pF/mm² (to 1 for the 24–34 range).
		expectWithin(cases.slice(0, 3), {
			tolerance: 0.05,
			unit: 'pF/mm²',
			source: 'hand-computed handbook figures (common practice), rounded'
		});
		expectWithin(cases.slice(3), {
			tolerance: 0.5,
			unit: 'pF/mm²',
			source: 'hand-computed handbook figures (common practice), rounded'
		});
	});

	it('refuses a zero gap and a permittivity below vacuum instead of returning nonsense', () => {
		expect(() => parallelPlateCapacitance_F({ area_mm2: 1, gap_um: 0, permittivity: 5 })).toThrow(
			/gap_um/
		);
		expect(() => parallelPlateCapacitance_F({ area_mm2: 1, gap_um: 5, permittivity: 0.5 })).toThrow(
			/permittivity/
		);
	});
});

describe('electrode capacitance from the real area', () => {
	const square = (x: number, y: number, w: number, h: number) => [
		{ x, y },
		{ x: x + w, y },
		{ x: x + w, y: y + h },
		{ x, y: y + h }
	];

	it('subtracts holes and uses ε⊥ off and ε∥ on', () => {
		const base = demoDesign();
		const ring: Electrode = {
			id: 'ring',
			name: 'Ring',
			kind: 'icon',
			outline: square(0, 0, 4, 2),
			holes: [square(1, 0.5, 1, 1)],
			common: null,
			line: null,
			locked: false
		};
		const design: Design = { ...base, electrodes: [ring], cell: { ...base.cell, gap_um: 5 } };
		const [load] = electrodeLoads({ design, permittivity: { off: 5.2, on: 19, nematic: true } });
		// 4 × 2 mm minus a 1 × 1 mm hole = 7 mm²; ε0·εr·A/d by hand with the CODATA ε0.
		expectWithin(
			[
				{ label: 'area', expected: 7, actual: load.area_mm2 },
				{
					label: 'off',
					expected: (EPS0_CODATA_2018 * 5.2 * 7e-6) / 5e-6 / 1e-12,
					actual: load.off_F * 1e12
				},
				{
					label: 'on',
					expected: (EPS0_CODATA_2018 * 19 * 7e-6) / 5e-6 / 1e-12,
					actual: load.on_F * 1e12
				}
			],
			{ tolerance: 1e-9, unit: 'pF or mm²', source: 'parallel-plate formula, CODATA 2018 ε0' }
		);
	});

	it("takes the fluid's own ε⊥ and ε∥ at its reference temperature, and their mean above clearing", () => {
		// Fluid data entered by the designer: at the reference temperature the model must return them.
		const base = demoDesign();
		const custom = {
			id: 'test-fluid',
			label: 'test fluid',
			source: 'test data',
			reference_C: 20,
			clearing_C: 80,
			orderExponent: 0.2,
			extraordinary: { a: 1.7, b_um2: 0.01, c_um4: 0 },
			ordinary: { a: 1.5, b_um2: 0.005, c_um4: 0 },
			k11_pN: 10,
			k22_pN: 6,
			k33_pN: 15,
			epsParallel: 14,
			epsPerpendicular: 5,
			gamma1_Pas: 0.15,
			activation_eV: 0.3,
			viscosityLaw: 'order-arrhenius' as const
		};
		const cell = { ...base.cell, material: { custom } };
		const atRef = pixelPermittivity({ cell, temperature_C: 20 });
		expect(atRef.off).toBeCloseTo(5, 12);
		expect(atRef.on).toBeCloseTo(14, 12);
		const hot = pixelPermittivity({ cell, temperature_C: 90 });
		expect(hot.nematic).toBe(false);
		expect(hot.on).toBeCloseTo(8, 12); // (14 + 2·5)/3
		const cold = pixelPermittivity({ cell, temperature_C: -10 });
		expect(cold.on).toBeGreaterThan(14);
		expect(cold.off).toBeLessThan(5);
	});
});
