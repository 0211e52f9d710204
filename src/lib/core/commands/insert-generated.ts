/**
 * Inserts a generated group (digit, text, bar graph, icon, …) into the design: its parts become
 * electrodes with ids `<group>.<part key>` (unassigned), on top of the draw order, and a group
 * records the generator kind and its resolved parameters for later regeneration.
 */
import type { Design, Electrode } from '../design/schema';
import { storableParams } from '../glyphs/generator-registry';
import type { GeneratedGroup } from '../glyphs/glyph-types';
import { requireThat } from './command-error';
import { editDesign } from './design-draft';
import { memberIdFor } from './generated-members';
import { IdAllocator } from './ids';
import type { Patch } from './patch';

export function insertGenerated(
	design: Design,
	args: { generated: GeneratedGroup; groupId?: string; name?: string; namePrefix?: string }
): Patch {
	const { generated } = args;
	requireThat(generated.parts.length > 0, 'the generator produced nothing');
	const groups = IdAllocator.forCollection(design, 'groups');
	const groupId = args.groupId ? groups.claim(args.groupId) : groups.next(generated.idPrefix);
	const ids = IdAllocator.forCollection(design, 'electrodes');
	const electrodes: Electrode[] = generated.parts.map((part) => ({
		id: ids.claim(memberIdFor(groupId, part.key)),
		name: `${args.namePrefix ?? ''}${part.name}`,
		kind: part.kind,
		outline: part.outline,
		holes: [...part.holes],
		common: null,
		line: null,
		locked: false
	}));
	return editDesign(design, (draft) => {
		draft.electrodes.insert(electrodes);
		draft.groups.insert([
			{
				id: groupId,
				name: args.name ?? generated.name,
				members: electrodes.map((e) => e.id),
				generator: { kind: generated.kind, params: storableParams(generated.params) }
			}
		]);
	});
}
