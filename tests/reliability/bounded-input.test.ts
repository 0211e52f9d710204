/**
 * Every quantity that sets an amount of work is bounded when a design is read, and every loop
 * whose trip count follows from input is capped. A design outside the bounds is refused with the
 * JSON path of the offending field, so the reader never starts unbounded work.
 */
import { describe, expect, it } from 'vitest';
import { parseDesignValue, serializeDesign } from '../../src/lib/core/design/parse-design';
import { demoDesign } from '../../src/lib/core/design/demo';
import { ABSOLUTE_ZERO_C, BOUNDS } from '../../src/lib/core/design/bounds';
import { responseTemperatures } from '../../src/lib/core/cell/response-temperatures';
import { continuationLadder } from '../../src/lib/core/lc/director';
import { gridArray, linearArray } from '../../src/lib/core/commands/array-electrodes';
import { migrateDocument } from '../../src/lib/core/design/migrations';

type Raw = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

function demoRaw(): Raw {
	return JSON.parse(serializeDesign(demoDesign()));
}

function issuesOf(edit: (doc: Raw) => void): { path: string; message: string }[] {
	const doc = demoRaw();
	edit(doc);
	const result = parseDesignValue(doc);
	return result.ok ? [] : result.issues;
}

describe('bounds on the design document', () => {
	it('accepts the demo as it is', () => {
		expect(issuesOf(() => {})).toEqual([]);
	});

	it('refuses temperatures that would build millions of work items, naming the path', () => {
		const cases: [string, (d: Raw) => void][] = [
			['drive.temperature.max_C', (d) => (d.drive.temperature.max_C = 1e8)],
			['drive.temperature.max_C', (d) => (d.drive.temperature.max_C = 1e18)],
			['drive.temperature.min_C', (d) => (d.drive.temperature.min_C = -1e20)],
			['thresholds.reference_C', (d) => (d.thresholds.reference_C = 1e30)]
		];
		for (const [path, edit] of cases) {
			const issues = issuesOf(edit);
			expect(issues.map((i) => i.path)).toContain(path);
			expect(issues.find((i) => i.path === path)?.message).toMatch(/°C/);
		}
	});

	it('keeps every temperature above absolute zero (−273.15 °C, SI brochure 9th ed. 2019)', () => {
		expect(BOUNDS.operating_C.min).toBeGreaterThan(ABSOLUTE_ZERO_C);
		expect(BOUNDS.clearing_C.min).toBeGreaterThan(ABSOLUTE_ZERO_C);
		const issues = issuesOf((d) => (d.drive.temperature.min_C = -300));
		expect(issues.map((i) => i.path)).toContain('drive.temperature.min_C');
	});

	it('bounds a custom fluid’s clearing point, gap, voltages, light and counts', () => {
		const custom = (d: Raw) =>
			(d.cell.material = {
				custom: {
					id: 'x',
					label: 'x',
					source: '',
					reference_C: 20,
					clearing_C: 1e18,
					orderExponent: 0.2,
					extraordinary: { a: 1.6, b_um2: 0.01, c_um4: 0 },
					ordinary: { a: 1.5, b_um2: 0.005, c_um4: 0 },
					k11_pN: 12,
					k22_pN: 6,
					k33_pN: 17,
					epsParallel: 14,
					epsPerpendicular: 4,
					gamma1_Pas: 0.15,
					activation_eV: 0.3,
					viscosityLaw: 'arrhenius'
				}
			});
		const cases: [string, (d: Raw) => void][] = [
			['cell.material', custom],
			['cell.gap_um', (d) => (d.cell.gap_um = 1e9)],
			['drive.amplitude_V', (d) => (d.drive.amplitude_V = 1e9)],
			['drive.frameRate_Hz', (d) => (d.drive.frameRate_Hz = 1e12)],
			['lighting.illuminance_lx', (d) => (d.lighting.illuminance_lx = 1e12)],
			['glass.width_mm', (d) => (d.glass.width_mm = 1e9)],
			['electrodes[0].outline[0].x', (d) => (d.electrodes[0].outline[0].x = 1e300)]
		];
		for (const [path, edit] of cases) {
			const paths = issuesOf(edit).map((i) => i.path);
			expect(paths.some((p) => p.startsWith(path))).toBe(true);
		}
	});

	it('refuses an unknown illuminant and fluid preset where they are written', () => {
		const light = issuesOf((d) => (d.lighting.illuminant = 'Z99'));
		expect(light[0].path).toBe('lighting.illuminant');
		expect(light[0].message).toMatch(/Unknown illuminant "Z99"/);
		const fluid = issuesOf((d) => (d.cell.material = { preset: 'unobtainium' }));
		expect(fluid[0].path).toBe('cell.material.preset');
	});
});

