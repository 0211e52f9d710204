import fc from 'fast-check';
import { DEFAULT_GLASS_ART } from '../../src/lib/core/design/glass-art-schema';
import { describe, expect, it } from 'vitest';
import {
	parseDesignText,
	parseDesignValue,
	serializeDesign
} from '../../src/lib/core/design/parse-design';
import { demoDesign } from '../../src/lib/core/design/demo';
import { DESIGN_MIGRATIONS, migrateDocument } from '../../src/lib/core/design/migrations';
import { DESIGN_VERSION, type Design, type Electrode } from '../../src/lib/core/design/schema';
import { analyzeDesign } from '../../src/lib/core/analyze-design';
import { DEFAULT_CELL, DEFAULT_LIGHTING } from '../../src/lib/core/design/cell-schema';
import { DEFAULT_PINOUT, DEFAULT_RULES } from '../../src/lib/core/design/rules-schema';
import { defaultLegibility } from '../../src/lib/core/design/legibility-schema';
import { DEFAULT_ORIENTATION } from '../../src/lib/core/design/orientation-schema';

// JSON has no negative zero, so −0 and 0 are the same coordinate in a saved design.
const finite = fc
	.double({ min: -500, max: 500, noNaN: true, noDefaultInfinity: true })
	.map((v) => (v === 0 ? 0 : v));
const pointArb = fc.record(
	{ x: finite, y: finite, in: fc.tuple(finite, finite), out: fc.tuple(finite, finite) },
	{ requiredKeys: ['x', 'y'] }
);
const contourArb = fc.array(pointArb, { minLength: 3, maxLength: 8 });

const designArb: fc.Arbitrary<Design> = fc
	.record({
		commons: fc.integer({ min: 1, max: 8 }),
		lines: fc.integer({ min: 1, max: 6 }),
		electrodes: fc.array(
			fc.record({
				outline: contourArb,
				holes: fc.array(contourArb, { maxLength: 2 }),
				kind: fc.constantFrom<'segment' | 'icon'>('segment', 'icon'),
				name: fc.string({ maxLength: 20 }),
				c: fc.nat(),
				l: fc.nat(),
				assigned: fc.boolean()
			}),
			{ maxLength: 12 }
		),
		amplitude: fc.double({ min: 0.1, max: 30, noNaN: true }),
		bias: fc.double({ min: 2, max: 12, noNaN: true })
	})
	.map(({ commons, lines, electrodes, amplitude, bias }) => {
		const commonRefs = Array.from({ length: commons }, (_, i) => ({
			id: `c${i}`,
			name: `COM${i}`
		}));
		const lineRefs = Array.from({ length: lines }, (_, i) => ({ id: `s${i}`, name: `SEG${i}` }));
		const items: Electrode[] = electrodes.map((e, i) => ({
			id: `e${i}`,
			name: e.name,
			kind: e.kind,
			outline: e.outline,
			holes: e.holes,
			common: e.assigned ? commonRefs[e.c % commons].id : null,
			line: e.assigned ? lineRefs[e.l % lines].id : null,
			locked: e.assigned && e.c % 2 === 0
		}));
		return {
			format: 'sunglyph-design',
			version: 6,
			name: 'random',
			glass: {
				width_mm: 50,
				height_mm: 30,
				viewingArea: { x_mm: 2, y_mm: 2, width_mm: 40, height_mm: 20 }
			},
			commons: commonRefs,
			segmentLines: lineRefs,
			electrodes: items,
			groups: [],
			drive: {
				commons,
				biasDivisor: bias,
				amplitude_V: amplitude,
				frameRate_Hz: 64,
				inversion: 'frame',
				temperature: { min_C: -20, max_C: 70 }
			},
			thresholds: {
				source: 'manual',
				v10_V: 1.2,
				v90_V: 1.6,
				reference_C: 25,
				tempCoeff_mV_per_K: -4
			},
			viewing: { distance_mm: 500 },
			cell: { ...DEFAULT_CELL, gap_um: 3 + (commons % 5) },
			lighting: DEFAULT_LIGHTING,
			rules: { ...DEFAULT_RULES, minGap_mm: 0.01 * (1 + (lines % 5)) },
			pinout: { ...DEFAULT_PINOUT, order: commons % 2 ? 'commons-last' : 'commons-first' },
			legibility: defaultLegibility({ distance_mm: 500, transflective: commons % 2 === 0 }),
			orientation: { ...DEFAULT_ORIENTATION, rearGlass_mm: [0.4, 0.55, 0.7, 1.1][commons % 4] },
			glassArt: DEFAULT_GLASS_ART
		} satisfies Design;
	});

