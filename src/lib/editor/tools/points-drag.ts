/**
 * Dragging in the points tool: the press turns into moving the selected points (electrode and
 * trace points alike, one undo step), moving a Bezier handle (alt breaks a smooth point's handles
 * apart), or a selection box; each pointer move previews the edit from the gesture's start.
 */
import type { XY } from '$lib/core/geometry/vec';
import { moveHandle } from '$lib/core/commands/move-handle';
import { nodePosition, parseNodeKey, type NodeRef } from '../node-refs';
import { moveNodeKeys } from '../node-edits';
import { traceNodePosition } from '../trace-nodes';
import { rectFromCorners } from '../overlay';
import type { PointerInput, ToolContext } from './tool';
import type { PointingState, PointsState } from './points-state';

/** The state a drag from this press starts; the same Pointing state when nothing can move. */
export function startPointsDrag(ctx: ToolContext, s: PointingState): PointsState {
	const t = s.target;
	if (!t && s.trace) {
		const anchor = traceNodePosition(ctx.design, s.trace);
		return anchor ? startMoving(ctx, s.start, anchor) : s;
	}
	if (!t) return { name: 'boxing', start: s.start, shift: s.shift };
	const e = ctx.design.electrodes.find((x) => x.id === t.electrodeId);
	const at = e ? nodePosition(e, t) : null;
	if (!e || !at) return s;
	if (t.part === 'point') return startMoving(ctx, s.start, at);
	const point = nodePosition(e, { ...t, part: 'point' })!;
	ctx.begin('Move handle');
	return { name: 'movingHandle', target: t, point, alt: false };
}

/** Starts moving every selected node, electrode and trace points alike. */
function startMoving(ctx: ToolContext, start: XY, anchor: XY): PointsState {
	const keys = [...ctx.nodeSelection];
	const refs = keys.map(parseNodeKey).filter((r): r is NodeRef => r !== null);
	ctx.begin(keys.length > 1 ? 'Move points' : 'Move point');
	return {
		name: 'movingPoints',
		start,
		anchor,
		keys,
		ignore: new Set(refs.map((r) => r.electrodeId))
	};
}

export function dragPoints(ctx: ToolContext, s: PointsState, input: PointerInput): void {
	if (s.name === 'movingPoints') {
		const raw = {
			x: s.anchor.x + input.point.x - s.start.x,
			y: s.anchor.y + input.point.y - s.start.y
		};
		const to = ctx.snap(raw, { from: s.anchor, angle: input.shift, ignore: s.ignore });
		const dx_mm = to.x - s.anchor.x;
		const dy_mm = to.y - s.anchor.y;
		ctx.preview((start) => moveNodeKeys(start, { keys: s.keys, dx_mm, dy_mm }));
		ctx.overlay({
			readout: { at: input.point, text: `${to.x.toFixed(3)}, ${to.y.toFixed(3)} mm` }
		});
	} else if (s.name === 'movingHandle') {
		const to = ctx.snap(input.point, {
			from: s.point,
			angle: input.shift,
			ignore: new Set([s.target.electrodeId])
		});
		const side = s.target.part === 'in' ? 'in' : 'out';
		ctx.preview((start) =>
			moveHandle(start, {
				ref: s.target,
				side,
				dx_mm: to.x - s.point.x,
				dy_mm: to.y - s.point.y,
				partner: input.alt ? 'free' : undefined
			})
		);
	} else if (s.name === 'boxing') {
		ctx.overlay({ marquee: rectFromCorners(s.start, input.point) });
	}
}
