import { describe, expect, it } from 'vitest';
import { runCli } from '../cli/run-cli';
import { demoDesign } from '../../src/lib/core/design/demo';
import { serializeDesign } from '../../src/lib/core/design/parse-design';

const demo = demoDesign();
const demoText = serializeDesign(demo);
const smallText = serializeDesign({
	...demo,
	groups: demo.groups.map((g) =>
		g.generator?.kind === 'seven-segment'
			? {
					...g,
					generator: {
						...g.generator,
						params: { ...g.generator.params, height_mm: 2, width_mm: 1.2, stroke_mm: 0.25 }
					}
				}
			: g
	),
	legibility: {
		...demo.legibility,
		scenarios: demo.legibility.scenarios.map((s) => ({ ...s, distance_mm: 1000 }))
	}
});

describe('sunglyph legibility', () => {
	it('prints the scenario table, one scenario on request, exit 0 for a readable design', async () => {
		const all = await runCli(['legibility', 'demo.json'], { 'demo.json': demoText });
		expect(all.code).toBe(0);
		for (const name of ['Dim room', 'Office', 'Direct sun']) expect(all.stdout).toContain(name);
		expect(all.stdout).toMatch(/Adrian \(1989\)/);
		const one = await runCli(['legibility', 'demo.json', '--scenario', 'Office', '--json'], {
			'demo.json': demoText
		});
		const json = JSON.parse(one.stdout);
		expect(json.scenarios.map((s: { scenario: { name: string } }) => s.scenario.name)).toEqual([
			'Office'
		]);
	});

	it('fails (exit 1) with "too small for the distance" for 2 mm digits at 1 m, in legibility and check', async () => {
		const files = { 'small.json': smallText };
		const leg = await runCli(['legibility', 'small.json'], files);
		expect(leg.code).toBe(1);
		expect(leg.stdout).toMatch(/legibility\.too-small/);
		expect(leg.stdout).toMatch(/too small for the distance/);
		const check = await runCli(['check', 'small.json', '--json'], files);
		expect(check.code).toBe(1);
		const report = JSON.parse(check.stdout);
		expect(
			report.legibility.findings.some((f: { code: string }) => f.code === 'legibility.too-small')
		).toBe(true);
		expect(report.severity).toBe('fail');
	});

	it('exits 2 for an unknown scenario or end, naming it', async () => {
		const files = { 'demo.json': demoText };
		const bad = await runCli(['legibility', 'demo.json', '--scenario', 'Moon'], files);
		expect(bad.code).toBe(2);
		expect(bad.stderr).toMatch(/no scenario "Moon".*Office/);
		const end = await runCli(['legibility', 'demo.json', '--end', 'warm'], files);
		expect(end.code).toBe(2);
		expect(end.stderr).toMatch(/--end/);
	});
});
