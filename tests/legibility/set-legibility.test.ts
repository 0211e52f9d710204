import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import { setLegibility } from '../../src/lib/core/commands/set-legibility';
import { applyPatch } from '../../src/lib/core/commands/patch';
import { invertPatch } from '../../src/lib/core/commands/patch-algebra';
import { CommandError } from '../../src/lib/core/commands/command-error';

const demo = demoDesign();

describe('editing the legibility section', () => {
	it('is one undoable patch that touches nothing else', () => {
		const next = {
			...demo.legibility,
			scenarios: demo.legibility.scenarios.map((s, i) =>
				i === 1 ? { ...s, distance_mm: 1500 } : s
			)
		};
		const patch = setLegibility(demo, next);
		expect(Object.keys(patch.fields ?? {})).toEqual(['legibility']);
		const after = applyPatch(demo, patch);
		expect(after.legibility.scenarios[1].distance_mm).toBe(1500);
		expect(applyPatch(after, invertPatch(patch))).toStrictEqual(demo);
	});

	it('refuses a bad value, naming its field, and changes nothing', () => {
		const bad = {
			...demo.legibility,
			scenarios: demo.legibility.scenarios.map((s, i) =>
				i === 2 ? { ...s, viewAngle_deg: 95 } : s
			)
		};
		expect(() => setLegibility(demo, bad)).toThrow(CommandError);
		expect(() => setLegibility(demo, bad)).toThrow(
			/legibility\.scenarios\[2\]\.viewAngle_deg: expected 0 to 80°/
		);
		const twins = {
			...demo.legibility,
			scenarios: [demo.legibility.scenarios[0], demo.legibility.scenarios[0]]
		};
		expect(() => setLegibility(demo, twins)).toThrow(/its own name/);
	});
});
