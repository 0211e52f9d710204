/**
 * Points: edit the points and Bezier handles of the selected electrodes. Click a point to select
 * it (shift adds), drag points or handles (alt breaks a smooth point's handles apart), drag on
 * empty glass to box-select points, double-click an edge to add a point there, double-click a
 * point to switch it between corner and smooth, Delete removes the selected points.
 *
 * While the glass drawing's traces are on show, their points are nodes too: click a trace to pick
 * it (all its points), drag its points, double-click it to add a point; Delete removes the picked
 * points, and a trace left with fewer than two points is removed whole.
 *
 * The states are in points-state.ts; a press is read by points-press.ts, drags by points-drag.ts.
 */
import { nodeKey } from '../node-refs';
import { deleteNodeKeys } from '../node-edits';
import { traceNodeKey } from '../trace-nodes';
import { rectFromCorners } from '../overlay';
import { dragPoints, startPointsDrag } from './points-drag';
import { pointsInBox } from './points-in-box';
import { editableElectrodes, pressPoints } from './points-press';
import type { PointingState, PointsState } from './points-state';
import {
	movedBeyondThreshold,
	type KeyInput,
	type PointerInput,
	type Tool,
	type ToolContext
} from './tool';

/** The node key the press landed on, if any. */
const pressedKey = (s: PointingState): string | null =>
	s.target?.part === 'point' ? nodeKey(s.target) : s.trace ? traceNodeKey(s.trace) : null;

export class PointsTool implements Tool {
	readonly id = 'points';
	#state: PointsState = { name: 'idle' };

	get state() {
		return this.#state.name;
	}

	get cursor() {
		return this.#state.name === 'idle' ? 'default' : 'grabbing';
	}

	pointer(ctx: ToolContext, input: PointerInput): void {
		if (input.type === 'down') {
			if (input.button !== 0) return;
			const pointing = pressPoints(ctx, input);
			if (pointing) this.#state = pointing;
			return;
		}
		const s = this.#state;
		if (input.type === 'move') {
			if (s.name === 'pointing' && movedBeyondThreshold(ctx, s.start, input.point))
				this.#state = startPointsDrag(ctx, s);
			dragPoints(ctx, this.#state, input);
			return;
		}
		const key = s.name === 'pointing' ? pressedKey(s) : null;
		if (s.name === 'pointing' && key && s.shift && s.wasSelected) {
			ctx.setNodeSelection([...ctx.nodeSelection].filter((k) => k !== key));
		} else if (s.name === 'pointing' && !s.target && !s.trace && !s.shift) {
			ctx.setNodeSelection([]);
		} else if (s.name === 'movingPoints' || s.name === 'movingHandle') {
			ctx.commit();
		} else if (s.name === 'boxing') {
			const rect = rectFromCorners(s.start, input.point);
			const inside = pointsInBox(ctx, { rect, electrodes: editableElectrodes(ctx) });
			ctx.setNodeSelection(s.shift ? [...ctx.nodeSelection, ...inside] : inside);
		}
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
	}

	key(ctx: ToolContext, input: KeyInput): boolean {
		if ((input.key === 'Delete' || input.key === 'Backspace') && ctx.nodeSelection.size > 0) {
			const keys = [...ctx.nodeSelection];
			if (
				ctx.run(keys.length > 1 ? 'Delete points' : 'Delete point', (d) =>
					deleteNodeKeys(d, { keys })
				)
			)
				ctx.setNodeSelection([]);
			return true;
		}
		return false;
	}

	cancel(ctx: ToolContext): void {
		const s = this.#state.name;
		if (s === 'movingPoints' || s === 'movingHandle') ctx.cancelGesture();
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
	}
}
