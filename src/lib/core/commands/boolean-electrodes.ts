/**
 * Boolean operations on selected electrodes, curves preserved (the paper.js kernel). 'unite' and
 * 'intersect' combine all of them; 'subtract' cuts all the others out of the base (default: the
 * bottom-most in draw order). The base electrode keeps its id, name, kind and wiring and takes the
 * largest island of the result; further islands become new electrodes right above it (same
 * wiring, same groups); the other selected electrodes are consumed.
 */
import type { Design, Electrode } from '../design/schema';
import { intersectShapes, subtractShapes, uniteShapes } from '../geometry/paper-kernel';
import { shapeArea } from '../geometry/polygon';
import type { Shape } from '../geometry/shape';
import { requireThat } from './command-error';
import { removeElectrodesFromDraft } from './delete-electrodes';
import { editDesign } from './design-draft';
import { IdAllocator } from './ids';
import type { Patch } from './patch';
import { selectedElectrodes } from './selection';

export type BooleanOperation = 'unite' | 'subtract' | 'intersect';

function resultShapes(
	operation: BooleanOperation,
	base: Electrode,
	others: readonly Electrode[]
): Shape[] {
	if (operation === 'subtract') return subtractShapes(base, others);
	return operation === 'unite'
		? uniteShapes([base, ...others])
		: intersectShapes([base, ...others]);
}

export function booleanElectrodes(
	design: Design,
	args: { ids: readonly string[]; operation: BooleanOperation; base?: string }
): Patch {
	const selected = selectedElectrodes(design, args.ids);
	requireThat(selected.length >= 2, 'a boolean operation needs two or more electrodes');
	const base = args.base ? selected.find((e) => e.id === args.base) : selected[0];
	requireThat(base, `the base "${args.base}" is not in the selection`);
	const others = selected.filter((e) => e !== base);
	const islands = resultShapes(args.operation, base, others)
		.map((shape) => ({ shape, area: shapeArea(shape, { tolerance_um: 1 }) }))
		.sort((a, b) => b.area - a.area)
		.map((r) => r.shape);
	requireThat(islands.length > 0, `the ${args.operation} result is empty`);
	const ids = IdAllocator.forCollection(design, 'electrodes');
	const rest = islands.slice(1);
	const extra = rest.map((shape, k): Electrode => ({
		...base,
		id: ids.claim(base.id),
		name: `${base.name} (${k + 2})`,
		outline: shape.outline,
		holes: [...shape.holes]
	}));
	return editDesign(design, (draft) => {
		draft.electrodes.update(base.id, (e) => ({
			...e,
			outline: islands[0].outline,
			holes: [...islands[0].holes]
		}));
		removeElectrodesFromDraft(draft, new Set(others.map((e) => e.id)));
		draft.electrodes.insert(extra, draft.electrodes.indexOf(base.id) + 1);
		for (const g of draft.groups.all()) {
			if (g.members.includes(base.id) && extra.length > 0) {
				draft.groups.update(g.id, (old) => ({
					...old,
					members: [...old.members, ...extra.map((e) => e.id)]
				}));
			}
		}
	});
}
