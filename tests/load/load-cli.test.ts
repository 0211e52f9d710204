import { describe, expect, it } from 'vitest';
import { runCli } from '../cli/run-cli';
import { demoDesign } from '../../src/lib/core/design/demo';
import { serializeDesign } from '../../src/lib/core/design/parse-design';

const demoText = serializeDesign(demoDesign());
const withLoad = (load: Record<string, unknown>) =>
	JSON.stringify({ ...JSON.parse(demoText), load });

describe('sunglyph load', () => {
	it('prints the load as JSON with the battery life for the given capacity', async () => {
		const { code, stdout } = await runCli(
			['load', 'demo.json', '--json', '--pattern', 'all-on', '--battery-mAh', '1000'],
			{ 'demo.json': demoText }
		);
		expect(code).toBe(0);
		const report = JSON.parse(stdout);
		expect(report.pattern).toBe('all-on');
		expect(report.onProbability).toBe(1);
		expect(report.lines).toHaveLength(demoDesign().segmentLines.length);
		expect(report.battery.life_h).toBeCloseTo((1000 * 1000) / report.total_uA, 6);
	});

	it('prints a table per line and per common', async () => {
		const { code, stdout } = await runCli(['load', 'demo.json'], { 'demo.json': demoText });
		expect(code).toBe(0);
		expect(stdout).toMatch(/^line\s+electrodes/m);
		expect(stdout).toMatch(/^common\s+electrodes/m);
		expect(stdout).toContain('[load.ok]');
	});

	it('exits 1 when the current exceeds the budget, and check agrees', async () => {
		const files = { 'tight.json': withLoad({ budget_uA: 0.5 }) };
		const load = await runCli(['load', 'tight.json', '--json'], files);
		expect(load.code).toBe(1);
		expect(JSON.parse(load.stdout).findings.map((f: { code: string }) => f.code)).toContain(
			'load.current-over-budget'
		);
		const check = await runCli(['check', 'tight.json', '--json'], files);
		expect(check.code).toBe(1);
		expect(JSON.parse(check.stdout).load.findings[0].code).toBe('load.current-over-budget');
	});

	it('exits 2 on bad options and bad files, naming what is wrong', async () => {
		const files = { 'demo.json': demoText, 'bad.json': withLoad({ quiescent_uA: -3 }) };
		const pattern = await runCli(['load', 'demo.json', '--pattern', 'half'], files);
		expect(pattern.code).toBe(2);
		expect(pattern.stderr).toContain('--pattern');
		const battery = await runCli(['load', 'demo.json', '--battery-mAh', '0'], files);
		expect(battery.code).toBe(2);
		expect(battery.stderr).toContain('--battery-mAh');
		const bad = await runCli(['load', 'bad.json'], files);
		expect(bad.code).toBe(2);
		expect(bad.stderr).toContain('load.quiescent_uA');
		const missing = await runCli(['load', 'nowhere.json'], files);
		expect(missing.code).toBe(2);
	});
});
