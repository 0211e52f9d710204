/**
 * Wires the editor's parts for one workspace — edit session, editor state, tools, tool context,
 * clipboard — and carries out catalogue actions and key chords against them. It holds no
 * document state of its own.
 */
import type { Design } from '$lib/core/design/schema';
import type { Patch } from '$lib/core/commands/patch';
import { copySelection, serializeClipboard } from '$lib/core/commands/clipboard';
import { pasteClipboard } from '$lib/core/commands/paste-clipboard';
import { deleteElectrodes } from '$lib/core/commands/delete-electrodes';
import { insertedIds } from '$lib/core/commands/patch-algebra';
import { EMPTY_BOUNDS } from '$lib/core/geometry/bounds';
import { shapesTightBounds } from '$lib/core/geometry/tight-bounds';
import {
	ACTIONS,
	actionById,
	actionForChord,
	isEnabled,
	type ActionEnv
} from '$lib/editor/actions';
import { AppClipboard, type ClipboardPort } from '$lib/editor/clipboard-port';
import { EditorContext, IndexCache, type EditorPort } from '$lib/editor/editor-context';
import type { Overlay } from '$lib/editor/overlay';
import { chordOf, type KeyLike } from '$lib/editor/keymap';
import { createTools } from '$lib/editor/tools/create-tools';
import { EMPTY_IDS, idSet } from '$lib/editor/id-set';
import type { Tool } from '$lib/editor/tools/tool';
import type { ToolId } from '$lib/editor/tools/tool-ids';
import type { DesignState } from './design-state.svelte';
import { EditSession } from './edit-session.svelte';
import { EditorState } from './editor-state.svelte';

/** The editor state as tools see it; switching tools goes through the controller. */
class EditorPortOf implements EditorPort {
	constructor(
		private readonly editor: EditorState,
		private readonly switchTool: (id: ToolId) => void
	) {}
	get selection() {
		return this.editor.selection;
	}
	set selection(ids: ReadonlySet<string>) {
		this.editor.selection = ids;
	}
	get nodeSelection() {
		return this.editor.nodeSelection;
	}
	set nodeSelection(keys: ReadonlySet<string>) {
		this.editor.nodeSelection = keys;
	}
	get tool() {
		return this.editor.tool;
	}
	set tool(id: ToolId) {
		this.switchTool(id);
	}
	get view() {
		return this.editor.view;
	}
	get gridPitch_mm() {
		return this.editor.gridPitch_mm;
	}
	get snapToGrid() {
		return this.editor.snapToGrid;
	}
	get snapToShapes() {
		return this.editor.snapToShapes;
	}
	get cornerRadius_mm() {
		return this.editor.cornerRadius_mm;
	}
	get polygonSides() {
		return this.editor.polygonSides;
	}
	get layers() {
		return this.editor.layers;
	}
	setOverlay(patch: Partial<Overlay>) {
		this.editor.setOverlay(patch);
	}
	clearOverlay() {
		this.editor.clearOverlay();
	}
}

export class EditorController implements ActionEnv {
	readonly session: EditSession;
	readonly editor = new EditorState();
	readonly index = new IndexCache();
	readonly ctx: EditorContext;
	readonly tools: Record<ToolId, Tool> = createTools();
	readonly clipboard: ClipboardPort;
	#pasteCount = 0;

	constructor(doc: DesignState, options: { clipboard?: ClipboardPort } = {}) {
		this.session = new EditSession(doc);
		this.clipboard = options.clipboard ?? new AppClipboard();
		this.ctx = new EditorContext({
			session: this.session,
			index: this.index,
			editor: new EditorPortOf(this.editor, (id) => (this.tool = id))
		});
	}

	get design(): Design {
		return this.session.design;
	}
	get selection() {
		return this.editor.selection;
	}
	set selection(ids: ReadonlySet<string>) {
		this.editor.selection = ids;
	}
	get tool(): ToolId {
		return this.editor.tool;
	}
	set tool(id: ToolId) {
		if (id === this.editor.tool) return;
		this.tools[this.editor.tool].cancel(this.ctx);
		this.editor.tool = id;
		this.editor.nodeSelection = EMPTY_IDS;
	}
	get canUndo() {
		return this.session.canUndo;
	}
	get canRedo() {
		return this.session.canRedo;
	}
	get nudge_mm() {
		return this.editor.snapToGrid ? this.editor.gridPitch_mm : 0.1;
	}

	run(label: string, command: (design: Design) => Patch): Patch | null {
		const outcome = this.session.run(label, command);
		return outcome.ok ? outcome.patch : null;
	}

	/** Drops selected ids that no longer exist (after undo, delete, a new document). */
	pruneSelection() {
		const present = idSet(this.design.electrodes.map((e) => e.id));
		const kept = [...this.editor.selection].filter((id) => present.has(id));
		if (kept.length !== this.editor.selection.size) this.editor.select(kept);
	}

	undo() {
		this.tools[this.editor.tool].cancel(this.ctx);
		this.session.undo();
		this.pruneSelection();
	}
	redo() {
		this.tools[this.editor.tool].cancel(this.ctx);
		this.session.redo();
		this.pruneSelection();
	}

