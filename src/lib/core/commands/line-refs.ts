/**
 * Commons (back-plate electrodes) and segment lines (front-plate pins): add, rename, delete.
 * Deleting one unassigns every electrode that used it. The drive's `commons` count is a separate
 * setting and is not changed here.
 */
import type { Design } from '../design/schema';
import { requireThat } from './command-error';
import { editDesign } from './design-draft';
import { IdAllocator } from './ids';
import type { Patch } from './patch';

export type LineList = 'commons' | 'segmentLines';

const DEFAULTS: Record<LineList, { prefix: string; name: string; field: 'common' | 'line' }> = {
	commons: { prefix: 'com', name: 'COM', field: 'common' },
	segmentLines: { prefix: 'seg', name: 'SEG', field: 'line' }
};

export function addLineRef(
	design: Design,
	args: { list: LineList; name?: string; id?: string }
): Patch {
	const ids = IdAllocator.forCollection(design, args.list);
	const id = args.id ? ids.claim(args.id) : ids.next(DEFAULTS[args.list].prefix);
	const name = args.name ?? `${DEFAULTS[args.list].name}${design[args.list].length + 1}`;
	requireThat(name.length <= 200, 'expected a name of at most 200 characters');
	return editDesign(design, (draft) => draft[args.list].insert([{ id, name }]));
}

export function renameLineRef(
	design: Design,
	args: { list: LineList; id: string; name: string }
): Patch {
	requireThat(args.name.length <= 200, 'expected a name of at most 200 characters');
	return editDesign(design, (draft) =>
		draft[args.list].update(args.id, (ref) =>
			ref.name === args.name ? ref : { ...ref, name: args.name }
		)
	);
}

export function deleteLineRef(design: Design, args: { list: LineList; id: string }): Patch {
	const field = DEFAULTS[args.list].field;
	return editDesign(design, (draft) => {
		draft[args.list].get(args.id);
		draft[args.list].remove([args.id]);
		for (const e of design.electrodes) {
			if (e[field] === args.id) draft.electrodes.update(e.id, (old) => ({ ...old, [field]: null }));
		}
	});
}
