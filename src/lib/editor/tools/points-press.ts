/**
 * A press of the points tool: a double click on a point toggles corner/smooth, on an edge of a
 * selected electrode or a picked trace adds a point; a press on a point (electrode or trace)
 * selects it (shift adds); on an unselected electrode it selects that electrode; on a trace's
 * body it picks the whole trace. Returns the Pointing state, or null when the press was used up.
 */
import type { Electrode } from '$lib/core/design/schema';
import type { XY } from '$lib/core/geometry/vec';
import { nearestPointOnContour } from '$lib/core/geometry/distance';
import { insertPoint } from '$lib/core/commands/insert-point';
import { insertTracePoint } from '$lib/core/commands/insert-trace-point';
import { contoursOf, nodeKey, nodesWithVisibleHandles, nodeTargetAt } from '../node-refs';
import { toggleNodesSmooth } from '../node-edits';
import {
	activeTraces,
	allTraceNodeKeys,
	traceEdgeAt,
	traceNodeAt,
	traceNodeKey
} from '../trace-nodes';
import type { PointerInput, ToolContext } from './tool';
import { REACH_px, type PointingState } from './points-state';

export const editableElectrodes = (ctx: ToolContext): Electrode[] =>
	ctx.design.electrodes.filter((e) => ctx.selection.has(e.id));

export function pressPoints(ctx: ToolContext, input: PointerInput): PointingState | null {
	const editable = editableElectrodes(ctx);
	const reach_mm = REACH_px / ctx.scale_px_per_mm;
	const target = nodeTargetAt({
		electrodes: editable,
		at: input.point,
		reach_mm,
		showHandlesOf: nodesWithVisibleHandles(editable, ctx.nodeSelection)
	});
	if (target?.part === 'point' && input.clicks >= 2) {
		ctx.run('Corner/smooth point', (d) => toggleNodesSmooth(d, { refs: [target] }));
		return null;
	}
	if (!target && input.clicks >= 2 && insertOnEdge(ctx, editable, input.point)) return null;
	const traces = ctx.tracesEditable ? ctx.design.glassArt.traces : [];
	const trace = target ? null : traceNodeAt({ traces, at: input.point, reach_mm });
	if (!target && !trace && input.clicks >= 2 && insertOnTrace(ctx, input.point)) return null;
	let wasSelected = false;
	const pressed = target?.part === 'point' ? nodeKey(target) : trace ? traceNodeKey(trace) : null;
	if (pressed) {
		wasSelected = ctx.nodeSelection.has(pressed);
		if (!wasSelected)
			ctx.setNodeSelection(input.shift ? [...ctx.nodeSelection, pressed] : [pressed]);
	} else if (!target) {
		const hitId = ctx.hit(input.point);
		if (hitId && !ctx.selection.has(hitId)) {
			ctx.setSelection(input.shift ? [...ctx.selection, hitId] : [hitId]);
			ctx.setNodeSelection([]);
			return null;
		}
		const body = hitId ? null : traceEdgeAt({ traces, at: input.point, reach_mm });
		if (body) {
			const whole = allTraceNodeKeys(traces.find((t) => t.id === body.traceId)!);
			ctx.setNodeSelection(input.shift ? [...ctx.nodeSelection, ...whole] : whole);
			return null;
		}
	}
	return { name: 'pointing', start: input.point, target, trace, shift: input.shift, wasSelected };
}

function insertOnEdge(ctx: ToolContext, editable: readonly Electrode[], at: XY): boolean {
	const reach = REACH_px / ctx.scale_px_per_mm;
	for (const e of editable) {
		const contours = contoursOf(e);
		for (let ci = 0; ci < contours.length; ci++) {
			const hit = nearestPointOnContour(contours[ci], at);
			if (hit.distance_mm > reach || !(hit.t > 1e-6 && hit.t < 1 - 1e-6)) continue;
			const patch = ctx.run('Add point', (d) =>
				insertPoint(d, {
					ref: { electrodeId: e.id, contour: ci },
					edgeIndex: hit.edgeIndex,
					t: hit.t
				})
			);
			if (patch)
				ctx.setNodeSelection([
					nodeKey({ electrodeId: e.id, contour: ci, index: hit.edgeIndex + 1 })
				]);
			return true;
		}
	}
	return false;
}

/** A double click on a picked trace's body adds a point there and selects it. */
function insertOnTrace(ctx: ToolContext, at: XY): boolean {
	const hit = traceEdgeAt({
		traces: activeTraces(ctx.design, ctx.nodeSelection),
		at,
		reach_mm: REACH_px / ctx.scale_px_per_mm
	});
	if (!hit || !(hit.t > 1e-6 && hit.t < 1 - 1e-6)) return false;
	if (ctx.run('Add trace point', (d) => insertTracePoint(d, hit)))
		ctx.setNodeSelection([traceNodeKey({ traceId: hit.traceId, index: hit.edgeIndex + 1 })]);
	return true;
}
