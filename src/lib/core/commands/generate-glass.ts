/**
 * Generates the glass drawing's transfer points and leads (both plates) for the current drawing,
 * as one undoable step. Back plates need no command: they are derived from the electrodes.
 */
import type { Design } from '../design/schema';
import { planGlass } from '../glass/plan-glass';
import { editDesign } from './design-draft';
import type { Patch } from './patch';

export function generateGlass(design: Design): Patch {
	const plan = planGlass(design);
	return editDesign(design, (draft) => draft.setField('glassArt', plan.glassArt));
}
