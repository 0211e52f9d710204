/**
 * The ToolContext the canvas hands to tools: selection and overlay go to the editor state, edits
 * to the edit session, hit-testing and snapping to the core's spatial index (rebuilt per design,
 * reusing unchanged electrodes). Tolerances are in screen pixels, converted with the view scale.
 */
import type { Design } from '$lib/core/design/schema';
import type { Bounds } from '$lib/core/geometry/bounds';
import type { XY } from '$lib/core/geometry/vec';
import type { Patch } from '$lib/core/commands/patch';
import { buildSpatialIndex, type SpatialIndex } from '$lib/core/geometry/spatial-index';
import { hitTest, queryRect } from '$lib/core/geometry/hit-test';
import { snapCandidatesNear } from '$lib/core/geometry/snap-candidates';
import { snapPoint } from '$lib/core/geometry/snap';
import { selectionBounds } from '$lib/core/commands/selection';
import type { Overlay } from './overlay';
import type { ViewTransform } from './view-transform';
import type { SnapRequest, ToolContext } from './tools/tool';
import type { ToolId } from './tools/tool-ids';

/** Hit reach around an outline and snap reach, in screen pixels. */
export const HIT_REACH_px = 3;
export const SNAP_REACH_px = 8;

export interface SessionPort {
	readonly design: Design;
	/** The design when the running gesture began, or null between gestures. */
	readonly gestureStart: Design | null;
	run(
		label: string,
		command: (design: Design) => Patch
	): { ok: true; patch: Patch } | { ok: false; message: string };
	beginGesture(label: string): Design;
	previewGesture(command: (start: Design) => Patch): { ok: boolean };
	commitGesture(): void;
	cancelGesture(): void;
}

export interface EditorPort {
	selection: ReadonlySet<string>;
	nodeSelection: ReadonlySet<string>;
	tool: ToolId;
	readonly view: ViewTransform;
	readonly gridPitch_mm: number;
	readonly snapToGrid: boolean;
	readonly snapToShapes: boolean;
	readonly cornerRadius_mm: number;
	readonly polygonSides: number;
	readonly layers: { electrodes: boolean; plates?: boolean };
	setOverlay(patch: Partial<Overlay>): void;
	clearOverlay(): void;
}

/** Cached spatial index of the latest design, shared by the context and the canvas. */
export class IndexCache {
	#design: Design | null = null;
	#index: SpatialIndex | null = null;

	get(design: Design): SpatialIndex {
		if (this.#design !== design || !this.#index) {
			this.#index = buildSpatialIndex(design.electrodes, {
				previous: this.#index ?? undefined,
				cellSize_mm: 4
			});
			this.#design = design;
		}
		return this.#index;
	}
}

export class EditorContext implements ToolContext {
	readonly #session: SessionPort;
	readonly #editor: EditorPort;
	readonly #index: IndexCache;
	#boundsKey: [Design, ReadonlySet<string>] | null = null;
	#bounds: Bounds | null = null;

	constructor(options: { session: SessionPort; editor: EditorPort; index?: IndexCache }) {
		this.#session = options.session;
		this.#editor = options.editor;
		this.#index = options.index ?? new IndexCache();
	}

	get design() {
		return this.#session.design;
	}
	get selection() {
		return this.#editor.selection;
	}
	setSelection(ids: Iterable<string>) {
		this.#editor.selection = new Set(ids);
	}
	get nodeSelection() {
		return this.#editor.nodeSelection;
	}
	setNodeSelection(keys: Iterable<string>) {
		this.#editor.nodeSelection = new Set(keys);
	}
	get scale_px_per_mm() {
		return this.#editor.view.scale_px_per_mm;
	}
	get options() {
		return {
			cornerRadius_mm: this.#editor.cornerRadius_mm,
			polygonSides: this.#editor.polygonSides
		};
	}

	get tracesEditable() {
		return this.#editor.layers.plates === true;
	}

	hit(point: XY): string | null {
		if (!this.#editor.layers.electrodes) return null;
		const index = this.#index.get(this.design);
		return hitTest(index, point, HIT_REACH_px / this.scale_px_per_mm)?.id ?? null;
	}

	inRect(rect: Bounds, mode: 'contains' | 'intersects'): string[] {
		if (!this.#editor.layers.electrodes) return [];
		return queryRect(this.#index.get(this.design), rect, mode);
	}

	snap(point: XY, request: SnapRequest = {}): XY {
		const tolerance_mm = SNAP_REACH_px / this.scale_px_per_mm;
		let result;
		if (request.angle && request.from) {
			result = snapPoint({
				point,
				tolerance_mm: Infinity,
				angleFrom: request.from,
				angleStep_deg: 15
			});
		} else {
			// During a gesture the electrodes being dragged are left out anyway, so the index of
			// the gesture's start design serves and need not be rebuilt on every frame.
			const snapDesign = this.#session.gestureStart ?? this.design;
			const candidates = this.#editor.snapToShapes
				? snapCandidatesNear(this.#index.get(snapDesign), {
						point,
						radius_mm: tolerance_mm,
						excludeIds: request.ignore
					})
				: undefined;
			result = snapPoint({
				point,
				tolerance_mm,
				candidates,
				gridPitch_mm: this.#editor.snapToGrid ? this.#editor.gridPitch_mm : undefined
			});
		}
		this.#editor.setOverlay({
			snap: result.kind === 'none' ? null : { point: result.point, kind: result.kind }
		});
		return result.point;
	}

	overlay(patch: Partial<Overlay>) {
		this.#editor.setOverlay(patch);
	}
	clearOverlay() {
		this.#editor.clearOverlay();
	}

	selectionBounds(): Bounds | null {
		const design = this.design;
		const selection = this.selection;
		if (this.#boundsKey?.[0] === design && this.#boundsKey[1] === selection) return this.#bounds;
		this.#boundsKey = [design, selection];
		try {
			this.#bounds = selection.size > 0 ? selectionBounds(design, [...selection]) : null;
		} catch {
			this.#bounds = null;
		}
		return this.#bounds;
	}

	begin(label: string): Design {
		return this.#session.beginGesture(label);
	}
	preview(command: (start: Design) => Patch): boolean {
		return this.#session.previewGesture(command).ok;
	}
	commit() {
		this.#session.commitGesture();
	}
	cancelGesture() {
		this.#session.cancelGesture();
	}
	run(label: string, command: (design: Design) => Patch): Patch | null {
		const outcome = this.#session.run(label, command);
		return outcome.ok ? outcome.patch : null;
	}
	switchTool(id: ToolId) {
		this.#editor.tool = id;
	}
}
