/**
 * Replaces the legibility section (scenarios, reading factors, safety flag, preview reading) as
 * one undoable edit. The new section is validated whole; a bad value is refused with the field
 * named (`legibility.scenarios[2].age_years: expected 23 to 75 years`) and nothing changes.
 */
import type { Design } from '../design/schema';
import { legibilitySchema, type LegibilitySettings } from '../design/legibility-schema';
import { CommandError } from './command-error';
import { editDesign } from './design-draft';
import type { Patch } from './patch';

export function setLegibility(design: Design, next: LegibilitySettings): Patch {
	const parsed = legibilitySchema.safeParse(next);
	if (!parsed.success) {
		const issue = parsed.error.issues[0];
		const path = issue.path
			.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`))
			.join('');
		throw new CommandError(`legibility${path}: ${issue.message}`);
	}
	return editDesign(design, (draft) => draft.setField('legibility', parsed.data));
}
