/**
 * Sets the drawn width of whole traces of the glass drawing, as one step. Unknown ids and widths
 * outside the document's range are refused before anything changes, naming the field.
 */
import type { Design } from '../design/schema';
import { requireThat } from './command-error';
import { editDesign } from './design-draft';
import type { Patch } from './patch';
import { checkedGlassArt } from './set-glass-art';
import { traceById } from './trace-point-ref';

export function setTraceWidth(
	design: Design,
	args: { ids: readonly string[]; width_mm: number }
): Patch {
	requireThat(args.ids.length > 0, 'expected at least one trace');
	for (const id of args.ids) traceById(design, id);
	const chosen = new Set(args.ids);
	const next = checkedGlassArt({
		...design.glassArt,
		traces: design.glassArt.traces.map((t) =>
			chosen.has(t.id) ? { ...t, width_mm: args.width_mm } : t
		)
	});
	return editDesign(design, (draft) => draft.setField('glassArt', next));
}
