/**
 * Sets how the pins are laid along the glass (edge, order, pitch): one undoable edit. Values are
 * checked against the document's schema first, so a bad pitch is refused with the field named.
 */
import type { Design } from '../design/schema';
import { pinoutSchema, type Pinout } from '../design/rules-schema';
import { requireThat } from './command-error';
import { editDesign } from './design-draft';
import type { Patch } from './patch';

export function setPinout(design: Design, changes: Partial<Pinout>): Patch {
	const parsed = pinoutSchema.safeParse({ ...design.pinout, ...changes });
	const issue = parsed.success ? null : parsed.error.issues[0];
	requireThat(parsed.success, `pinout.${issue?.path.join('.')}: ${issue?.message}`);
	return editDesign(design, (draft) => draft.setField('pinout', parsed.data));
}
