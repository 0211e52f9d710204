/**
 * A gesture (drag, handle pull, numeric scrub) edits the design many times but lands as one undo
 * step. Begin it to set a history mark; `update` applies an incremental patch, `replace` swaps
 * the whole gesture's effect for a patch computed against `start` (the design when the gesture
 * began). `commit` squashes everything into one step; `cancel` (Escape) bails back to the mark.
 */
import type { Design } from '../design/schema';
import type { History, HistoryMark } from './history';
import type { Patch } from './patch';

export class Gesture {
	readonly start: Design;
	private readonly mark: HistoryMark;
	private open = true;

	constructor(
		private readonly history: History,
		readonly label: string
	) {
		this.start = history.design;
		this.mark = history.mark();
	}

	get active(): boolean {
		return this.open;
	}

	private check(): void {
		if (!this.open) throw new Error(`the gesture "${this.label}" has ended`);
	}

	update(patch: Patch): void {
		this.check();
		this.history.apply(patch, this.label);
	}

	replace(patch: Patch): void {
		this.check();
		this.history.bailToMark(this.mark);
		this.history.apply(patch, this.label);
	}

	commit(): void {
		this.check();
		this.open = false;
		this.history.squashToMark(this.mark, this.label);
	}

	cancel(): void {
		this.check();
		this.open = false;
		this.history.bailToMark(this.mark);
	}
}

export const beginGesture = (history: History, label: string): Gesture =>
	new Gesture(history, label);
