/**
 * Curve: a pen for Bezier outlines. Click places a corner, press-and-drag places a smooth point
 * whose handles follow the drag; shift keeps the new point on 15° directions from the last one.
 * Clicking the first point, double-clicking or Enter closes the outline into a new electrode;
 * Backspace removes the last point; Escape drops the draft.
 *
 * Idle ─down→ Pulling ─up→ Placing ─down→ Pulling … ─close→ Idle.
 */
import type { Point } from '$lib/core/design/schema';
import { penPathContour } from '$lib/core/geometry/primitive-shapes';
import { addElectrodes } from '$lib/core/commands/add-electrodes';
import { insertedIds } from '$lib/core/commands/patch-algebra';
import {
	movedBeyondThreshold,
	type KeyInput,
	type PointerInput,
	type Tool,
	type ToolContext
} from './tool';

type State =
	| { name: 'idle' }
	| { name: 'placing'; points: Point[] }
	| { name: 'pulling'; points: Point[]; dragged: boolean };

/** Reach around the first point that closes the outline, in screen pixels. */
const CLOSE_REACH_px = 8;

export class CurveTool implements Tool {
	readonly id = 'curve';
	#state: State = { name: 'idle' };

	get state() {
		return this.#state.name;
	}

	get cursor() {
		return 'crosshair';
	}

	/** The points placed so far (for tests and the overlay). */
	get points(): readonly Point[] {
		return this.#state.name === 'idle' ? [] : this.#state.points;
	}

	pointer(ctx: ToolContext, input: PointerInput): void {
		const s = this.#state;
		const last = s.name === 'idle' ? undefined : s.points[s.points.length - 1];
		if (input.type === 'down') {
			if (input.button !== 0) return;
			const points = s.name === 'idle' ? [] : s.points;
			if (input.clicks >= 2 && points.length >= 3) return this.#finish(ctx);
			const first = points[0];
			if (
				first &&
				points.length >= 3 &&
				Math.hypot(first.x - input.point.x, first.y - input.point.y) * ctx.scale_px_per_mm <=
					CLOSE_REACH_px
			)
				return this.#finish(ctx);
			const p = ctx.snap(input.point, { from: last, angle: input.shift && last !== undefined });
			this.#state = { name: 'pulling', points: [...points, { x: p.x, y: p.y }], dragged: false };
			this.#show(ctx, null);
			return;
		}
		if (input.type === 'move') {
			if (s.name === 'placing') {
				const p = ctx.snap(input.point, { from: last, angle: input.shift });
				this.#show(ctx, p);
			} else if (s.name === 'pulling') {
				const anchor = s.points[s.points.length - 1];
				if (!s.dragged && !movedBeyondThreshold(ctx, anchor, input.point)) return;
				const v: [number, number] = [input.point.x - anchor.x, input.point.y - anchor.y];
				const smooth: Point = { x: anchor.x, y: anchor.y, in: [-v[0], -v[1]], out: v };
				this.#state = {
					name: 'pulling',
					points: [...s.points.slice(0, -1), smooth],
					dragged: true
				};
				this.#show(ctx, null);
			} else ctx.snap(input.point);
			return;
		}
		if (s.name === 'pulling') this.#state = { name: 'placing', points: s.points };
	}

	#show(ctx: ToolContext, rubber: { x: number; y: number } | null) {
		const points = this.points;
		ctx.overlay({ draft: { points, closed: false, rubber: rubber ?? undefined } });
	}

	#finish(ctx: ToolContext) {
		const points = this.points;
		this.cancel(ctx);
		if (points.length < 3) return;
		const patch = ctx.run('Draw curve', (design) =>
			addElectrodes(design, {
				electrodes: [{ outline: penPathContour(points), kind: 'segment' }],
				idPrefix: 'e'
			})
		);
		if (patch) ctx.setSelection(insertedIds(patch));
	}

	key(ctx: ToolContext, input: KeyInput): boolean {
		const s = this.#state;
		if (s.name === 'idle') return false;
		if (input.key === 'Enter') {
			this.#finish(ctx);
			return true;
		}
		if (input.key === 'Backspace' || input.key === 'Delete') {
			const points = s.points.slice(0, -1);
			this.#state = points.length ? { name: 'placing', points } : { name: 'idle' };
			if (points.length) this.#show(ctx, null);
			else ctx.clearOverlay();
			return true;
		}
		return false;
	}

	cancel(ctx: ToolContext): void {
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
	}
}
