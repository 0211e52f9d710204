import { describe, expect, it } from 'vitest';
import { runCli } from '../cli/run-cli';
import { demoDesign } from '../../src/lib/core/design/demo';
import { serializeDesign } from '../../src/lib/core/design/parse-design';

const files = { 'demo.json': serializeDesign(demoDesign()) };

describe('sunglyph view-angle', () => {
	it('prints the contrast table and the best direction, the JSON holding the same figures', async () => {
		const args = ['view-angle', 'demo.json', '--polar-step', '20', '--azimuth-step', '45'];
		const text = await runCli(args, files);
		expect(text.code).toBe(0);
		expect(text.stdout).toMatch(/Best viewing direction: \d+ o'clock/);
		expect(text.stdout).toContain('polar \\ azimuth');
		const json = await runCli([...args, '--json'], files);
		const report = JSON.parse(json.stdout);
		expect(report.map.azimuth_deg).toEqual([0, 45, 90, 135, 180, 225, 270, 315]);
		expect(text.stdout).toContain(`Best viewing direction: ${report.map.best.clock} o'clock`);
		expect(text.stdout).toContain(report.map.best.azimuth_deg.toFixed(1));
	});

	it('exits 2 with the reason for bad input', async () => {
		const bad = await runCli(['view-angle', 'demo.json', '--polar-step', '0'], files);
		expect(bad.code).toBe(2);
		expect(bad.stderr).toContain('--polar-step');
		const word = await runCli(['view-angle', 'demo.json', '--azimuth-step', 'ten'], files);
		expect(word.code).toBe(2);
		const missing = await runCli(['view-angle', 'nowhere.json'], files);
		expect(missing.code).toBe(2);
		const broken = JSON.parse(files['demo.json']);
		broken.orientation.twistSense = 'sideways';
		const invalid = await runCli(['view-angle', 'x.json'], { 'x.json': JSON.stringify(broken) });
		expect(invalid.code).toBe(2);
		expect(invalid.stderr).toContain('orientation.twistSense');
	});
});
