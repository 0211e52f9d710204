/**
 * Clears the wiring: every unlocked electrode loses its common and segment line (one undoable
 * edit). Common and line records stay, so the drive settings are untouched.
 */
import type { Design } from '../design/schema';
import { editDesign } from './design-draft';
import type { Patch } from './patch';

export function clearWiring(design: Design): Patch {
	return editDesign(design, (draft) => {
		for (const e of design.electrodes) {
			if (e.locked || (e.common === null && e.line === null)) continue;
			draft.electrodes.update(e.id, (old) => ({ ...old, common: null, line: null }));
		}
	});
}
