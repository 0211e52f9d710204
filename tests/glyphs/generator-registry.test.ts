import { describe, expect, it } from 'vitest';
import { GENERATOR_KINDS, runGenerator } from '../../src/lib/core/glyphs/generator-registry';
import { generatorParamSchema } from '../../src/lib/core/design/schema';

const SAMPLES: Record<string, Record<string, unknown>> = {
	'seven-segment': { height_mm: 10, width_mm: 6, stroke_mm: 1, gap_mm: 0.1 },
	'fourteen-segment': { height_mm: 12, width_mm: 8, stroke_mm: 1, gap_mm: 0.1 },
	'sixteen-segment': { height_mm: 12, width_mm: 8, stroke_mm: 1, gap_mm: 0.1 },
	'decimal-point': { size_mm: 1 },
	colon: { size_mm: 1, height_mm: 10 },
	minus: { width_mm: 5, stroke_mm: 1, height_mm: 10 },
	degree: { size_mm: 3, stroke_mm: 0.8 },
	text: { text: '-1.5°', height_mm: 10, width_mm: 6, stroke_mm: 1, gap_mm: 0.1 },
	'bar-graph': { count: 5, width_mm: 1, height_mm: 3, radius_mm: undefined },
	icon: { icon: 'flame', size_mm: 6 }
};

describe('generator registry', () => {
	it('runs every kind and returns storable, resolved parameters', () => {
		expect(GENERATOR_KINDS.sort()).toEqual(Object.keys(SAMPLES).sort());
		for (const kind of GENERATOR_KINDS) {
			const g = runGenerator(kind, SAMPLES[kind]);
			expect(g.kind).toBe(kind);
			expect(g.parts.length).toBeGreaterThan(0);
			for (const [k, v] of Object.entries(g.params))
				expect(generatorParamSchema.safeParse(v).success, `${kind}.${k}`).toBe(true);
			expect(runGenerator(kind, g.params)).toEqual(g);
		}
	});

	it('names the bad parameter, and refuses unknown kinds', () => {
		expect(() =>
			runGenerator('seven-segment', { height_mm: 10, width_mm: 6, stroke_mm: -1, gap_mm: 0.1 })
		).toThrow('seven-segment: stroke_mm: expected a number above 0');
		expect(() => runGenerator('spiral', {})).toThrow(/unknown generator "spiral"/);
	});
});
