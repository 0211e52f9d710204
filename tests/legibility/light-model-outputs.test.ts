/**
 * Every output names the optical model behind each legibility scenario: the CLI's table and
 * JSON, and the design report.
 */
import { describe, expect, it } from 'vitest';
import { runCli } from '../cli/run-cli';
import { demoDesign } from '../../src/lib/core/design/demo';
import { serializeDesign } from '../../src/lib/core/design/parse-design';
import { analyzeDesignWithCell } from '../../src/lib/core/analyze-design';
import { designReportHtml } from '../../src/lib/core/export/report/design-report-html';
import type { Design } from '../../src/lib/core/design/schema';

const demo = demoDesign();
/** The demo with its first scenario read along the normal and the office at 40°. */
const mixed: Design = {
	...demo,
	legibility: {
		...demo.legibility,
		scenarios: demo.legibility.scenarios.map((s, i) => ({
			...s,
			viewAngle_deg: i === 0 ? 0 : s.name === 'Office' ? 40 : s.viewAngle_deg
		}))
	}
};
const first = mixed.legibility.scenarios[0].name;

describe('the optical model of each legibility scenario', () => {
	it('is a column of the CLI table and a field of its JSON', async () => {
		const files = { 'mixed.json': serializeDesign(mixed) };
		const text = await runCli(['legibility', 'mixed.json'], files);
		const row = (name: string) => text.stdout.split('\n').find((l) => l.startsWith(name)) ?? '';
		expect(text.stdout).toMatch(/optical model/);
		expect(row(first)).toMatch(/normal incidence\s*$/);
		expect(row('Office')).toMatch(/oblique, θ = 40° from 6 o'clock\s*$/);
		const json = JSON.parse((await runCli(['legibility', 'mixed.json', '--json'], files)).stdout);
		const model = (name: string) =>
			json.scenarios.find((s: { scenario: { name: string } }) => s.scenario.name === name).light
				.model;
		expect(model(first)).toEqual({ kind: 'normal incidence', label: 'normal incidence' });
		expect(model('Office')).toMatchObject({ kind: 'oblique', polar_deg: 40, azimuth_deg: 90 });
	});

	it('is stated per scenario in the design report', () => {
		const html = designReportHtml({ design: mixed, report: analyzeDesignWithCell(mixed) });
		const section = html.slice(html.indexOf('Legibility: optics per scenario'));
		expect(section).toMatch(new RegExp(`<td>${first}</td><td>normal incidence</td>`));
		expect(section).toMatch(/<td>Office<\/td><td>oblique, θ = 40° from 6 o&#39;clock<\/td>/);
	});
});