describe('design document', () => {
	it('random valid designs round-trip through save and load exactly', () => {
		fc.assert(
			fc.property(designArb, (design) => {
				const loaded = parseDesignText(serializeDesign(design));
				expect(loaded.ok).toBe(true);
				if (loaded.ok) expect(loaded.design).toEqual(design);
			}),
			{ numRuns: 200 }
		);
	});

	it('random corruptions give path-named errors, never an uncaught throw', () => {
		const corruptions = [null, -1, 0, 'x', true, [], {}, NaN, Infinity, [1, 2]];
		fc.assert(
			fc.property(designArb, fc.nat(), fc.constantFrom(...corruptions), (design, pick, bad) => {
				// Collect every path in the document, then replace one value.
				const doc = JSON.parse(serializeDesign(design));
				const paths: (string | number)[][] = [];
				const walk = (v: unknown, path: (string | number)[]) => {
					paths.push(path);
					if (Array.isArray(v)) v.forEach((x, i) => walk(x, [...path, i]));
					else if (v && typeof v === 'object')
						Object.entries(v).forEach(([k, x]) => walk(x, [...path, k]));
				};
				walk(doc, []);
				const path = paths[1 + (pick % (paths.length - 1))];
				let parent = doc;
				for (const key of path.slice(0, -1)) parent = parent[key];
				const before = JSON.stringify(parent[path[path.length - 1]]);
				parent[path[path.length - 1]] = bad;
				if (JSON.stringify(bad) === before) return;
				const result = parseDesignValue(doc);
				if (result.ok) return; // some replacements are still valid (e.g. a name "x")
				for (const issue of result.issues) {
					expect(issue.path).toMatch(/^[A-Za-z(]/);
					expect(issue.message.length).toBeGreaterThan(3);
				}
			}),
			{ numRuns: 400 }
		);
	});

	it('names the JSON path and the reason', () => {
		const doc = JSON.parse(serializeDesign(demoDesign()));
		doc.electrodes[3].outline = doc.electrodes[3].outline.slice(0, 2);
		const result = parseDesignValue(doc);
		expect(result.ok).toBe(false);
		if (!result.ok)
			expect(result.issues).toContainEqual({
				path: 'electrodes[3].outline',
				message: 'expected at least 3 points'
			});
	});

	it('reports unknown references, duplicate ids and bad JSON', () => {
		const doc = JSON.parse(serializeDesign(demoDesign()));
		doc.electrodes[0].common = 'nowhere';
		doc.electrodes[2].id = doc.electrodes[1].id;
		const result = parseDesignValue(doc);
		expect(result.ok ? [] : result.issues.map((i) => i.path)).toEqual([
			'electrodes[2].id',
			'electrodes[0].common',
			'groups[0].members[2]'
		]);
		const bad = parseDesignText('{"format": ');
		expect(bad.ok).toBe(false);
		if (!bad.ok) expect(bad.issues[0].message).toMatch(/not valid JSON/);
	});

	it('refuses other formats and newer versions', () => {
		expect(migrateDocument({ format: 'other', version: 1 })).toMatchObject({
			ok: false,
			path: 'format'
		});
		expect(migrateDocument({ format: 'sunglyph-design', version: 99 })).toMatchObject({
			ok: false,
			path: 'version'
		});
		expect(migrateDocument([])).toMatchObject({ ok: false, path: '(root)' });
	});

	/** A version-2 document: no rules, no pin-out, electrodes without a lock flag. */
	function asVersion2(design: Design): Record<string, unknown> {
		const doc = JSON.parse(serializeDesign(design));
		doc.version = 2;
		delete doc.orientation;
		delete doc.rules;
		delete doc.pinout;
		for (const e of doc.electrodes) delete e.locked;
		return doc;
	}

	it('lifts a version-2 file to version 3 with default rules, pin-out and unlocked assignments', () => {
		const demo = demoDesign();
		const step = DESIGN_MIGRATIONS[2](asVersion2(demo));
		expect(step.rules).toEqual(DEFAULT_RULES);
		expect(step.pinout).toEqual(DEFAULT_PINOUT);
		const result = parseDesignValue(asVersion2(demo));
		expect(result.ok).toBe(true);
		if (result.ok) {
			expect(result.design.version).toBe(DESIGN_VERSION);
			expect(result.design.electrodes.every((e) => e.locked === false)).toBe(true);
			expect(result.design.electrodes.map((e) => [e.id, e.common, e.line])).toEqual(
				demo.electrodes.map((e) => [e.id, e.common, e.line])
			);
		}
	});

	it('lifts a version-1 file to the current version with the default cell and light', () => {
		const v1 = asVersion2(demoDesign());
		v1.version = 1;
		delete v1.cell;
		delete v1.lighting;
		const result = parseDesignValue(v1);
		expect(result.ok).toBe(true);
		if (result.ok) {
			expect(result.design.version).toBe(DESIGN_VERSION);
			expect(result.design.cell).toEqual(DEFAULT_CELL);
			expect(result.design.lighting).toEqual(DEFAULT_LIGHTING);
			expect(result.design.electrodes).toEqual(demoDesign().electrodes);
		}
	});

	it('names an unknown material preset', () => {
		const doc = JSON.parse(serializeDesign(demoDesign()));
		doc.cell.material = { preset: 'unobtainium' };
		const result = parseDesignValue(doc);
		expect(result.ok ? [] : result.issues.map((i) => i.path)).toEqual(['cell.material.preset']);
	});

	it('runs every migration step in order, on a copy', () => {
		const original = { format: 'sunglyph-design', version: 1, a: 1 };
		const result = migrateDocument(original, {
			targetVersion: 3,
			migrations: {
				1: (d) => ({ ...d, b: (d.a as number) + 1 }),
				2: (d) => ({ ...d, c: (d.b as number) * 10 })
			}
		});
		expect(result).toEqual({
			ok: true,
			from: 1,
			document: { format: 'sunglyph-design', version: 3, a: 1, b: 2, c: 20 }
		});
		expect(original).toEqual({ format: 'sunglyph-design', version: 1, a: 1 });
		expect(migrateDocument(original, { targetVersion: 2, migrations: {} })).toMatchObject({
			ok: false,
			message: 'no migration from version 1'
		});
	});
});

describe('demo design', () => {
	const demo = demoDesign();
	it('has four 7-segment digits with points and colon, a bar graph, icons and four commons', () => {
		expect(demo.commons).toHaveLength(4);
		expect(demo.electrodes.filter((e) => /^d\d[a-g]$/.test(e.id))).toHaveLength(28);
		expect(demo.electrodes.filter((e) => e.id.startsWith('dp'))).toHaveLength(4);
		expect(demo.electrodes.filter((e) => e.id.startsWith('bar')).length).toBeGreaterThanOrEqual(8);
		expect(demo.electrodes.filter((e) => e.kind === 'icon').length).toBeGreaterThanOrEqual(5);
		expect(demo.electrodes.every((e) => e.common !== null && e.line !== null)).toBe(true);
	});
	it('passes its own checks', () => {
		expect(analyzeDesign(demo).severity).not.toBe('fail');
	});
	it('reports two electrodes on one crossing by name', () => {
		const clash = structuredClone(demo);
		clash.electrodes[1].common = clash.electrodes[0].common;
		clash.electrodes[1].line = clash.electrodes[0].line;
		const report = analyzeDesign(clash);
		expect(report.severity).toBe('fail');
		expect(report.wiring.findings[0].message).toContain(
			`${clash.electrodes[0].name}, ${clash.electrodes[1].name}`
		);
	});
});
