/**
 * Deletes whole traces of the glass drawing, as one step. Unknown ids are refused before anything
 * changes; the glass check then reports whatever the removal left without a path (an open).
 */
import type { Design } from '../design/schema';
import { requireThat } from './command-error';
import { editDesign } from './design-draft';
import type { Patch } from './patch';
import { traceById } from './trace-point-ref';

export function deleteTraces(design: Design, args: { ids: readonly string[] }): Patch {
	requireThat(args.ids.length > 0, 'expected at least one trace');
	for (const id of args.ids) traceById(design, id);
	const gone = new Set(args.ids);
	const traces = design.glassArt.traces.filter((t) => !gone.has(t.id));
	return editDesign(design, (draft) => draft.setField('glassArt', { ...design.glassArt, traces }));
}
