// The scenario editor and the document schema share one range per field: the schema accepts
// each declared limit and refuses a step beyond it, naming the field's unit.
import { describe, expect, it } from 'vitest';
import { scenarioSchema } from '../../src/lib/core/design/legibility-schema';
import { SCENARIO_FIELDS } from '../../src/lib/core/design/scenario-fields';

const base = {
	name: 'Office',
	illuminance_lx: 500,
	illuminant: 'D65',
	mirrored_cdm2: 100,
	distance_mm: 600,
	viewAngle_deg: 0,
	age_years: 40
};

describe('scenario fields', () => {
	it.each(Object.values(SCENARIO_FIELDS))('$key: the schema keeps the declared range', (f) => {
		const at = (v: number) => scenarioSchema.safeParse({ ...base, [f.key]: v });
		expect(at(f.min).success).toBe(true);
		expect(at(f.max).success).toBe(true);
		const step = Math.max(Math.abs(f.max) * 1e-6, 1e-6);
		for (const bad of [f.min - step, f.max + step]) {
			const r = at(bad);
			expect(r.success, `${f.key} = ${bad}`).toBe(false);
			if (!r.success) expect(r.error.issues[0].message).toContain(`${f.min} to ${f.max}`);
		}
	});
});
