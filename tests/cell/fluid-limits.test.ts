import { describe, expect, it } from 'vitest';
import { analyzeDesignWithCell } from '../../src/lib/core/analyze-design';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';
import { isKnownFindingCode } from '../../src/lib/core/findings/codes';
import { presetById } from '../../src/lib/core/lc/presets';

const demo = demoDesign();

/**
 * A single-compound cyanobiphenyl clears near 35 °C (4-pentyl-4'-cyanobiphenyl, T_NI = 35.3 °C:
 * Gray, Harrison & Nash, Electronics Letters 9:130, 1973). The demo runs from 0 to 40 °C, so the
 * hot end lies above the clearing point while 0 °C and 25 °C stay nematic.
 */
const CLEARING_5CB_C = 35.3;
const clearsInside: Design = {
	...demo,
	cell: { ...demo.cell, material: { preset: 'cyanobiphenyl-single' } }
};

describe('a fluid that clears inside the operating range', () => {
	const report = analyzeDesignWithCell(clearsInside);

	it('keeps the optics at every temperature below the clearing point', () => {
		expect(report.cellError).toBeNull();
		expect(report.cell).not.toBeNull();
		const temperatures = report.cell!.temperatures_C;
		expect(temperatures).toEqual([0, 25]);
		for (const t of temperatures) expect(t).toBeLessThan(CLEARING_5CB_C);
		expect(report.cell!.room_C).toBe(25);
		for (const c of report.cell!.curves) {
			expect(Number.isFinite(c.v10_V) && c.v10_V > 0).toBe(true);
			expect(c.v90_V).toBeGreaterThan(c.v10_V);
		}
		expect(Number.isFinite(report.cell!.contrastRatio)).toBe(true);
	});

	it('keeps the drive check at the temperatures the model can give', () => {
		expect(report.thresholdSource).toBe('cell model');
		expect(report.drive.window.perTemperature.map((p) => p.temperature_C)).toEqual([0, 25]);
		expect(report.legibility).not.toBeNull();
	});

	it('reports the failure once, as a coded finding with a fix', () => {
		const clears = report.opticsFindings.filter((f) => f.code === 'optics.fluid-clears');
		expect(clears).toHaveLength(1);
		expect(clears[0].severity).toBe('fail');
		expect(clears[0].message).toMatch(/below the hottest operating temperature 40 °C/);
		expect(clears[0].fix).toMatch(/clears well above 40 °C/);
		expect(isKnownFindingCode('optics.fluid-clears')).toBe(true);
		expect(report.opticsFindings.some((f) => f.code === 'optics.model-failed')).toBe(false);
		expect(report.severity).toBe('fail');
	});
});

describe('fluid limits elsewhere', () => {
	it('says nothing when the fluid clears above the range', () => {
		const report = analyzeDesignWithCell(demo);
		expect(report.opticsFindings.some((f) => f.code === 'optics.fluid-clears')).toBe(false);
	});

	it('fails a fluid that clears exactly at the hottest temperature, and keeps the rest', () => {
		// At the clearing point itself the fluid is isotropic (the nematic–isotropic transition).
		const fluid = presetById('generic-reflective-tn')!;
		const atEdge: Design = {
			...demo,
			cell: { ...demo.cell, material: { custom: { ...fluid, clearing_C: 40 } } }
		};
		const report = analyzeDesignWithCell(atEdge);
		expect(report.opticsFindings.map((f) => f.code)).toContain('optics.fluid-clears');
		expect(report.cell?.temperatures_C).toEqual([0, 25]);
	});

	it('still checks wiring, rules and load when no temperature is nematic', () => {
		const hot: Design = {
			...clearsInside,
			drive: { ...demo.drive, temperature: { min_C: 36, max_C: 60 } }
		};
		const report = analyzeDesignWithCell(hot);
		expect(report.cell).toBeNull();
		expect(report.opticsFindings.map((f) => f.code)).toContain('optics.fluid-clears');
		expect(report.wiring.findings.length).toBeGreaterThan(0);
		expect(report.rules.findings.length).toBeGreaterThan(0);
		expect(report.load.findings).toBeDefined();
		expect(report.drive.window.perTemperature.length).toBeGreaterThan(0);
	});
});
