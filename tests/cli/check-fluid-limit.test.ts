import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import { serializeDesign } from '../../src/lib/core/design/parse-design';
import { runCli } from './run-cli';

/**
 * A single-compound cyanobiphenyl clears near 35 °C (T_NI = 35.3 °C: Gray, Harrison & Nash,
 * Electronics Letters 9:130, 1973); the demo runs from 0 to 40 °C.
 */
const design = serializeDesign({
	...demoDesign(),
	cell: { ...demoDesign().cell, material: { preset: 'cyanobiphenyl-single' } }
});

describe('sunglyph check with a fluid that clears inside the range', () => {
	it('prints the optics below the clearing point and the coded failure, and exits 1', async () => {
		const result = await runCli(['check', 'd.json'], { 'd.json': design });
		expect(result.code).toBe(1);
		expect(result.stdout).toMatch(/FAIL {2}\[optics\.fluid-clears\] The fluid clears at 35\.2 °C/);
		expect(result.stdout).toMatch(/fix: Choose a fluid that clears well above 40 °C/);
		// The switching voltages at 0 and 25 °C are still there; 40 °C is not.
		expect(result.stdout).toMatch(/^\s+0\.0\s+\d\.\d{3}/m);
		expect(result.stdout).toMatch(/^\s+25\.0\s+\d\.\d{3}/m);
		expect(result.stdout).not.toMatch(/^\s+40\.0\s+\d\.\d{3}\s+\d\.\d{3}\s+\d\.\d{3}/m);
	});

	it('reports the same finding in --json', async () => {
		const result = await runCli(['check', 'd.json', '--json'], { 'd.json': design });
		expect(result.code).toBe(1);
		const report = JSON.parse(result.stdout);
		const codes = report.opticsFindings.map((f: { code: string }) => f.code);
		expect(codes).toContain('optics.fluid-clears');
		expect(report.cell.temperatures_C).toEqual([0, 25]);
	});
});
