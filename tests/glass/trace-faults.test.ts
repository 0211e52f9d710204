/**
 * Bad leads: a trace far off the glass (a point at ±1e300 mm), past the glass's edge, entirely off
 * it, over the ledge where the common plate has no glass, of no length, of one point, with a point
 * that is not a number, or on no net. Each gets a named finding from `analyzeDesign` and from
 * `sunglyph check --json` (exit 1, a verdict); a file the reader cannot accept exits 2 naming the
 * JSON path. Nothing crashes or hangs: not the check, the routing, nor the exports.
 *
 * The glass is the two-electrode fixture's: 30 × 20 mm, contact ledge 3 mm deep along the bottom
 * edge, so the back glass spans y = 0–17 mm.
 */
import { describe, expect, it } from 'vitest';
import { analyzeDesign } from '../../src/lib/core/analyze-design';
import { applyPatch } from '../../src/lib/core/commands/patch';
import { generateGlass } from '../../src/lib/core/commands/generate-glass';
import type { Trace } from '../../src/lib/core/design/glass-art-schema';
import { serializeDesign } from '../../src/lib/core/design/parse-design';
import type { Design } from '../../src/lib/core/design/schema';
import { glassExportFiles } from '../../src/lib/core/export/glass-export';
import { planGlass } from '../../src/lib/core/glass/plan-glass';
import { runCli } from '../cli/run-cli';
import { twoElectrodeGlass } from './fixture';

let routedGlass: Design | null = null;
/** The two-electrode glass with its generated leads (all sound), computed once. */
function routed(): Design {
	routedGlass ??= applyPatch(twoElectrodeGlass(), generateGlass(twoElectrodeGlass()));
	return routedGlass;
}

/** The routed glass plus one extra trace "x" (by default a SEG1 lead on the segment plate). */
function withTrace(points: { x: number; y: number }[], extra: Partial<Trace> = {}): Design {
	const d = routed();
	const x: Trace = { id: 'x', plate: 'segment', net: 'seg1', width_mm: 0.1, points, ...extra };
	return { ...d, glassArt: { ...d.glassArt, traces: [...d.glassArt.traces, x] } };
}

/** A straight two-point lead from (x0, y0) to (x1, y1). */
const run = (x0: number, y0: number, x1: number, y1: number) => [
	{ x: x0, y: y0 },
	{ x: x1, y: y1 }
];

const glassFindings = (d: Design) => analyzeDesign(d).glass?.findings ?? [];
const findingOf = (d: Design, code: string) => glassFindings(d).find((f) => f.code === code);

async function checkJson(d: Design) {
	const run = await runCli(['check', 'd.json', '--json'], { 'd.json': serializeDesign(d) });
	return { ...run, json: run.code === 2 ? null : JSON.parse(run.stdout) };
}

const far: [string, { x: number; y: number }[]][] = [
	['one point at +1e300 mm', run(7, 7, 1e300, 7)],
	['both ends at ∓1e300 mm, across the glass', run(-1e300, -1e300, 1e300, 1e300)]
];

describe('a trace far off the glass', () => {
	it.each(far)('is named and left out of the plates: %s', async (_, points) => {
		const d = withTrace(points);
		const found = glassFindings(d).filter((f) => f.code === 'glass.trace-off-glass');
		expect(found).toHaveLength(1);
		expect(found[0].severity).toBe('fail');
		expect(found[0].message).toContain('"x" (glassArt.traces[');
		expect(found[0].electrodes).toEqual(['e1']);
		// No place to zoom to beyond the glass.
		expect(found[0].location).toBeUndefined();
		const { code, json } = await checkJson(d);
		expect(code).toBe(1);
		expect(json.glass.findings).toEqual(glassFindings(d));
		// Routing and every export still finish, with no astronomical number in them.
		expect(planGlass(d).findings).toEqual([]);
		for (const file of glassExportFiles(d, ['svg', 'dxf', 'gerber', 'csv']))
			expect(file.content, file.name).not.toMatch(/e\+|Infinity|NaN/);
	});
});

describe('a trace beside the glass', () => {
	it('that runs past the bottom edge (y = 20 mm) is named, with where it is', async () => {
		const d = withTrace(run(7, 7, 7, 25));
		const f = findingOf(d, 'glass.trace-off-glass');
		expect(f?.message).toMatch(/runs past the edge of the glass/);
		// The lead's box: x 6.95–7.05, y 6.95–25.05 (square ends, 0.1 mm wide).
		expect(f?.location?.y_mm).toBeCloseTo(6.95, 9);
		expect(f?.location?.height_mm).toBeCloseTo(18.1, 9);
		expect((await checkJson(d)).code).toBe(1);
	});

	it('that lies entirely off the glass says nothing is under it', async () => {
		const d = withTrace(run(40, 40, 45, 45));
		const f = findingOf(d, 'glass.trace-off-glass');
		expect(f?.message).toMatch(/entirely off the glass: nothing is under it/);
		expect((await checkJson(d)).code).toBe(1);
	});

	it('on the common plate over the ledge (y 17–20 mm) has no back glass under it', async () => {
		const ledge = run(5, 18.5, 10, 18.5);
		const common = withTrace(ledge, { plate: 'common', net: 'com1' });
		const f = findingOf(common, 'glass.trace-off-glass');
		expect(f?.message).toMatch(/entirely off the back glass/);
		expect(f?.electrodes).toEqual(['e1']);
		expect((await checkJson(common)).code).toBe(1);
		// The same lead on the segment plate lies on the front glass, which carries the ledge.
		const front = withTrace(ledge, { plate: 'segment', net: 'seg1' });
		expect(glassFindings(front).map((x) => x.code)).not.toContain('glass.trace-off-glass');
	});
});

describe('a degenerate trace', () => {
	it('of no length is named and fails the check', async () => {
		const d = withTrace(run(7, 7, 7, 7));
		const f = findingOf(d, 'glass.trace-degenerate');
		expect(f?.message).toMatch(/has no length/);
		const { code, json } = await checkJson(d);
		expect(code).toBe(1);
		expect(json.glass.findings).toEqual(glassFindings(d));
	});

	it('of one point is named by the check; the file reader refuses it with its path', async () => {
		const d = withTrace([{ x: 7, y: 7 }]);
		const f = findingOf(d, 'glass.trace-degenerate');
		expect(f?.message).toMatch(/has 1 point; a lead needs at least 2/);
		const { code, stderr } = await checkJson(d);
		expect(code).toBe(2);
		expect(stderr).toMatch(/glassArt\.traces\[\d+\]\.points/);
	});

	it('with a point that is not a number is named; the file reader refuses it', async () => {
		const d = withTrace(run(7, 7, 8, Number.NaN));
		const f = findingOf(d, 'glass.trace-degenerate');
		expect(f?.message).toMatch(/not a finite number/);
		expect(f?.location).toBeUndefined();
		const { code, stderr } = await checkJson(d);
		expect(code).toBe(2);
		expect(stderr).toMatch(/glassArt\.traces\[\d+\]\.points\[1\]\.y/);
	});

	it('on a net the design does not have is named', async () => {
		const d = withTrace(run(7, 7, 7, 12), { net: 'seg9' });
		const f = findingOf(d, 'glass.trace-no-net');
		expect(f?.message).toContain('"seg9"');
		expect((await checkJson(d)).code).toBe(1);
	});
});
