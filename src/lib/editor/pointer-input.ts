/** Turns a DOM pointer event into a tool's PointerInput in document millimetres. */
import type { PointerInput } from './tools/tool';
import { screenToDoc, type ViewTransform } from './view-transform';

export interface PointerLike {
	clientX: number;
	clientY: number;
	button: number;
	shiftKey: boolean;
	altKey: boolean;
	ctrlKey: boolean;
	metaKey: boolean;
	detail: number;
}

export function toPointerInput(
	type: PointerInput['type'],
	event: PointerLike,
	options: { left: number; top: number; view: ViewTransform; clicks?: number }
): PointerInput {
	const screen = { x: event.clientX - options.left, y: event.clientY - options.top };
	return {
		type,
		point: screenToDoc(options.view, screen),
		button: event.button,
		shift: event.shiftKey,
		alt: event.altKey,
		mod: event.ctrlKey || event.metaKey,
		clicks: options.clicks ?? Math.max(1, event.detail || 1)
	};
}

/**
 * Click counting for pointer events (whose `detail` is 0 in some browsers): a press within
 * `interval_ms` and `reach_px` of the previous one counts up, anything else starts at 1.
 */
export class ClickCounter {
	#last = { t: -Infinity, x: 0, y: 0, n: 0 };
	constructor(
		private readonly interval_ms = 400,
		private readonly reach_px = 5
	) {}

	press(t_ms: number, x: number, y: number): number {
		const l = this.#last;
		const n =
			t_ms - l.t <= this.interval_ms && Math.hypot(x - l.x, y - l.y) <= this.reach_px ? l.n + 1 : 1;
		this.#last = { t: t_ms, x, y, n };
		return n;
	}
}
