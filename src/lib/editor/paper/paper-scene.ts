/**
 * One paper.js scope per canvas, holding the layers the editor draws into, bottom to top: glass,
 * grid, common plates, electrodes, overlay. Paper items are a view of our design and are rebuilt
 * from it; nothing here is ever read back into the document. The view matrix takes document
 * millimetres to CSS pixels (see view-transform.ts). We load paper-core (paper.js without
 * PaperScript), the module the core's boolean kernel uses too, so the app carries one copy.
 */
import paper from 'paper/dist/paper-core';
import type { ViewTransform } from '../view-transform';

export type LayerName = 'glass' | 'grid' | 'plates' | 'electrodes' | 'overlay';
const LAYER_ORDER: readonly LayerName[] = ['glass', 'grid', 'plates', 'electrodes', 'overlay'];

export class PaperScene {
	readonly scope: paper.PaperScope;
	readonly layers: Record<LayerName, paper.Layer>;
	#view: ViewTransform = { scale_px_per_mm: 1, offsetX_px: 0, offsetY_px: 0 };

	constructor(canvas: HTMLCanvasElement) {
		this.scope = new paper.PaperScope();
		this.scope.setup(canvas);
		this.scope.settings.insertItems = false;
		this.scope.settings.hitTolerance = 0;
		const layers = {} as Record<LayerName, paper.Layer>;
		for (const name of LAYER_ORDER) {
			const layer = new this.scope.Layer({ name });
			this.scope.project.addLayer(layer);
			layers[name] = layer;
		}
		this.layers = layers;
	}

	/** Makes this scope the active one before items are created (paper keeps a global scope). */
	activate(): void {
		this.scope.activate();
	}

	get view(): ViewTransform {
		return this.#view;
	}

	setView(view: ViewTransform): void {
		this.#view = view;
		const { scale_px_per_mm: s, offsetX_px: x, offsetY_px: y } = view;
		this.scope.view.matrix = new this.scope.Matrix(s, 0, 0, s, x, y);
	}

	resize(width_px: number, height_px: number): void {
		if (!(width_px > 0 && height_px > 0)) return;
		this.scope.view.viewSize = new this.scope.Size(width_px, height_px);
	}

	/** Puts the grid under the glass (appearance view: the glass hides it) or over it. */
	setGridOverGlass(over: boolean): void {
		if (over) this.layers.grid.insertAbove(this.layers.glass);
		else this.layers.grid.insertBelow(this.layers.glass);
	}

	setLayerVisible(name: LayerName, visible: boolean): void {
		this.layers[name].visible = visible;
	}

	/** Draws now instead of at the next animation frame (used right after large re-syncs). */
	drawNow(): void {
		this.scope.view.update();
	}

	destroy(): void {
		this.scope.project.clear();
		this.scope.view.remove();
	}
}
