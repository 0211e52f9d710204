/**
 * How an electrode is painted: in wiring view by its common's colour (unassigned ones in red with
 * a dashed dark outline), in appearance view by the predicted glass colours (lit or off), with a
 * dark outline when selected or under the pointer. In either view an electrode sharing
 * its (common, line) crossing with another gets a thick red outline, selected or not.
 */
import type { Electrode } from '$lib/core/design/schema';
import type { ElectrodeLook } from './paper/electrode-items';

export interface LookInputs {
	commonIndex: ReadonlyMap<string, number>;
	colourOfCommon: (index: number) => string;
	selection: ReadonlySet<string>;
	hoverId: string | null;
	appearance: {
		background: string;
		segmentOn: string;
		segmentOff?: string;
		litIds?: ReadonlySet<string>;
	} | null;
	/** Electrodes sharing a crossing with another (drawn as conflicts in wiring view). */
	conflicts?: ReadonlySet<string>;
}

export const SELECTED_OUTLINE = '#101418';
export const UNASSIGNED_OUTLINE = '#6e0b0b';
export const CONFLICT_OUTLINE = '#e0101a';

export function electrodeLook(e: Electrode, inputs: LookInputs): ElectrodeLook {
	const selected = inputs.selection.has(e.id);
	const hovered = inputs.hoverId === e.id;
	const outline = selected
		? { stroke: SELECTED_OUTLINE, strokeWidth_px: 2, dash: null }
		: hovered
			? { stroke: SELECTED_OUTLINE, strokeWidth_px: 1, dash: null }
			: null;
	const conflict = inputs.conflicts?.has(e.id)
		? { stroke: CONFLICT_OUTLINE, strokeWidth_px: selected ? 3.5 : 2.5, dash: null }
		: null;
	if (inputs.appearance) {
		const a = inputs.appearance;
		const lit = !a.litIds || a.litIds.has(e.id);
		return {
			fill: lit ? a.segmentOn : (a.segmentOff ?? a.background),
			opacity: 1,
			...(conflict ?? outline ?? { stroke: null, strokeWidth_px: 0, dash: null })
		};
	}
	const index = e.common === null ? -1 : (inputs.commonIndex.get(e.common) ?? -1);
	const fill = inputs.colourOfCommon(index);
	const unassigned = index < 0 || e.line === null;
	if (conflict) return { fill, opacity: 0.9, ...conflict };
	const base = unassigned
		? { stroke: UNASSIGNED_OUTLINE, strokeWidth_px: 1.25, dash: [4, 3] as readonly number[] }
		: { stroke: null, strokeWidth_px: 0, dash: null };
	return { fill, opacity: index < 0 ? 0.75 : 0.9, ...(outline ?? base) };
}
