/**
 * Changes the draw order of the selection: to the front (drawn last) or back, or one step forward
 * or backward past the nearest unselected electrode. Selected electrodes keep their order among
 * themselves.
 */
import type { Design, Electrode } from '../design/schema';
import { editDesign } from './design-draft';
import type { Patch } from './patch';
import { selectedElectrodes } from './selection';

export type ReorderTarget = 'front' | 'back' | 'forward' | 'backward';

function stepped(
	list: readonly Electrode[],
	chosen: ReadonlySet<string>,
	forward: boolean
): Electrode[] {
	const out = forward ? list.slice().reverse() : list.slice();
	for (let i = 1; i < out.length; i++) {
		if (chosen.has(out[i].id) && !chosen.has(out[i - 1].id)) {
			let j = i;
			while (j < out.length && chosen.has(out[j].id)) j++;
			const [passed] = out.splice(i - 1, 1);
			out.splice(j - 1, 0, passed);
			i = j;
		}
	}
	return forward ? out.reverse() : out;
}

export function reorderElectrodes(
	design: Design,
	args: { ids: readonly string[]; to: ReorderTarget }
): Patch {
	const chosen = new Set(selectedElectrodes(design, args.ids).map((e) => e.id));
	const picked = design.electrodes.filter((e) => chosen.has(e.id));
	const rest = design.electrodes.filter((e) => !chosen.has(e.id));
	const next =
		args.to === 'front'
			? [...rest, ...picked]
			: args.to === 'back'
				? [...picked, ...rest]
				: stepped(design.electrodes, chosen, args.to === 'forward');
	return editDesign(design, (draft) => {
		draft.electrodes.remove(design.electrodes.map((e) => e.id));
		draft.electrodes.insert(next);
	});
}
