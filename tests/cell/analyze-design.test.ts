import { describe, expect, it } from 'vitest';
import { analyzeDesign, analyzeDesignWithCell } from '../../src/lib/core/analyze-design';
import { analyzeCell } from '../../src/lib/core/cell/analyze-cell';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';

const demo = demoDesign();
const cell = analyzeCell(demo);

describe('design report with the cell model', () => {
	it('uses the model V10/V90 at the cold, room and hot temperatures when asked to', () => {
		const report = analyzeDesign(demo, { cell });
		expect(report.thresholdSource).toBe('cell model');
		expect(report.drive.window.perTemperature.map((t) => t.temperature_C)).toEqual([0, 25, 40]);
		report.drive.window.perTemperature.forEach((t, i) => {
			expect(t.v10_V).toBe(cell.curves[i].v10_V);
			expect(t.v90_V).toBe(cell.curves[i].v90_V);
		});
		// Thresholds fall as the order parameter falls: a negative temperature coefficient.
		expect(cell.curves[0].v10_V).toBeGreaterThan(cell.curves[2].v10_V);
	});

	it('keeps entered values when the design says so, and flags disagreement with the model', () => {
		const manual: Design = {
			...demo,
			thresholds: { ...demo.thresholds, source: 'manual', v10_V: 1.2, v90_V: 1.5 }
		};
		const report = analyzeDesign(manual, { cell });
		expect(report.thresholdSource).toBe('entered');
		expect(report.drive.window.perTemperature[1].v10_V).toBeCloseTo(1.2, 12);
		expect(report.severity).not.toBe('pass');
		expect(JSON.stringify(report)).toMatch(/differ from the cell model/);
	});

	it('turns a fluid that clears inside the operating range into a failing finding', () => {
		const hot: Design = {
			...demo,
			drive: { ...demo.drive, temperature: { min_C: 0, max_C: 120 } }
		};
		const report = analyzeDesignWithCell(hot);
		// The generic mixture clears at 90 °C: 0 and 25 °C are still modelled, 120 °C is not.
		expect(report.cell?.temperatures_C).toEqual([0, 25]);
		const clears = report.opticsFindings.find((f) => f.code === 'optics.fluid-clears');
		expect(clears?.message).toMatch(/clears at .* below the hottest operating temperature 120 °C/);
		expect(report.severity).toBe('fail');
	});

	it('predicts a darker on segment and reports luminance from the illuminance (L = ρE/π)', () => {
		expect(cell.on.Y).toBeLessThan(cell.off.Y);
		// Lambertian reflector, standard: L = ρ·E/π.
		expect(cell.background.luminance_cdm2).toBeCloseTo(
			(cell.background.Y / 100) * (demo.lighting.illuminance_lx / Math.PI),
			9
		);
		expect(cell.response.rows.some((r) => r.temperature_C === 25)).toBe(true);
	});

	it('flags slow switching in the cold against the designer limit', () => {
		const strict: Design = { ...demo, cell: { ...demo.cell, switchingLimit_s: 0.02 } };
		const report = analyzeCell(strict);
		expect(report.findings.some((f) => /slower than 0.02 s/.test(f.message))).toBe(true);
	});
});
