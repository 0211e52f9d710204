/**
 * Size: drag one of the eight square handles to stretch the selection with the opposite handle
 * fixed; shift keeps the proportions. The dragged handle snaps to grid and shapes.
 *
 * Idle ─down on handle→ Pointing ─move→ Sizing ─up→ Idle; Escape bails the gesture.
 */
import type { Bounds } from '$lib/core/geometry/bounds';
import type { XY } from '$lib/core/geometry/vec';
import { scaleElectrodes } from '$lib/core/commands/scale-electrodes';
import { scaleForHandle, sizeHandleAt, sizeHandlePoint, type SizeHandle } from '../handles';
import {
	movedBeyondThreshold,
	type KeyInput,
	type PointerInput,
	type Tool,
	type ToolContext
} from './tool';
import { selectOnPress } from './select-on-press';

type State =
	| { name: 'idle' }
	| { name: 'pointing'; start: XY; handle: SizeHandle; bounds: Bounds }
	| { name: 'sizing'; start: XY; handle: SizeHandle; bounds: Bounds; ids: readonly string[] };

export class SizeTool implements Tool {
	readonly id = 'size';
	#state: State = { name: 'idle' };

	get state() {
		return this.#state.name;
	}

	get cursor() {
		return this.#state.name === 'idle' ? 'default' : 'nwse-resize';
	}

	pointer(ctx: ToolContext, input: PointerInput): void {
		const s = this.#state;
		if (input.type === 'down') {
			if (input.button !== 0) return;
			const bounds = ctx.selectionBounds();
			const handle = bounds ? sizeHandleAt(bounds, input.point, ctx.scale_px_per_mm) : null;
			if (!bounds || !handle) {
				selectOnPress(ctx, input);
				return;
			}
			this.#state = { name: 'pointing', start: input.point, handle, bounds };
			return;
		}
		if (input.type === 'move') {
			if (s.name === 'pointing' && movedBeyondThreshold(ctx, s.start, input.point)) {
				ctx.begin('Resize');
				this.#state = {
					name: 'sizing',
					start: s.start,
					handle: s.handle,
					bounds: s.bounds,
					ids: [...ctx.selection]
				};
			}
			const t = this.#state;
			if (t.name !== 'sizing') return;
			const grabbed = sizeHandlePoint(t.bounds, t.handle);
			const raw = {
				x: grabbed.x + input.point.x - t.start.x,
				y: grabbed.y + input.point.y - t.start.y
			};
			const to = ctx.snap(raw, { ignore: new Set(t.ids) });
			const { sx, sy, origin } = scaleForHandle({
				bounds: t.bounds,
				handle: t.handle,
				to,
				uniform: input.shift
			});
			ctx.preview((start) => scaleElectrodes(start, { ids: t.ids, sx, sy, origin }));
			const w = (t.bounds.maxX - t.bounds.minX) * Math.abs(sx);
			const h = (t.bounds.maxY - t.bounds.minY) * Math.abs(sy);
			ctx.overlay({ readout: { at: input.point, text: `${w.toFixed(3)} × ${h.toFixed(3)} mm` } });
			return;
		}
		if (s.name === 'sizing') ctx.commit();
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
	}

	key(_ctx: ToolContext, _input: KeyInput): boolean {
		return false;
	}

	cancel(ctx: ToolContext): void {
		if (this.#state.name === 'sizing') ctx.cancelGesture();
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
	}
}
