/**
 * Applies a glass plan made elsewhere (the app plans in a worker) as one undoable step: the plan's
 * transfer points and traces replace the design's; seal, ledge, margin and trace width stay as
 * they are. A plan belongs to the drawing it was made from — electrodes, commons, segment lines,
 * glass, pin map, rules and glass drawing — so it is refused when the design it would land on
 * differs in any of them: a result that arrives after a newer edit never overwrites that edit.
 */
import type { GlassArt } from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import { CommandError } from './command-error';
import { editDesign } from './design-draft';
import type { Patch } from './patch';
import { checkedGlassArt } from './set-glass-art';

/** Everything a glass plan is computed from, as one comparable string. */
export function glassPlanInputs(design: Design): string {
	const { electrodes, commons, segmentLines, glass, pinout, rules, glassArt } = design;
	return JSON.stringify([electrodes, commons, segmentLines, glass, pinout, rules, glassArt]);
}

export function applyGlassPlan(
	design: Design,
	args: { plan: Pick<GlassArt, 'transfers' | 'traces'>; madeFrom?: string }
): Patch {
	if (args.madeFrom !== undefined && args.madeFrom !== glassPlanInputs(design))
		throw new CommandError(
			'the drawing changed while the plates and traces were being generated; the result was set aside'
		);
	const next = checkedGlassArt({
		...design.glassArt,
		transfers: args.plan.transfers,
		traces: args.plan.traces
	});
	return editDesign(design, (draft) => draft.setField('glassArt', next));
}
