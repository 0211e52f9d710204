/**
 * Addresses a point of a trace (a lead of the glass drawing) for hand editing. A trace is an open
 * polyline of at least two points, in millimetres, drawn with its own width; point `index` counts
 * from its start. Every edit is checked against the document schema, so nothing invalid is stored.
 */
import type { Trace } from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import { CommandError, requireThat } from './command-error';
import { editDesign } from './design-draft';
import type { Patch } from './patch';
import { checkedGlassArt } from './set-glass-art';

export interface TracePointRef {
	traceId: string;
	index: number;
}

export type TracePoint = Trace['points'][number];

export function traceById(design: Design, traceId: string): Trace {
	const trace = design.glassArt.traces.find((t) => t.id === traceId);
	if (!trace) throw new CommandError(`no trace "${traceId}"`);
	return trace;
}

export function checkTracePointIndex(points: readonly TracePoint[], index: number): void {
	requireThat(
		Number.isInteger(index) && index >= 0 && index < points.length,
		`no point ${index} on this trace`
	);
}

/** Replaces the points of one trace with `edit(points)`. */
export function editTracePoints(
	design: Design,
	traceId: string,
	edit: (points: readonly TracePoint[]) => TracePoint[]
): Patch {
	const trace = traceById(design, traceId);
	const points = edit(trace.points);
	const next = checkedGlassArt({
		...design.glassArt,
		traces: design.glassArt.traces.map((t) => (t === trace ? { ...t, points } : t))
	});
	return editDesign(design, (draft) => draft.setField('glassArt', next));
}
