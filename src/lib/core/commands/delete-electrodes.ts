/**
 * Deletes the selected electrodes and takes them out of their groups; a group left without
 * members is deleted too.
 */
import type { Design } from '../design/schema';
import { DesignDraft, editDesign } from './design-draft';
import type { Patch } from './patch';
import { selectedElectrodes } from './selection';

/** Removes electrodes from a draft, pruning group memberships (shared by delete and booleans). */
export function removeElectrodesFromDraft(draft: DesignDraft, ids: ReadonlySet<string>): void {
	draft.electrodes.remove(ids);
	const emptied: string[] = [];
	for (const group of draft.groups.all()) {
		if (!group.members.some((m) => ids.has(m))) continue;
		const members = group.members.filter((m) => !ids.has(m));
		if (members.length === 0) emptied.push(group.id);
		else draft.groups.update(group.id, (g) => ({ ...g, members }));
	}
	draft.groups.remove(emptied);
}

export function deleteElectrodes(design: Design, args: { ids: readonly string[] }): Patch {
	const ids = new Set(selectedElectrodes(design, args.ids).map((e) => e.id));
	return editDesign(design, (draft) => removeElectrodesFromDraft(draft, ids));
}
