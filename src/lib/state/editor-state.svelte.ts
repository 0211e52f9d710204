/**
 * What the editor shows and how it behaves, apart from the document: the active tool, the
 * selection, the view (zoom and pan), grid and snapping settings, the view mode and layer
 * visibility, and what a tool is drawing on top. All state is replaced, never mutated.
 */
import { getContext, setContext, untrack } from 'svelte';
import type { XY } from '$lib/core/geometry/vec';
import { EMPTY_OVERLAY, type Overlay } from '$lib/editor/overlay';
import {
	fitBounds,
	panBy,
	zoomAround,
	PX_PER_MM_TRUE_SIZE,
	type RectBounds,
	type ViewTransform
} from '$lib/editor/view-transform';
import type { ToolId } from '$lib/editor/tools/tool-ids';
import { EMPTY_IDS, idSet } from '$lib/editor/id-set';

export type ViewMode = 'wiring' | 'appearance';
export type EditorDialog = 'digits' | 'bars' | 'icons' | 'array' | 'help' | 'generator';

export interface LayerVisibility {
	electrodes: boolean;
	plates: boolean;
	grid: boolean;
}

export class EditorState {
	tool = $state<ToolId>('pick');
	selection = $state.raw<ReadonlySet<string>>(EMPTY_IDS);
	/** Selected nodes while editing nodes, as keys from node-refs.ts. */
	nodeSelection = $state.raw<ReadonlySet<string>>(EMPTY_IDS);
	view = $state.raw<ViewTransform>({ scale_px_per_mm: 10, offsetX_px: 40, offsetY_px: 40 });
	viewport = $state.raw<{ width_px: number; height_px: number }>({ width_px: 0, height_px: 0 });
	gridPitch_mm = $state(0.5);
	snapToGrid = $state(true);
	snapToShapes = $state(true);
	viewMode = $state<ViewMode>('wiring');
	layers = $state.raw<LayerVisibility>({ electrodes: true, plates: false, grid: true });
	hoverId = $state<string | null>(null);
	/** Space is held: dragging pans. */
	panKey = $state(false);
	pointer_mm = $state.raw<XY | null>(null);
	overlay = $state.raw<Overlay>(EMPTY_OVERLAY);
	/** Options of the drawing tools. */
	cornerRadius_mm = $state(0.5);
	polygonSides = $state(6);
	/** An open dialog or overlay, if any. */
	dialog = $state<EditorDialog | null>(null);
	/** The generated group the 'generator' dialog edits. */
	editGroupId = $state<string | null>(null);

	select(ids: Iterable<string>) {
		this.selection = idSet(ids);
	}

	setLayer(name: keyof LayerVisibility, visible: boolean) {
		this.layers = { ...this.layers, [name]: visible };
	}

	/** Overlay updates never make the caller depend on the overlay (effects may call them). */
	setOverlay(patch: Partial<Overlay>) {
		this.overlay = { ...untrack(() => this.overlay), ...patch };
	}

	clearOverlay() {
		if (untrack(() => this.overlay) !== EMPTY_OVERLAY) this.overlay = EMPTY_OVERLAY;
	}

	#centre(): XY {
		return { x: this.viewport.width_px / 2, y: this.viewport.height_px / 2 };
	}

	zoomBy(factor: number, anchor_px: XY = this.#centre()) {
		this.view = zoomAround(this.view, { factor, anchor_px });
	}

	trueSize() {
		this.zoomBy(PX_PER_MM_TRUE_SIZE / this.view.scale_px_per_mm);
	}

	pan(dx_px: number, dy_px: number) {
		this.view = panBy(this.view, dx_px, dy_px);
	}

	/** Shows `bounds` whole; false when the viewport is not laid out yet or bounds are empty. */
	fit(bounds: RectBounds, margin_px = 36): boolean {
		if (!(this.viewport.width_px > 0 && this.viewport.height_px > 0)) return false;
		const view = fitBounds(bounds, this.viewport, margin_px);
		if (view) this.view = view;
		return view !== null;
	}
}

const KEY = Symbol('editor-state');
export const setEditorState = (state: EditorState) => setContext(KEY, state);
export const getEditorState = () => getContext<EditorState>(KEY);
