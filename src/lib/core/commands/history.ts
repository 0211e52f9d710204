/**
 * Undo/redo history over immutable designs. Each undo step is one patch; undo applies its inverse,
 * redo applies it again. Marks are positions in the undo stack: `bailToMark` reverts and drops
 * every step after a mark (cancel a gesture with Escape), `squashToMark` merges them into one step
 * (a whole drag becomes one undo). Any new step clears the redo stack. Edits that change nothing
 * are not recorded.
 */
import type { Design } from '../design/schema';
import { CommandError } from './command-error';
import { applyPatch, type Patch } from './patch';
import { invertPatch, isNoopPatch, squashPatches } from './patch-algebra';

export interface HistoryStep {
	readonly patch: Patch;
	readonly label: string;
}

export interface HistoryMark {
	/** Number of undo steps below the mark. */
	readonly depth: number;
	/** The step right below the mark, to recognise a mark that undo has passed. */
	readonly below: HistoryStep | null;
}

export type HistoryListener = (design: Design) => void;

export class History {
	private current: Design;
	private undoStack: HistoryStep[] = [];
	private redoStack: HistoryStep[] = [];
	private readonly listeners = new Set<HistoryListener>();

	constructor(design: Design) {
		this.current = design;
	}

	get design(): Design {
		return this.current;
	}
	get canUndo(): boolean {
		return this.undoStack.length > 0;
	}
	get canRedo(): boolean {
		return this.redoStack.length > 0;
	}
	get undoLabel(): string | null {
		return this.undoStack.at(-1)?.label ?? null;
	}
	get redoLabel(): string | null {
		return this.redoStack.at(-1)?.label ?? null;
	}

	/** Calls `listener` with the new design after every change; returns the unsubscribe function. */
	subscribe(listener: HistoryListener): () => void {
		this.listeners.add(listener);
		return () => this.listeners.delete(listener);
	}

	/** Tells listeners once the design and both stacks are up to date. */
	private notify(): void {
		for (const listener of this.listeners) listener(this.current);
	}

	/** Applies a patch as a new undo step. Returns false (and records nothing) for a no-op. */
	apply(patch: Patch, label = ''): boolean {
		if (isNoopPatch(patch)) return false;
		this.current = applyPatch(this.current, patch);
		this.undoStack.push({ patch, label });
		this.redoStack = [];
		this.notify();
		return true;
	}

	undo(): boolean {
		const step = this.undoStack.pop();
		if (!step) return false;
		this.current = applyPatch(this.current, invertPatch(step.patch));
		this.redoStack.push(step);
		this.notify();
		return true;
	}

	redo(): boolean {
		const step = this.redoStack.pop();
		if (!step) return false;
		this.current = applyPatch(this.current, step.patch);
		this.undoStack.push(step);
		this.notify();
		return true;
	}

	mark(): HistoryMark {
		return { depth: this.undoStack.length, below: this.undoStack.at(-1) ?? null };
	}

	private checkMark(mark: HistoryMark): void {
		const valid =
			this.undoStack.length >= mark.depth &&
			(mark.depth === 0 ? mark.below === null : this.undoStack[mark.depth - 1] === mark.below);
		if (!valid) throw new CommandError('the history mark is no longer on the undo stack');
	}

	/** Reverts and forgets every step after the mark. */
	bailToMark(mark: HistoryMark): void {
		this.checkMark(mark);
		const dropped = this.undoStack.splice(mark.depth);
		if (dropped.length === 0) return;
		const revert = invertPatch(squashPatches(dropped.map((s) => s.patch)));
		this.current = applyPatch(this.current, revert);
		this.notify();
	}

	/** Merges every step after the mark into one undo step (nothing when they cancel out). */
	squashToMark(mark: HistoryMark, label?: string): void {
		this.checkMark(mark);
		const steps = this.undoStack.splice(mark.depth);
		if (steps.length === 0) return;
		const patch = squashPatches(steps.map((s) => s.patch));
		if (!isNoopPatch(patch)) this.undoStack.push({ patch, label: label ?? steps[0].label });
		this.notify();
	}

	/** Starts over with another document (open, new): both stacks are cleared. */
	reset(design: Design): void {
		this.undoStack = [];
		this.redoStack = [];
		this.current = design;
		this.notify();
	}
}
