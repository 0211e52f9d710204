/**
 * Pointer, wheel and resize input of the drawing stage: presses and moves go to the active tool
 * in document millimetres (with click counting and hover hit-testing); the middle button, a held
 * Space and the Pan tool pan; the wheel zooms around the pointer, shift+wheel pans across and
 * alt+wheel pans down.
 */
import type { EditorContext } from '$lib/editor/editor-context';
import type { Tool } from '$lib/editor/tools/tool';
import type { ToolId } from '$lib/editor/tools/tool-ids';
import { ClickCounter, toPointerInput } from '$lib/editor/pointer-input';
import { wheelZoomFactor } from '$lib/editor/view-transform';
import type { EditorState } from '$lib/state/editor-state.svelte';

const MIDDLE_EVENTS = ['mousedown', 'mouseup', 'auxclick'] as const;

export class StageInput {
	panning = $state.raw<{ x: number; y: number } | null>(null);
	pointer_px = $state.raw<{ x: number; y: number } | null>(null);
	toolState = $state('idle');
	#clicks = new ClickCounter();
	#stage: HTMLElement | null = null;

	constructor(
		private readonly editor: EditorState,
		private readonly tools: Record<ToolId, Tool>,
		private readonly ctx: EditorContext
	) {}

	/** Wires wheel, middle-button and size listeners to the stage; returns the cleanup. */
	attach(stage: HTMLElement): () => void {
		this.#stage = stage;
		const observer = new ResizeObserver(() => {
			this.editor.viewport = { width_px: stage.clientWidth, height_px: stage.clientHeight };
		});
		observer.observe(stage);
		const onWheel = (event: WheelEvent) => this.#wheel(event);
		// The middle button pans here; keep the browser from autoscrolling or pasting with it.
		const noMiddle = (event: MouseEvent) => event.button === 1 && event.preventDefault();
		stage.addEventListener('wheel', onWheel, { passive: false });
		for (const type of MIDDLE_EVENTS) stage.addEventListener(type, noMiddle);
		return () => {
			observer.disconnect();
			stage.removeEventListener('wheel', onWheel);
			for (const type of MIDDLE_EVENTS) stage.removeEventListener(type, noMiddle);
			this.#stage = null;
		};
	}

	#wheel(event: WheelEvent) {
		event.preventDefault();
		const r = this.#stage!.getBoundingClientRect();
		if (event.shiftKey) this.editor.pan(-(event.deltaY || event.deltaX), 0);
		else if (event.altKey) this.editor.pan(0, -event.deltaY);
		else
			this.editor.zoomBy(wheelZoomFactor(event.deltaY, event.deltaMode), {
				x: event.clientX - r.left,
				y: event.clientY - r.top
			});
	}

	#input(type: 'down' | 'move' | 'up', event: PointerEvent, clicks?: number) {
		const r = this.#stage!.getBoundingClientRect();
		return toPointerInput(type, event, {
			left: r.left,
			top: r.top,
			view: this.editor.view,
			clicks
		});
	}

	#tool(): Tool {
		return this.tools[this.editor.tool];
	}

	down = (event: PointerEvent) => {
		const stage = this.#stage;
		if (!stage || event.button === 2) return;
		stage.setPointerCapture(event.pointerId);
		if (event.button === 1 || this.editor.panKey || this.editor.tool === 'pan') {
			event.preventDefault();
			this.panning = { x: event.clientX, y: event.clientY };
			return;
		}
		const r = stage.getBoundingClientRect();
		const n = this.#clicks.press(event.timeStamp, event.clientX - r.left, event.clientY - r.top);
		this.#tool().pointer(this.ctx, this.#input('down', event, n));
		this.toolState = this.#tool().state;
	};

	move = (event: PointerEvent) => {
		const stage = this.#stage;
		if (!stage) return;
		const r = stage.getBoundingClientRect();
		this.pointer_px = { x: event.clientX - r.left, y: event.clientY - r.top };
		if (this.panning) {
			this.editor.pan(event.clientX - this.panning.x, event.clientY - this.panning.y);
			this.panning = { x: event.clientX, y: event.clientY };
			return;
		}
		const input = this.#input('move', event);
		this.editor.pointer_mm = input.point;
		this.#tool().pointer(this.ctx, input);
		this.toolState = this.#tool().state;
		const hover =
			this.toolState === 'idle' && event.buttons === 0 ? this.ctx.hit(input.point) : null;
		if (hover !== this.editor.hoverId) this.editor.hoverId = hover;
	};

	up = (event: PointerEvent) => {
		const stage = this.#stage;
		if (!stage) return;
		if (stage.hasPointerCapture(event.pointerId)) stage.releasePointerCapture(event.pointerId);
		if (this.panning) {
			this.panning = null;
			return;
		}
		if (event.button === 2) return;
		this.#tool().pointer(this.ctx, this.#input('up', event));
		this.toolState = this.#tool().state;
	};

	leave = () => {
		this.pointer_px = null;
		this.editor.pointer_mm = null;
		if (this.editor.hoverId) this.editor.hoverId = null;
		if (this.toolState === 'idle' && this.editor.overlay.snap)
			this.editor.setOverlay({ snap: null });
	};
}
