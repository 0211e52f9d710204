import { describe, expect, it } from 'vitest';
import { cellAt } from '../../src/lib/core/lc/cell';
import { GENERIC_REFLECTIVE_TN } from '../../src/lib/core/lc/presets';
import {
	jakemanRaynesTimes,
	responseTimes,
	responseVsTemperature
} from '../../src/lib/core/lc/response';
import { expectReference, type ReferenceRow } from './reference';

describe('Jakeman-Raynes response times', () => {
	it('equal the Jakeman–Raynes closed form evaluated by hand, to 0.5 ms (consistency check)', () => {
		// A consistency check of the code against its model, not against measurements: the closed
		// form τ_off = γ1·d²/(K·π²), τ_on = τ_off/((V/V_th)² − 1) [Jakeman & Raynes, Phys. Lett. A
		// 39:69 (1972)] evaluated with a calculator and rounded to whole milliseconds, so the
		// tolerance is half a millisecond.
		const table: [string, number, number, number, number, number, number][] = [
			['cyanobiphenyl-like 5 µm', 0.2, 5, 12.1, 42, 14, 5],
			['cyanobiphenyl-like 7 µm', 0.2, 7, 12.1, 82, 27, 10],
			['TN mix 25 °C', 0.15, 6, 10, 55, 18, 7],
			['TN mix -20 °C', 1.5, 6, 12, 456, 152, 57]
		];
		const rows: ReferenceRow[] = [];
		for (const [name, gamma1_Pas, gap_um, k_pN, off_ms, on2_ms, on3_ms] of table) {
			const deltaEps = 10; // any positive Δε: τ_on depends only on V/V_th
			const probe = jakemanRaynesTimes({
				gamma1_Pas,
				gap_m: gap_um * 1e-6,
				elastic_N: k_pN * 1e-12,
				deltaEps,
				voltage_V: 0
			});
			const at = (factor: number) =>
				jakemanRaynesTimes({
					gamma1_Pas,
					gap_m: gap_um * 1e-6,
					elastic_N: k_pN * 1e-12,
					deltaEps,
					voltage_V: factor * probe.vth_V
				});
			expect(probe.tauOn_s).toBeNull();
			rows.push({ name: `${name} τ_off`, actual: probe.tauOff_s * 1e3, expected: off_ms });
			rows.push({
				name: `${name} τ_on 2V_th`,
				actual: (at(2).tauOn_s ?? NaN) * 1e3,
				expected: on2_ms
			});
			rows.push({
				name: `${name} τ_on 3V_th`,
				actual: (at(3).tauOn_s ?? NaN) * 1e3,
				expected: on3_ms
			});
		}
		expectReference({
			label: 'τ (director)',
			source: 'Jakeman & Raynes 1972 closed form, by hand (consistency check)',
			unit: 'ms',
			tolerance: 0.5,
			rows
		});
	});

	it('uses the cell threshold consistently and returns null below it', () => {
		const geometry = { gap_um: 6, twist_deg: 90, pretilt_deg: 2, gapToPitch: 0.1 };
		const cell = cellAt({ geometry, material: GENERIC_REFLECTIVE_TN, temperature_C: 25 });
		const low = responseTimes({ cell, voltage_V: 1 });
		expect(low.tauOn_s).toBeNull();
		const times = responseTimes({ cell, voltage_V: 2 * low.vth_V });
		expect((times.tauOn_s ?? 0) * 3).toBeCloseTo(times.tauOff_s, 12);
	});

	it('flags cold temperatures where switching exceeds the limit', () => {
		const geometry = { gap_um: 6, twist_deg: 90, pretilt_deg: 2, gapToPitch: 0.1 };
		const temperatures_C = [-40, -30, -20, -10, 0, 25, 60, 95];
		const result = responseVsTemperature({
			material: GENERIC_REFLECTIVE_TN,
			geometry,
			voltage_V: 3,
			temperatures_C
		});
		expect(result.limit_s).toBe(1);
		const byT = new Map(result.rows.map((row) => [row.temperature_C, row]));
		// τ_off grows monotonically toward the cold.
		const offs = result.rows.filter((row) => row.times).map((row) => row.times?.tauOff_s ?? 0);
		for (let i = 1; i < offs.length; i++) expect(offs[i]).toBeLessThan(offs[i - 1]);
		expect(byT.get(25)?.tooSlow).toBe(false);
		expect(byT.get(-40)?.tooSlow).toBe(true);
		expect(byT.get(95)?.phase).toBe('isotropic');
		expect(byT.get(95)?.times).toBeNull();
		// Flags are exactly the nematic rows over the limit, and they are the coldest ones.
		expect(result.tooSlowAt_C.length).toBeGreaterThan(0);
		for (const t of result.tooSlowAt_C) {
			const times = byT.get(t)?.times;
			expect(
				times === null || times === undefined || times.tauOff_s > 1 || (times.tauOn_s ?? 2) > 1
			).toBe(true);
			expect(t).toBeLessThan(0);
		}
		const strict = responseVsTemperature({
			material: GENERIC_REFLECTIVE_TN,
			geometry,
			voltage_V: 3,
			temperatures_C,
			limit_s: 0.05
		});
		expect(strict.tooSlowAt_C.length).toBeGreaterThan(result.tooSlowAt_C.length);
	});
});
