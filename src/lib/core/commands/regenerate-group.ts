/**
 * Regenerates a generated group with new parameters (merged over the stored ones). Members are
 * matched to the generator's parts by the `<group>.<part key>` id rule, or, for older groups whose
 * ids do not follow it, by position when the member count equals the old part count. A part that
 * still exists keeps its electrode's id, name, kind and wiring and gets the new outline; a new
 * part becomes a new electrode; a member whose part is gone is deleted. Members the generator
 * never made are left alone.
 */
import type { Design, Electrode } from '../design/schema';
import { runGenerator } from '../glyphs/generator-registry';
import type { GeneratorParamValue } from '../glyphs/glyph-types';
import { requireThat } from './command-error';
import { deepEqual } from './deep-equal';
import { removeElectrodesFromDraft } from './delete-electrodes';
import { editDesign } from './design-draft';
import { memberIdFor, partKeyOfMember } from './generated-members';
import { IdAllocator } from './ids';
import type { Patch } from './patch';

function matchMembers(
	members: readonly string[],
	groupId: string,
	oldKeys: readonly string[]
): Map<string, string> {
	const byKey = new Map<string, string>();
	for (const m of members) {
		const key = partKeyOfMember(groupId, m);
		if (key !== null) byKey.set(key, m);
	}
	if (byKey.size === 0 && members.length === oldKeys.length)
		members.forEach((m, i) => byKey.set(oldKeys[i], m));
	return byKey;
}

export function regenerateGroup(
	design: Design,
	args: { groupId: string; params: Readonly<Record<string, GeneratorParamValue | undefined>> }
): Patch {
	const group = design.groups.find((g) => g.id === args.groupId);
	requireThat(group, `unknown group "${args.groupId}"`);
	requireThat(group.generator, `group "${group.name}" was not made by a generator`);
	const { kind, params: oldParams } = group.generator;
	const merged: Record<string, unknown> = { ...oldParams };
	for (const [k, v] of Object.entries(args.params)) {
		if (v === undefined) delete merged[k];
		else merged[k] = v;
	}
	const next = runGenerator(kind, merged);
	const byKey = matchMembers(
		group.members,
		group.id,
		runGenerator(kind, oldParams).parts.map((p) => p.key)
	);
	const electrodes = new Map(design.electrodes.map((e) => [e.id, e]));
	const ids = IdAllocator.forCollection(design, 'electrodes');
	const newKeys = new Set(next.parts.map((p) => p.key));
	return editDesign(design, (draft) => {
		const members: string[] = [];
		const added: Electrode[] = [];
		for (const part of next.parts) {
			const existing = byKey.get(part.key);
			if (existing && electrodes.has(existing)) {
				draft.electrodes.update(existing, (e) =>
					deepEqual(e.outline, part.outline) && deepEqual(e.holes, part.holes)
						? e
						: { ...e, outline: part.outline, holes: [...part.holes] }
				);
				members.push(existing);
			} else {
				const id = ids.claim(memberIdFor(group.id, part.key));
				added.push({
					id,
					name: part.name,
					kind: part.kind,
					outline: part.outline,
					holes: [...part.holes],
					common: null,
					line: null,
					locked: false
				});
				members.push(id);
			}
		}
		const matched = new Set(byKey.values());
		const gone = [...byKey]
			.filter(([key, id]) => !newKeys.has(key) && electrodes.has(id))
			.map(([, id]) => id);
		const untouched = group.members.filter((m) => !matched.has(m));
		removeElectrodesFromDraft(draft, new Set(gone));
		const survivors = [...members, ...untouched].filter((id) => draft.electrodes.has(id));
		const anchor = Math.max(-1, ...survivors.map((id) => draft.electrodes.indexOf(id)));
		draft.electrodes.insert(added, anchor >= 0 ? anchor + 1 : draft.electrodes.all().length);
		const finalMembers = [...members, ...untouched];
		if (draft.groups.has(group.id)) {
			draft.groups.update(group.id, (g) => ({
				...g,
				members: finalMembers,
				generator: { kind, params: next.params }
			}));
		} else {
			draft.groups.insert([
				{ ...group, members: finalMembers, generator: { kind, params: next.params } }
			]);
		}
	});
}
