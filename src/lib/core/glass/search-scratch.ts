/**
 * Scratch arrays of the routing grid's searches: per (cell, heading) state the best cost so far,
 * the state it came from and the search that wrote them (a generation stamp, so nothing is cleared
 * between searches); per cell the two fills' marks and queues; the priority queue.
 *
 * One set is kept between searches and grids, the largest asked for up to KEEP_CELLS cells, so
 * planning the glass again allocates nothing. Searches run to completion one at a time, and each
 * takes a fresh stamp, so two grids sharing the set never read each other's entries.
 */
import { StateQueue } from './state-queue';

/**
 * Largest grid (cells) whose scratch stays allocated after its searches: 88 bytes a cell, so
 * about 44 MB at most (a 100 × 100 mm glass at a 0.15 mm trace pitch is 0.44 M cells).
 */
const KEEP_CELLS = 500_000;

export class SearchScratch {
	readonly cells: number;
	readonly dist: Float64Array;
	readonly prev: Int32Array;
	readonly stamp: Uint32Array;
	readonly floodA: Uint32Array;
	readonly floodB: Uint32Array;
	readonly queueA: Int32Array;
	readonly queueB: Int32Array;
	/** Steps from the nearest target (cells), valid where `stepsMark` holds the current field mark. */
	readonly steps: Int32Array;
	readonly stepsMark: Uint32Array;
	readonly queue = new StateQueue();
	private epoch = 0;
	private fieldEpoch = 0;
	private floodEpoch = 0;
	/** The search object whose fill wrote the current flood marks. */
	floodOwner: object | null = null;

	constructor(cells: number) {
		this.cells = cells;
		this.dist = new Float64Array(cells * 4);
		this.prev = new Int32Array(cells * 4);
		this.stamp = new Uint32Array(cells * 4);
		this.floodA = new Uint32Array(cells);
		this.floodB = new Uint32Array(cells);
		this.queueA = new Int32Array(cells);
		this.queueB = new Int32Array(cells);
		this.steps = new Int32Array(cells);
		this.stepsMark = new Uint32Array(cells);
	}

	/** Room for `count` packed search seeds. */
	seedsFor(count: number): Float64Array {
		if (this.seeds.length < count)
			this.seeds = new Float64Array(Math.max(count, 2 * this.seeds.length));
		return this.seeds;
	}
	private seeds = new Float64Array(1024);

	/** A mark no cell of the step field carries yet. */
	nextFieldMark(): number {
		if (this.fieldEpoch === 0xffffffff) {
			this.stepsMark.fill(0);
			this.fieldEpoch = 0;
		}
		return ++this.fieldEpoch;
	}

	/** A stamp no state carries yet. */
	nextEpoch(): number {
		if (this.epoch === 0xffffffff) {
			this.stamp.fill(0);
			this.epoch = 0;
		}
		return ++this.epoch;
	}

	/** A mark no cell of either fill carries yet. */
	nextFloodMark(): number {
		if (this.floodEpoch === 0xffffffff) {
			this.floodA.fill(0);
			this.floodB.fill(0);
			this.floodEpoch = 0;
		}
		return ++this.floodEpoch;
	}

	get floodMark(): number {
		return this.floodEpoch;
	}
}

let kept: SearchScratch | null = null;

/** Scratch for a grid of `cells` cells: the kept set when it is large enough. */
export function scratchFor(cells: number): SearchScratch {
	if (kept && kept.cells >= cells) return kept;
	const scratch = new SearchScratch(cells);
	if (cells <= KEEP_CELLS) kept = scratch;
	return scratch;
}
