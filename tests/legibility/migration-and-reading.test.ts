import { describe, expect, it } from 'vitest';
import { migrateDocument } from '../../src/lib/core/design/migrations';
import { parseDesignText, serializeDesign } from '../../src/lib/core/design/parse-design';
import { demoDesign } from '../../src/lib/core/design/demo';
import { characterGroups } from '../../src/lib/core/legibility/character-groups';
import { readingState } from '../../src/lib/core/legibility/reading-state';

const demo = demoDesign();

/** A version-3 document: the demo without its legibility section. */
function asVersion3(options: { distance_mm: number; reflector: string }): Record<string, unknown> {
	const doc = JSON.parse(serializeDesign(demo));
	doc.version = 3;
	delete doc.legibility;
	delete doc.orientation;
	delete doc.glassArt;
	doc.viewing = { distance_mm: options.distance_mm };
	doc.cell.reflector = { kind: options.reflector };
	return doc;
}

describe('design document version 4 (legibility)', () => {
	it('lifts a version-3 document with default scenarios at its viewing distance, nothing else changed', () => {
		const old = asVersion3({ distance_mm: 900, reflector: 'brushed-metal' });
		const result = migrateDocument(old, { targetVersion: 4 });
		expect(result.ok).toBe(true);
		if (!result.ok) return;
		const { legibility, ...rest } = result.document as Record<string, unknown> & {
			legibility: {
				scenarios: { name: string; distance_mm: number; backlight_cdm2?: number }[];
				safetyRelevant: boolean;
			};
		};
		expect({ ...rest, version: 3 }).toEqual(old);
		expect(result.document.version).toBe(4);
		expect(legibility.scenarios.map((s) => s.name)).toEqual([
			'Dim room',
			'Office',
			'Shade outdoors',
			'Overcast day',
			'Direct sun'
		]);
		expect(legibility.scenarios.every((s) => s.distance_mm === 900)).toBe(true);
		expect(legibility.safetyRelevant).toBe(false);
		const parsed = parseDesignText(JSON.stringify(old));
		expect(parsed.ok).toBe(true);
	});

	it('adds a backlit night case for a transflective reflector', () => {
		const result = migrateDocument(asVersion3({ distance_mm: 600, reflector: 'transflective' }));
		if (!result.ok) throw new Error(result.message);
		const scenarios = (
			result.document.legibility as { scenarios: { name: string; backlight_cdm2?: number }[] }
		).scenarios;
		expect(scenarios.at(-1)).toMatchObject({ name: 'Night, backlit', backlight_cdm2: 20 });
	});

	it('names the field of a bad scenario', () => {
		const doc = JSON.parse(serializeDesign(demo));
		doc.legibility.scenarios[1].illuminant = 'Z9';
		doc.legibility.scenarios[2].age_years = 12;
		const parsed = parseDesignText(JSON.stringify(doc));
		expect(parsed.ok).toBe(false);
		if (parsed.ok) return;
		const paths = parsed.issues.map((i) => i.path);
		expect(paths).toContain('legibility.scenarios[1].illuminant');
		expect(paths).toContain('legibility.scenarios[2].age_years');
	});
});

describe('reading shown on the readout', () => {
	const groups = characterGroups(demo);

	it('lights the segments of "12:34", six bars and the chosen icons', () => {
		const { lit, unshown } = readingState({
			design: demo,
			groups,
			reading: { text: '12:34', bars: 6, icons: ['drop'] }
		});
		// 7-segment convention (common practice): 1 = b c; 2 = a b d e g; 3 = a b c d g; 4 = b c f g
		const expected = [
			'd1b',
			'd1c',
			'd2a',
			'd2b',
			'd2d',
			'd2e',
			'd2g',
			'colU',
			'colL',
			'd3a',
			'd3b',
			'd3c',
			'd3d',
			'd3g',
			'd4b',
			'd4c',
			'd4f',
			'd4g',
			'bar1',
			'bar2',
			'bar3',
			'bar4',
			'bar5',
			'bar6',
			'drop'
		];
		expect([...lit].sort()).toEqual(expected.sort());
		expect(unshown).toEqual([]);
	});

	it('puts a decimal point on the previous digit and reports what cannot be shown', () => {
		const { lit, unshown } = readingState({
			design: demo,
			groups,
			reading: { text: '8.8W8X', bars: 0, icons: ['nope'] }
		});
		expect(lit.has('dp1')).toBe(true);
		expect(lit.has('nope')).toBe(false);
		expect(unshown).toEqual(['W', 'X']);
	});
});
