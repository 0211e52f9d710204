import { describe, expect, it } from 'vitest';
import { RULE_LIMITS } from '../../src/lib/core/rules/rule-limits';
import { rulesSchema, DEFAULT_RULES } from '../../src/lib/core/design/rules-schema';
import { setDesignRules } from '../../src/lib/core/commands/set-design-rules';
import { applyPatch } from '../../src/lib/core/commands/patch';
import { invertPatch } from '../../src/lib/core/commands/patch-algebra';
import { CommandError } from '../../src/lib/core/commands/command-error';
import { demoDesign } from '../../src/lib/core/design/demo';

describe('design-rule limits', () => {
	it('declare every limit once, with the range the document schema accepts', () => {
		expect(RULE_LIMITS.map((l) => l.key).sort()).toEqual(Object.keys(DEFAULT_RULES).sort());
		for (const limit of RULE_LIMITS) {
			const at = (v: number) => rulesSchema.safeParse({ ...DEFAULT_RULES, [limit.key]: v }).success;
			expect(at(limit.min), `${limit.key} at min`).toBe(true);
			expect(at(limit.max), `${limit.key} at max`).toBe(true);
			expect(at(limit.min - 0.001), `${limit.key} below min`).toBe(false);
			expect(at(limit.max + 0.001), `${limit.key} above max`).toBe(false);
		}
	});

	it('change through an undoable command that refuses out-of-range values by name', () => {
		const demo = demoDesign();
		const patch = setDesignRules(demo, { changes: { minGap_mm: 0.03 } });
		const changed = applyPatch(demo, patch);
		expect(changed.rules).toEqual({ ...demo.rules, minGap_mm: 0.03 });
		expect(applyPatch(changed, invertPatch(patch))).toEqual(demo);
		expect(() => setDesignRules(demo, { changes: { edgeMargin_mm: -1 } })).toThrow(CommandError);
		expect(() => setDesignRules(demo, { changes: { edgeMargin_mm: -1 } })).toThrow(
			/rules\.edgeMargin_mm/
		);
		expect(() => setDesignRules(demo, { changes: { minGap_mm: Number.NaN } })).toThrow(
			/rules\.minGap_mm/
		);
	});
});
