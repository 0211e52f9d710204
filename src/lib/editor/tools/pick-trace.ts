/**
 * Traces in the pick tool, while the glass drawing's traces are on show: a press on a trace's
 * body (not covered by an electrode) picks the whole trace — its points become the node selection
 * and the electrode selection is cleared, so the properties panel shows the trace; dragging it
 * moves all its points as one undo step; Delete removes the picked traces whole.
 */
import type { XY } from '$lib/core/geometry/vec';
import { deleteTraces } from '$lib/core/commands/delete-traces';
import { moveNodeKeys } from '../node-edits';
import { activeTraces, allTraceNodeKeys, traceEdgeAt, traceNodeAt } from '../trace-nodes';
import type { ToolContext } from './tool';
import { REACH_px } from './points-state';

/**
 * Picks the trace under the point (shift adds it; pressing one of several picked traces keeps
 * them all, so they drag together); returns its id, or null when no trace is there.
 */
export function pickTraceAt(ctx: ToolContext, at: XY, shift: boolean): string | null {
	if (!ctx.tracesEditable) return null;
	const traces = ctx.design.glassArt.traces;
	const hit = traceEdgeAt({ traces, at, reach_mm: REACH_px / ctx.scale_px_per_mm });
	if (!hit) return null;
	const whole = traceKeys(ctx, hit.traceId);
	ctx.setSelection([]);
	if (!whole.every((k) => ctx.nodeSelection.has(k)))
		ctx.setNodeSelection(shift ? [...ctx.nodeSelection, ...whole] : whole);
	return hit.traceId;
}

/** A click (no drag) on one of several picked traces keeps only that one. */
export function keepOnlyTrace(ctx: ToolContext, traceId: string): void {
	const whole = traceKeys(ctx, traceId);
	if (whole.length > 0 && whole.length < ctx.nodeSelection.size) ctx.setNodeSelection(whole);
}

const traceKeys = (ctx: ToolContext, traceId: string): string[] => {
	const trace = ctx.design.glassArt.traces.find((t) => t.id === traceId);
	return trace ? allTraceNodeKeys(trace) : [];
};

export interface TraceMove {
	name: 'movingTrace';
	start: XY;
	/** The trace point nearest the press: it snaps while the trace is dragged. */
	anchor: XY;
	keys: readonly string[];
}

/** Starts moving the picked traces (all their points) as one undo step. */
export function startTraceMove(ctx: ToolContext, from: { start: XY; traceId: string }): TraceMove {
	const trace = ctx.design.glassArt.traces.find((t) => t.id === from.traceId);
	const ref = trace ? traceNodeAt({ traces: [trace], at: from.start, reach_mm: Infinity }) : null;
	const anchor = ref && trace ? { ...trace.points[ref.index] } : from.start;
	ctx.begin('Move trace');
	return { name: 'movingTrace', start: from.start, anchor, keys: [...ctx.nodeSelection] };
}

export function dragTrace(ctx: ToolContext, move: TraceMove & { to: XY; shift: boolean }): void {
	const raw = {
		x: move.anchor.x + move.to.x - move.start.x,
		y: move.anchor.y + move.to.y - move.start.y
	};
	const to = ctx.snap(raw, { from: move.anchor, angle: move.shift });
	const dx_mm = to.x - move.anchor.x;
	const dy_mm = to.y - move.anchor.y;
	ctx.preview((start) => moveNodeKeys(start, { keys: move.keys, dx_mm, dy_mm }));
	ctx.overlay({
		readout: { at: move.to, text: `Δ ${dx_mm.toFixed(3)}, ${dy_mm.toFixed(3)} mm` }
	});
}

/** Deletes the picked traces as one step; false when no trace is picked. */
export function deletePickedTraces(ctx: ToolContext): boolean {
	const ids = activeTraces(ctx.design, ctx.nodeSelection).map((t) => t.id);
	if (ids.length === 0) return false;
	const label = ids.length > 1 ? 'Delete traces' : 'Delete trace';
	if (ctx.run(label, (d) => deleteTraces(d, { ids }))) ctx.setNodeSelection([]);
	return true;
}
