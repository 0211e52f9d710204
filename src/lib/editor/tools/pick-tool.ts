/**
 * Pick: click selects (shift-click adds or removes), dragging a selected electrode moves the
 * selection as one undo step, dragging on empty glass draws a selection box — left to right takes
 * electrodes wholly inside, right to left any it touches. Moves snap the grabbed vertex (or the
 * selection's top-left corner) to grid, vertices and edges; shift keeps 15° directions. While
 * the glass drawing's traces are on show, a trace picks, drags and deletes the same way
 * (pick-trace.ts).
 *
 * Idle ─down→ Pointing ─move past threshold→ Moving | Boxing ─up→ Idle; Escape → Idle.
 */
import type { XY } from '$lib/core/geometry/vec';
import { moveElectrodes } from '$lib/core/commands/move-electrodes';
import { rectFromCorners } from '../overlay';
import {
	deletePickedTraces,
	dragTrace,
	keepOnlyTrace,
	pickTraceAt,
	startTraceMove,
	type TraceMove
} from './pick-trace';
import {
	movedBeyondThreshold,
	type KeyInput,
	type PointerInput,
	type Tool,
	type ToolContext
} from './tool';
import { grabAnchor } from './grab-anchor';

type State =
	| { name: 'idle' }
	| {
			name: 'pointing';
			start: XY;
			hitId: string | null;
			traceId: string | null;
			shift: boolean;
			wasSelected: boolean;
	  }
	| { name: 'moving'; start: XY; anchor: XY; ids: readonly string[] }
	| TraceMove
	| { name: 'boxing'; start: XY; shift: boolean };

export class PickTool implements Tool {
	readonly id = 'pick';
	#state: State = { name: 'idle' };

	get state() {
		return this.#state.name;
	}

	get cursor() {
		return this.#state.name === 'moving' || this.#state.name === 'movingTrace' ? 'move' : 'default';
	}

	pointer(ctx: ToolContext, input: PointerInput): void {
		const s = this.#state;
		if (input.type === 'down') {
			if (input.button !== 0) return;
			const hitId = ctx.hit(input.point);
			const wasSelected = hitId !== null && ctx.selection.has(hitId);
			if (hitId && !wasSelected) {
				ctx.setSelection(input.shift ? [...ctx.selection, hitId] : [hitId]);
				ctx.setNodeSelection([]);
			}
			const traceId = hitId ? null : pickTraceAt(ctx, input.point, input.shift);
			this.#state = {
				name: 'pointing',
				start: input.point,
				hitId,
				traceId,
				shift: input.shift,
				wasSelected
			};
			return;
		}
		if (input.type === 'move') {
			if (s.name === 'pointing' && movedBeyondThreshold(ctx, s.start, input.point)) {
				if (s.hitId) this.#startMove(ctx, s.start);
				else if (s.traceId)
					this.#state = startTraceMove(ctx, { start: s.start, traceId: s.traceId });
				else this.#state = { name: 'boxing', start: s.start, shift: s.shift };
			}
			this.#drag(ctx, input);
			return;
		}
		if (s.name === 'pointing') this.#click(ctx, s);
		else if (s.name === 'moving' || s.name === 'movingTrace') {
			ctx.commit();
			ctx.clearOverlay();
		} else if (s.name === 'boxing') {
			const rect = rectFromCorners(s.start, input.point);
			const ids = ctx.inRect(rect, input.point.x >= s.start.x ? 'contains' : 'intersects');
			ctx.setSelection(s.shift ? [...ctx.selection, ...ids] : ids);
			if (!s.shift) ctx.setNodeSelection([]);
			ctx.clearOverlay();
		}
		this.#state = { name: 'idle' };
	}

	#startMove(ctx: ToolContext, start: XY) {
		const ids = [...ctx.selection];
		const design = ctx.begin('Move');
		this.#state = {
			name: 'moving',
			start,
			anchor: grabAnchor(design, ids, start, 8 / ctx.scale_px_per_mm),
			ids
		};
	}

	#drag(ctx: ToolContext, input: PointerInput) {
		const s = this.#state;
		if (s.name === 'movingTrace') {
			dragTrace(ctx, { ...s, to: input.point, shift: input.shift });
		} else if (s.name === 'moving') {
			const raw = {
				x: s.anchor.x + input.point.x - s.start.x,
				y: s.anchor.y + input.point.y - s.start.y
			};
			const to = ctx.snap(raw, { from: s.anchor, angle: input.shift, ignore: new Set(s.ids) });
			const dx_mm = to.x - s.anchor.x;
			const dy_mm = to.y - s.anchor.y;
			ctx.preview((start) => moveElectrodes(start, { ids: s.ids, dx_mm, dy_mm }));
			ctx.overlay({
				readout: { at: input.point, text: `Δ ${dx_mm.toFixed(3)}, ${dy_mm.toFixed(3)} mm` }
			});
		} else if (s.name === 'boxing') {
			ctx.overlay({ marquee: rectFromCorners(s.start, input.point) });
		}
	}

	#click(ctx: ToolContext, s: Extract<State, { name: 'pointing' }>) {
		if (s.traceId) {
			if (!s.shift) keepOnlyTrace(ctx, s.traceId);
			return;
		}
		if (!s.hitId) {
			if (s.shift) return;
			ctx.setSelection([]);
			ctx.setNodeSelection([]);
		} else if (s.wasSelected && s.shift) {
			ctx.setSelection([...ctx.selection].filter((id) => id !== s.hitId));
		} else if (s.wasSelected && ctx.selection.size > 1) {
			ctx.setSelection([s.hitId]);
		}
	}

	key(ctx: ToolContext, input: KeyInput): boolean {
		const erase = input.key === 'Delete' || input.key === 'Backspace';
		return erase && ctx.selection.size === 0 && deletePickedTraces(ctx);
	}

	cancel(ctx: ToolContext): void {
		if (this.#state.name === 'moving' || this.#state.name === 'movingTrace') ctx.cancelGesture();
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
	}
}
