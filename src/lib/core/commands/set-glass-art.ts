/**
 * Edits the glass drawing's settings (seal, ledge, margin, trace width), one trace's points, or
 * clears the traces; each one undoable step. Values are checked with the document schema first,
 * so a bad value is refused with its path and nothing changes.
 */
import { glassArtSchema, type GlassArt, type Trace } from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import { CommandError } from './command-error';
import { editDesign } from './design-draft';
import type { Patch } from './patch';

/** The glass drawing as the document schema accepts it, or a CommandError naming the field. */
export function checkedGlassArt(next: GlassArt): GlassArt {
	const parsed = glassArtSchema.safeParse(next);
	if (!parsed.success) {
		const issue = parsed.error.issues[0];
		throw new CommandError(`glassArt.${issue.path.join('.')}: ${issue.message}`);
	}
	return parsed.data;
}

export function setGlassArt(
	design: Design,
	changes: Partial<Pick<GlassArt, 'seal' | 'ledge' | 'overlapMargin_mm' | 'traceWidth_mm'>>
): Patch {
	const next = checkedGlassArt({ ...design.glassArt, ...changes });
	return editDesign(design, (draft) => draft.setField('glassArt', next));
}

export function setTracePoints(
	design: Design,
	args: { id: string; points: Trace['points'] }
): Patch {
	const traces = design.glassArt.traces;
	const index = traces.findIndex((t) => t.id === args.id);
	if (index < 0) throw new CommandError(`no trace "${args.id}"`);
	const next = checkedGlassArt({
		...design.glassArt,
		traces: traces.map((t, i) => (i === index ? { ...t, points: args.points } : t))
	});
	return editDesign(design, (draft) => draft.setField('glassArt', next));
}

export function addTrace(design: Design, trace: Trace): Patch {
	if (design.glassArt.traces.some((t) => t.id === trace.id))
		throw new CommandError(`a trace "${trace.id}" exists already`);
	const next = checkedGlassArt({ ...design.glassArt, traces: [...design.glassArt.traces, trace] });
	return editDesign(design, (draft) => draft.setField('glassArt', next));
}
