/**
 * The contract between the canvas and its tools. A tool is a small state machine (Idle →
 * Pointing → Dragging and back) fed pointer and key input in document millimetres; it reads and
 * edits the design only through the ToolContext, which the canvas provides and tests fake.
 */
import type { Design } from '$lib/core/design/schema';
import type { Bounds } from '$lib/core/geometry/bounds';
import type { XY } from '$lib/core/geometry/vec';
import type { Patch } from '$lib/core/commands/patch';
import type { Overlay } from '../overlay';
import type { ToolId } from './tool-ids';

export interface PointerInput {
	type: 'down' | 'move' | 'up';
	/** Pointer position in document millimetres (unsnapped). */
	point: XY;
	button: number;
	shift: boolean;
	alt: boolean;
	/** Ctrl or Cmd. */
	mod: boolean;
	/** Click count of a down event (2 for a double click). */
	clicks: number;
}

export interface KeyInput {
	key: string;
	shift: boolean;
	alt: boolean;
	mod: boolean;
}

export interface SnapRequest {
	/** Anchor for 15° direction snapping (only used when `angle` is true). */
	from?: XY;
	angle?: boolean;
	/** Electrodes to leave out of vertex and edge snapping (the ones being moved). */
	ignore?: ReadonlySet<string>;
}

export interface ToolContext {
	readonly design: Design;
	readonly selection: ReadonlySet<string>;
	setSelection(ids: Iterable<string>): void;
	readonly nodeSelection: ReadonlySet<string>;
	setNodeSelection(keys: Iterable<string>): void;
	readonly scale_px_per_mm: number;
	readonly options: { cornerRadius_mm: number; polygonSides: number };
	/** The glass drawing's traces are on show, so their points can be picked and edited. */
	readonly tracesEditable: boolean;
	/** The topmost electrode under the point, or null. */
	hit(point: XY): string | null;
	/** Electrodes inside ('contains') or touching ('intersects') a rectangle, in draw order. */
	inRect(rect: Bounds, mode: 'contains' | 'intersects'): string[];
	/** Where the point lands after snapping; also shows the snap marker. */
	snap(point: XY, request?: SnapRequest): XY;
	overlay(patch: Partial<Overlay>): void;
	clearOverlay(): void;
	/** Exact bounds of the selection, or null when nothing is selected. */
	selectionBounds(): Bounds | null;
	/** Starts a gesture (one undo step); returns the design at its start. */
	begin(label: string): Design;
	/** Replaces the gesture's effect by a patch computed from the design at its start. */
	preview(command: (start: Design) => Patch): boolean;
	commit(): void;
	cancelGesture(): void;
	/** A one-shot edit; false (and a notice) when the command refuses. */
	run(label: string, command: (design: Design) => Patch): Patch | null;
	switchTool(id: ToolId): void;
}

export interface Tool {
	readonly id: ToolId;
	/** The state machine's current state, for the cursor and for tests. */
	readonly state: string;
	readonly cursor: string;
	pointer(ctx: ToolContext, input: PointerInput): void;
	/** Returns true when the tool used the key. */
	key(ctx: ToolContext, input: KeyInput): boolean;
	/** Escape or a tool switch: abandons an unfinished gesture. */
	cancel(ctx: ToolContext): void;
}

/** Pointer travel, in screen pixels, before a press becomes a drag. */
export const DRAG_THRESHOLD_px = 3;

export const movedBeyondThreshold = (ctx: ToolContext, a: XY, b: XY): boolean =>
	Math.hypot(a.x - b.x, a.y - b.y) * ctx.scale_px_per_mm > DRAG_THRESHOLD_px;