describe('loops whose trip count comes from input', () => {
	it('keeps the response table short over the widest range, ends included', () => {
		const wide = responseTemperatures(BOUNDS.operating_C.min, BOUNDS.operating_C.max);
		expect(wide.length).toBeLessThanOrEqual(40);
		expect(wide[0]).toBe(-100);
		expect(wide.at(-1)).toBe(200);
		// An everyday range keeps its 10 °C steps.
		expect(responseTemperatures(0, 40)).toEqual([0, 10, 20, 30, 40]);
		// Out-of-schema values (a direct call) still end.
		expect(responseTemperatures(0, 1e18).length).toBeLessThanOrEqual(40);
	});

	it('stops the voltage ladder of the director solver', () => {
		const cell = {
			material: {
				k11_pN: 10,
				k22_pN: 5,
				k33_pN: 15,
				epsParallel: 14,
				epsPerpendicular: 4
			},
			twist_deg: 90,
			gap_um: 5,
			pretilt_deg: 2,
			gapToPitch: 0.1
		};
		// eslint-disable-next-line @typescript-eslint/no-explicit-any
		const ladder = continuationLadder(cell as any, 1e300);
		expect(ladder.length).toBeLessThanOrEqual(202);
	});

	it('caps the copies an array makes with a clear message', () => {
		const demo = demoDesign();
		const ids = demo.electrodes.map((e) => e.id);
		expect(() => gridArray(demo, { ids, rows: 30, cols: 30, pitchX_mm: 1, pitchY_mm: 1 })).toThrow(
			/at most 2000 at once/
		);
		expect(() =>
			gridArray(demo, { ids: [ids[0]], rows: 1000, cols: 1000, pitchX_mm: 1, pitchY_mm: 1 })
		).toThrow(/more than an array may make/);
		expect(() => linearArray(demo, { ids, count: 1000, dx_mm: 1, dy_mm: 0 })).toThrow(/electrodes/);
		// An ordinary array still works.
		const patch = linearArray(demo, { ids: [ids[0]], count: 4, dx_mm: 5, dy_mm: 0 });
		expect(patch).toBeTruthy();
	});
});

describe('deeply nested input', () => {
	it('refuses a document nested 5,000 arrays deep with a path, not a stack overflow', () => {
		const doc = demoRaw();
		doc.name = JSON.parse('['.repeat(5000) + ']'.repeat(5000));
		const result = migrateDocument(doc);
		expect(result.ok).toBe(false);
		if (!result.ok) expect(result.message).toMatch(/nested deeper than/);
		const big = JSON.parse('{"a":'.repeat(200_000) + '1' + '}'.repeat(200_000));
		expect(parseDesignValue({ ...demoRaw(), extra: big }).ok).toBe(false);
	});

	it('keeps a "__proto__" key as plain data while copying', () => {
		const doc = JSON.parse(
			serializeDesign(demoDesign()).replace('"name":', '"__proto__": {"polluted": 1}, "name":')
		);
		const result = migrateDocument(doc);
		expect(result.ok).toBe(true);
		expect(({} as Raw).polluted).toBeUndefined();
		const parsed = parseDesignValue(doc);
		expect(parsed.ok).toBe(false);
	});
});
