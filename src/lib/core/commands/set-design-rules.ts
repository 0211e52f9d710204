/**
 * Changes the design-rule limits (`design.rules`): the new limits are checked against the
 * document schema first, and a value out of range throws a CommandError naming its field
 * (`rules.minGap_mm: …`), so the design never holds a limit the file format would refuse.
 */
import type { Design } from '../design/schema';
import { rulesSchema, type DesignRules } from '../design/rules-schema';
import { CommandError } from './command-error';
import type { Patch } from './patch';

export function setDesignRules(design: Design, options: { changes: Partial<DesignRules> }): Patch {
	const next = { ...design.rules, ...options.changes };
	const parsed = rulesSchema.safeParse(next);
	if (!parsed.success) {
		const issue = parsed.error.issues[0];
		throw new CommandError(`rules.${issue.path.join('.')}: ${issue.message}`);
	}
	return { fields: { rules: [design.rules, parsed.data] } };
}
