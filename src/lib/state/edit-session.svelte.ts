/**
 * The editor's live design and its undo history. Every edit is a core command's patch applied
 * through the core History; a gesture (a drag) is one undo step and Escape bails back to its mark.
 *
 * The rest of the app reads `DesignState.design`; the session publishes to it after every edit,
 * but during a gesture only when the gesture ends, so a drag never re-runs the page's analysis
 * 60 times a second. Changes made elsewhere (drive and cell panels, file open) are picked up by
 * `sync`: a new document resets the history; an edit of the same document becomes an undo step
 * for the fields patches cover, and document fields patches do not cover (the cell and light
 * settings) are carried alongside the history unchanged, so such an edit never costs the undo
 * history.
 */
import type { Design } from '$lib/core/design/schema';
import { History } from '$lib/core/commands/history';
import { Gesture } from '$lib/core/commands/gesture';
import { COLLECTIONS, DOCUMENT_FIELDS, type Patch } from '$lib/core/commands/patch';
import { diffDesigns } from '$lib/core/commands/diff-design';
import { isNoopPatch } from '$lib/core/commands/patch-algebra';
import type { DesignState } from './design-state.svelte';

export type EditOutcome = { ok: true; patch: Patch } | { ok: false; message: string };

const COVERED = new Set<string>([...COLLECTIONS, ...DOCUMENT_FIELDS]);

export function messageOf(error: unknown): string {
	return error instanceof Error ? error.message : String(error);
}

/** The document fields a patch cannot carry, taken from `design`. */
function uncoveredFields(design: Design): Partial<Design> {
	return Object.fromEntries(Object.entries(design).filter(([k]) => !COVERED.has(k)));
}

export class EditSession {
	design = $state.raw<Design>(null as unknown as Design);
	canUndo = $state(false);
	canRedo = $state(false);
	undoLabel = $state<string | null>(null);
	redoLabel = $state<string | null>(null);
	/** The last command's refusal, shown in the status line; cleared by the next edit. */
	notice = $state<string | null>(null);
	gestureActive = $state(false);
	#history: History;
	#gesture: Gesture | null = null;
	#doc: DesignState;
	#published: Design;
	#serial: number;
	#extras: Partial<Design> = {};
	/** Set while taking in an outside change, which is already published. */
	#syncing = false;

	constructor(doc: DesignState) {
		this.#doc = doc;
		this.#history = new History(doc.design);
		this.#published = doc.design;
		this.#serial = doc.documentSerial;
		this.design = doc.design;
		// The history calls listeners before it updates its stacks, so the undo/redo flags are
		// refreshed after each operation below rather than here.
		this.#history.subscribe((design) => {
			this.design = this.#withExtras(design);
			if (!this.#gesture && !this.#syncing) this.#publish(this.design);
		});
	}

	#withExtras(design: Design): Design {
		const keys = Object.keys(this.#extras) as (keyof Design)[];
		return keys.some((k) => design[k] !== this.#extras[k])
			? { ...design, ...this.#extras }
			: design;
	}

	#refreshFlags() {
		this.canUndo = this.#history.canUndo;
		this.canRedo = this.#history.canRedo;
		this.undoLabel = this.#history.undoLabel;
		this.redoLabel = this.#history.redoLabel;
	}

	#publish(design: Design) {
		this.#published = design;
		if (this.#doc.design !== design) this.#doc.replace(design);
	}

	/** Picks up a design set on DesignState by someone else. */
	sync(design: Design, serial: number): void {
		if (design === this.#published && serial === this.#serial) return;
		if (this.#gesture) this.cancelGesture();
		this.#syncing = true;
		if (serial !== this.#serial) {
			this.#serial = serial;
			this.#extras = {};
			this.#history.reset(design);
		} else {
			this.#extras = uncoveredFields(design);
			const patch = diffDesigns(this.#history.design, design);
			if (!isNoopPatch(patch)) this.#history.apply(patch, 'Settings');
		}
		this.#syncing = false;
		this.design = this.#withExtras(this.#history.design);
		this.#published = design;
		this.#refreshFlags();
	}

	/** Runs a command against the live design and records its patch as one undo step. */
	run(label: string, command: (design: Design) => Patch): EditOutcome {
		if (this.#gesture) this.commitGesture();
		try {
			const patch = command(this.design);
			this.#history.apply(patch, label);
			this.#refreshFlags();
			this.notice = null;
			return { ok: true, patch };
		} catch (error) {
			this.notice = `${label}: ${messageOf(error)}`;
			return { ok: false, message: messageOf(error) };
		}
	}

	beginGesture(label: string): Design {
		if (this.#gesture) this.commitGesture();
		this.#gesture = new Gesture(this.#history, label);
		this.gestureActive = true;
		return this.#withExtras(this.#gesture.start);
	}

	get gestureStart(): Design | null {
		return this.#gesture ? this.#withExtras(this.#gesture.start) : null;
	}

	/** Replaces the gesture's effect so far by a patch computed against the gesture's start. */
	previewGesture(command: (start: Design) => Patch): EditOutcome {
		const gesture = this.#gesture;
		if (!gesture) return { ok: false, message: 'no gesture in progress' };
		try {
			const patch = command(gesture.start);
			gesture.replace(patch);
			this.#refreshFlags();
			return { ok: true, patch };
		} catch (error) {
			return { ok: false, message: messageOf(error) };
		}
	}

	#endGesture(end: (gesture: Gesture) => void): void {
		const gesture = this.#gesture;
		if (!gesture) return;
		this.#gesture = null;
		this.gestureActive = false;
		end(gesture);
		this.#refreshFlags();
		this.design = this.#withExtras(this.#history.design);
		this.#publish(this.design);
	}

	commitGesture(): void {
		this.#endGesture((g) => g.commit());
	}

	cancelGesture(): void {
		this.#endGesture((g) => g.cancel());
	}

	undo(): boolean {
		if (this.#gesture) this.cancelGesture();
		const done = this.#history.undo();
		this.#refreshFlags();
		return done;
	}

	redo(): boolean {
		if (this.#gesture) this.cancelGesture();
		const done = this.#history.redo();
		this.#refreshFlags();
		return done;
	}
}