	/** The selection as clipboard text, or null when nothing is selected. */
	copyText(): string | null {
		if (this.selection.size === 0) return null;
		return serializeClipboard(copySelection(this.design, { ids: [...this.selection] }));
	}
	copy() {
		const text = this.copyText();
		if (text) void this.clipboard.write(text);
		this.#pasteCount = 0;
	}
	cut() {
		this.copy();
		if (this.run('Cut', (d) => deleteElectrodes(d, { ids: [...this.selection] })))
			this.editor.select([]);
	}
	paste(systemText?: string | null) {
		void this.clipboard.read(systemText).then((payload) => {
			if (!payload) {
				this.session.notice = 'Paste: the clipboard holds no sunglyph electrodes';
				return;
			}
			const taken = idSet(this.design.electrodes.map((e) => e.id));
			const clash = payload.electrodes.some((e) => taken.has(e.id));
			const step = clash ? ++this.#pasteCount : 0;
			const patch = this.run('Paste', (d) =>
				pasteClipboard(d, { payload, dx_mm: step, dy_mm: step })
			);
			if (patch) this.editor.select(insertedIds(patch));
		});
	}

	zoomBy(factor: number) {
		this.editor.zoomBy(factor);
	}
	trueSize() {
		this.editor.trueSize();
	}
	fitAll() {
		const g = this.design.glass;
		const b = shapesTightBounds(this.design.electrodes);
		this.editor.fit({
			minX: Math.min(0, b.minX),
			minY: Math.min(0, b.minY),
			maxX: Math.max(g.width_mm, b.maxX === EMPTY_BOUNDS.maxX ? 0 : b.maxX),
			maxY: Math.max(g.height_mm, b.maxY === EMPTY_BOUNDS.maxY ? 0 : b.maxY)
		});
	}
	fitSelection() {
		const b = this.ctx.selectionBounds();
		if (b) this.editor.fit(b, 60);
	}
	/** Selects one electrode and brings it into view. */
	reveal(id: string) {
		this.editor.select([id]);
		const b = this.ctx.selectionBounds();
		if (!b) return;
		const span = Math.max(b.maxX - b.minX, b.maxY - b.minY, 4);
		const cx = (b.minX + b.maxX) / 2;
		const cy = (b.minY + b.maxY) / 2;
		this.editor.fit({
			minX: cx - span * 2,
			minY: cy - span * 2,
			maxX: cx + span * 2,
			maxY: cy + span * 2
		});
	}
	/** Selects a finding's electrodes and zooms to its location (or to them), with some context. */
	showFinding(request: {
		electrodes: readonly string[];
		location?: { x_mm: number; y_mm: number; width_mm: number; height_mm: number };
	}) {
		const present = idSet(this.design.electrodes.map((e) => e.id));
		this.editor.select(request.electrodes.filter((id) => present.has(id)));
		const at = request.location;
		const b = at
			? { minX: at.x_mm, minY: at.y_mm, maxX: at.x_mm + at.width_mm, maxY: at.y_mm + at.height_mm }
			: this.ctx.selectionBounds();
		if (!b) return;
		const span = Math.max(b.maxX - b.minX, b.maxY - b.minY, 4);
		const cx = (b.minX + b.maxX) / 2;
		const cy = (b.minY + b.maxY) / 2;
		this.editor.fit({
			minX: cx - span * 0.75,
			minY: cy - span * 0.75,
			maxX: cx + span * 0.75,
			maxY: cy + span * 0.75
		});
	}
	toggleViewMode() {
		this.editor.viewMode = this.editor.viewMode === 'wiring' ? 'appearance' : 'wiring';
	}
	toggleGrid() {
		this.editor.setLayer('grid', !this.editor.layers.grid);
	}
	openDialog(which: 'digits' | 'bars' | 'icons' | 'array' | 'help') {
		this.editor.dialog = which;
	}

	runAction(id: string): boolean {
		const action = actionById(id);
		if (!action || !isEnabled(action, this)) return false;
		action.run(this);
		return true;
	}

	/** Handles a key press on the canvas or page; true when it was used. */
	keyDown(event: KeyLike): boolean {
		if (event.key === 'Escape') {
			const tool = this.tools[this.editor.tool];
			if (this.editor.dialog) this.editor.dialog = null;
			else if (tool.state !== 'idle' || this.session.gestureActive) tool.cancel(this.ctx);
			else if (this.editor.nodeSelection.size > 0) this.editor.nodeSelection = EMPTY_IDS;
			else this.editor.select([]);
			return true;
		}
		const input = {
			key: event.key,
			shift: event.shiftKey,
			alt: event.altKey,
			mod: event.ctrlKey || event.metaKey
		};
		if (this.tools[this.editor.tool].key(this.ctx, input)) return true;
		const action = actionForChord(chordOf(event));
		if (!action) return false;
		if (isEnabled(action, this)) action.run(this);
		return true;
	}
}

export { ACTIONS };
