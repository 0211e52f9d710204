/**
 * Turn: drag the round handle (or anywhere on the selection) to rotate it about the centre of its
 * bounds; shift keeps 15° steps. Positive angles are clockwise on screen, as in the document.
 *
 * Idle ─down on selection/handle→ Pointing ─move→ Turning ─up→ Idle; Escape bails the gesture.
 */
import type { XY } from '$lib/core/geometry/vec';
import { rotateElectrodes } from '$lib/core/commands/rotate-electrodes';
import { isOnTurnHandle } from '../handles';
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
	| { name: 'pointing'; start: XY; centre: XY }
	| { name: 'turning'; start: XY; centre: XY; ids: readonly string[] };

/** The signed angle from a to b seen from c, in degrees within (−180, 180]. */
export function angleBetween(c: XY, a: XY, b: XY): number {
	const d = Math.atan2(b.y - c.y, b.x - c.x) - Math.atan2(a.y - c.y, a.x - c.x);
	let deg = (d * 180) / Math.PI;
	while (deg <= -180) deg += 360;
	while (deg > 180) deg -= 360;
	return deg;
}

export class TurnTool implements Tool {
	readonly id = 'turn';
	#state: State = { name: 'idle' };

	get state() {
		return this.#state.name;
	}

	get cursor() {
		return this.#state.name === 'idle' ? 'default' : 'grabbing';
	}

	pointer(ctx: ToolContext, input: PointerInput): void {
		const s = this.#state;
		if (input.type === 'down') {
			if (input.button !== 0) return;
			const b = ctx.selectionBounds();
			const onHandle = b !== null && isOnTurnHandle(b, input.point, ctx.scale_px_per_mm);
			if (!onHandle && selectOnPress(ctx, input)) return;
			const frame = ctx.selectionBounds();
			if (!frame) return;
			const centre = { x: (frame.minX + frame.maxX) / 2, y: (frame.minY + frame.maxY) / 2 };
			this.#state = { name: 'pointing', start: input.point, centre };
			return;
		}
		if (input.type === 'move') {
			if (s.name === 'pointing' && movedBeyondThreshold(ctx, s.start, input.point)) {
				ctx.begin('Turn');
				this.#state = {
					name: 'turning',
					start: s.start,
					centre: s.centre,
					ids: [...ctx.selection]
				};
			}
			const t = this.#state;
			if (t.name !== 'turning') return;
			let angle = angleBetween(t.centre, t.start, input.point);
			if (input.shift) angle = Math.round(angle / 15) * 15;
			ctx.preview((start) =>
				rotateElectrodes(start, { ids: t.ids, angle_deg: angle, centre: t.centre })
			);
			ctx.overlay({
				guide: { from: t.centre, to: input.point },
				readout: { at: input.point, text: `${angle.toFixed(1)}°` }
			});
			return;
		}
		if (s.name === 'turning') ctx.commit();
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
	}

	key(_ctx: ToolContext, _input: KeyInput): boolean {
		return false;
	}

	cancel(ctx: ToolContext): void {
		if (this.#state.name === 'turning') ctx.cancelGesture();
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
	}
}
