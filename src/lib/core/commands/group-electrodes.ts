/**
 * Groups and ungroups. Groups are flat: an electrode belongs to at most one group, so grouping
 * takes the selection out of its previous groups (a group left empty disappears). Ungrouping
 * removes the group record and leaves its electrodes in place.
 */
import type { Design } from '../design/schema';
import { requireThat } from './command-error';
import { editDesign } from './design-draft';
import { IdAllocator } from './ids';
import type { Patch } from './patch';
import { selectedElectrodes } from './selection';

export function groupElectrodes(
	design: Design,
	args: { ids: readonly string[]; name?: string; id?: string }
): Patch {
	const members = selectedElectrodes(design, args.ids).map((e) => e.id);
	const chosen = new Set(members);
	const allocator = IdAllocator.forCollection(design, 'groups');
	const id = args.id ? allocator.claim(args.id) : allocator.next('group');
	const name = args.name ?? `Group ${design.groups.length + 1}`;
	requireThat(name.length <= 200, 'expected a name of at most 200 characters');
	return editDesign(design, (draft) => {
		const emptied: string[] = [];
		for (const g of design.groups) {
			if (!g.members.some((m) => chosen.has(m))) continue;
			const rest = g.members.filter((m) => !chosen.has(m));
			if (rest.length === 0) emptied.push(g.id);
			else draft.groups.update(g.id, (old) => ({ ...old, members: rest }));
		}
		draft.groups.remove(emptied);
		draft.groups.insert([{ id, name, members }]);
	});
}

export function ungroupElectrodes(design: Design, args: { groupId: string }): Patch {
	return editDesign(design, (draft) => {
		draft.groups.get(args.groupId);
		draft.groups.remove([args.groupId]);
	});
}

export function renameGroup(design: Design, args: { groupId: string; name: string }): Patch {
	requireThat(args.name.length <= 200, 'expected a name of at most 200 characters');
	return editDesign(design, (draft) =>
		draft.groups.update(args.groupId, (g) => (g.name === args.name ? g : { ...g, name: args.name }))
	);
}
