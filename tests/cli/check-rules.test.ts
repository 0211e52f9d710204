import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import { serializeDesign } from '../../src/lib/core/design/parse-design';
import type { Contour, Design } from '../../src/lib/core/design/schema';
import { runCli } from './run-cli';

const shift = (c: Contour, dx: number, dy = 0): Contour =>
	c.map((p) => ({ ...p, x: p.x + dx, y: p.y + dy }));
const box = (x: number, y: number, w: number, h: number): Contour => [
	{ x, y },
	{ x: x + w, y },
	{ x: x + w, y: y + h },
	{ x, y: y + h }
];

/** The demo with one electrode's outline replaced. */
function withOutline(id: string, outline: (old: Contour) => Contour): Design {
	const demo = demoDesign();
	return {
		...demo,
		electrodes: demo.electrodes.map((e) =>
			e.id === id ? { ...e, outline: outline(e.outline) } : e
		)
	};
}

async function check(design: Design) {
	const { code, stdout, stderr } = await runCli(['check', 'bad.json', '--json'], {
		'bad.json': serializeDesign(design)
	});
	return { code, stderr, report: code === 2 ? null : JSON.parse(stdout) };
}

const ruleCodes = (report: { rules: { findings: { code: string; severity: string }[] } }) =>
	report.rules.findings.filter((f) => f.severity === 'fail').map((f) => f.code);

describe('sunglyph check: design rules', () => {
	it('passes the demo rules and prints a Rules section', async () => {
		const { code, report } = await check(demoDesign());
		expect(report.rules.severity).toBe('pass');
		expect(code).toBe(report.severity === 'fail' ? 1 : 0);
		const text = await runCli(['check', 'demo.json'], {
			'demo.json': serializeDesign(demoDesign())
		});
		expect(text.stdout).toContain('\nRules\n');
		expect(text.stdout).toContain('[rule.ok]');
	});

	const bad: [string, () => Design, string][] = [
		['two overlapping electrodes', () => withOutline('bar2', (c) => shift(c, -1)), 'rule.overlap'],
		[
			'a self-crossing outline',
			() =>
				withOutline('bar3', () => [
					{ x: 17.6, y: 29.5 },
					{ x: 21.8, y: 31.7 },
					{ x: 21.8, y: 29.5 },
					{ x: 17.6, y: 31.7 }
				]),
			'rule.self-crossing'
		],
		[
			'an electrode 200 mm off a 66 mm glass',
			() => withOutline('rain', (c) => shift(c, 200)),
			'rule.outside-glass'
		],
		['a 5 µm sliver', () => withOutline('bar4', () => box(22.4, 30, 4.2, 0.005)), 'rule.min-width'],
		['a 1 µm gap', () => withOutline('bar2', (c) => shift(c, -0.599)), 'rule.min-gap'],
		[
			'an empty design',
			() => ({ ...demoDesign(), electrodes: [], groups: [] }),
			'rule.empty-design'
		]
	];
	for (const [what, make, code] of bad) {
		it(`fails ${what} with exit 1 and ${code}`, async () => {
			const result = await check(make());
			expect(result.stderr).toBe('');
			expect(result.code).toBe(1);
			expect(ruleCodes(result.report)).toContain(code);
			expect(result.report.severity).toBe('fail');
		});
	}
});
