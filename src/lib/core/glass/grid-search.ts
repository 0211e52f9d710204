/**
 * Least-cost path on the routing grid: A* (Hart, Nilsson & Raphael, IEEE Trans. SSC-4, 1968) over
 * (cell, heading) states, with 4-neighbour steps, so a bend costs extra and leads come out as few
 * straight runs. Many sources, many targets; the search stops at the first target reached.
 *
 * Costs are whole numbers of cost units: a step costs STEP_COST, a change of heading BEND_COST
 * more, entering a cell its extra cost from the grid (in the same units) — except a cell of the
 * net's own home (the clearance around its own terminals, where a lead only extends the conductor
 * it joins), which costs no extra. A cell is passable for net k when it is FREE or owned by k;
 * target cells are always enterable. Before the search a plain flood fill (cells only, no costs),
 * from both ends in turn, asks whether any target can be reached at all, so a lead out of or into
 * a closed-in region costs one sweep of it rather than a full least-cost search; a fill still
 * undecided after a few thousand cells leaves the question to the search (the ends are open), and
 * is finished only if the search finds nothing. A costed search that runs past its budget of queue
 * pops gives way to the plain shortest path (extra costs ignored): the lead exists, it may light
 * more ghosts.
 *
 * Distance estimates (admissible: every step costs at least STEP_COST): the costed search takes
 * the Manhattan distance to the nearest target box; the plain search takes the breadth-first steps
 * from the targets through the net's passable cells (Moore 1959), exact but for bends, and skips
 * cells from which no target can be reached. Whole-number costs keep the queue a bucket queue
 * (`StateQueue`); the scratch arrays are shared between searches and grids (`SearchScratch`),
 * stamped per search.
 */
import { FREE, type RouteGrid } from './route-grid';
import { scratchFor, type SearchScratch } from './search-scratch';
import { stepField } from './step-field';

/** Cost of one step, in cost units: a quarter step is the smallest extra cost a cell carries. */
export const STEP_COST = 4;
/** Extra cost of a change of heading. */
export const BEND_COST = 16;
/** Queue pops the costed search may take before the plain shortest path is taken instead. */
const COSTED_POPS = 60_000;
/** Cells the fill before a search may sweep before it leaves the question to the search. */
const QUICK_FILL_CELLS = 512;
/** Seeds pack (estimate, source index) in one number: the index below this, the estimate above. */
const SEED_SCALE = 2 ** 24;
const DX = Int32Array.of(1, -1, 0, 0);
const DY = Int32Array.of(0, 0, 1, -1);
/** Local copy: a module-level constant reads cheaper in the hot loops than an imported binding. */
const FREE_CELL: number = FREE;

/** Least-cost searches on one routing grid. */
export class GridSearch {
	private readonly scratch: SearchScratch;
	/** Queue pops over all of this object's searches (for profiling). */
	pops = 0;
	private boxes = new Int32Array(32);
	private boxCount = 0;

	constructor(private readonly grid: RouteGrid) {
		this.scratch = scratchFor(grid.nx * grid.ny);
	}

	/** Whether the last fill that found no way ran dry on the sources' side and swept `cell`. */
	floodedInVain(cell: number): boolean {
		const { scratch } = this;
		return (
			this.sourceSideDry &&
			scratch.floodOwner === this &&
			scratch.floodA[cell] === scratch.floodMark
		);
	}

	private sourceSideDry = false;

	/**
	 * Whether some target cell can be reached from the sources through cells passable for `net`.
	 * With `targetCells` the fill runs from both ends in turn and stops as soon as either side runs
	 * dry, so a small closed region costs little whichever end it holds.
	 */
	reachable(options: {
		sources: readonly number[];
		target: Uint8Array;
		net: number;
		targetCells?: readonly number[];
	}): boolean {
		return this.fill(options, Infinity) as boolean;
	}

	/** The fill of `reachable`, giving up (null) once it has swept `maxCells` cells undecided. */
	private fill(
		options: {
			sources: readonly number[];
			target: Uint8Array;
			net: number;
			targetCells?: readonly number[];
		},
		maxCells: number
	): boolean | null {
		const { floodA: a, floodB: b, queueA: qa, queueB: qb } = this.scratch;
		const { nx, ny, owner } = this.grid;
		const n = nx * ny;
		const step = [1, -1, nx, -nx];
		const { sources, target, net } = options;
		const mark = this.scratch.nextFloodMark();
		this.scratch.floodOwner = this;
		this.sourceSideDry = false;
		let ha = 0,
			ta = 0,
			hb = 0,
			tb = 0;
		for (const c of sources) {
			if (a[c] === mark) continue;
			a[c] = mark;
			qa[ta++] = c;
		}
		const twoSided = options.targetCells !== undefined;
		for (const c of options.targetCells ?? []) {
			if (b[c] === mark) continue;
			b[c] = mark;
			qb[tb++] = c;
		}
		for (;;) {
			if (ha === ta) {
				this.sourceSideDry = true;
				return false;
			}
			if (ha + hb > maxCells) return null;
			// One cell of the sources' side: a target or the other side's mark ends the fill.
			let cell = qa[ha++];
			let ix = cell % nx;
			for (let h = 0; h < 4; h++) {
				const next = cell + step[h];
				if (h < 2 ? ix === (h === 0 ? nx - 1 : 0) : next < 0 || next >= n) continue;
				if (a[next] === mark) continue;
				if (target[next] || (twoSided && b[next] === mark)) return true;
				const o = owner[next];
				if (o !== FREE_CELL && o !== net) continue;
				a[next] = mark;
				qa[ta++] = next;
			}
			if (!twoSided) continue;
			if (hb === tb) {
				// The target's region is complete: the sources reach it only through a neighbour in it.
				for (const c of sources) {
					const cx = c % nx;
					for (let h = 0; h < 4; h++) {
						const next = c + step[h];
						if (h < 2 ? cx === (h === 0 ? nx - 1 : 0) : next < 0 || next >= n) continue;
						if (a[next] !== mark && (target[next] || b[next] === mark)) return true;
					}
				}
				return false;
			}
			// One cell of the targets' side.
			cell = qb[hb++];
			ix = cell % nx;
			for (let h = 0; h < 4; h++) {
				const next = cell + step[h];
				if (h < 2 ? ix === (h === 0 ? nx - 1 : 0) : next < 0 || next >= n) continue;
				if (b[next] === mark) continue;
				if (a[next] === mark) return true;
				const o = owner[next];
				if (o !== FREE_CELL && o !== net) continue;
				b[next] = mark;
				qb[tb++] = next;
			}
		}
	}

	/**
	 * Cells from a source to the first target reached (source first), or null when no target can be
	 * reached. `target[cell]` is non-zero for target cells.
	 */
	search(options: {
		sources: readonly number[];
		target: Uint8Array;
		net: number;
		/** Cell-index boxes [ix0, iy0, ix1, iy1] around the targets, for the A* estimate. */
		boxes: readonly (readonly [number, number, number, number])[];
		/** The target cells as a list, for a fill from both ends. */
		targetCells?: readonly number[];
		/**
		 * Per cell the net whose home it is: where a lead of that net meets its own terminal (within
		 * the clearance of it) and only extends it, so the grid's extra cost does not apply.
		 */
		home?: Int32Array;
	}): number[] | null {
		// A short fill settles the common case of a closed-in end cheaply; an open one is left to
		// the search, and only when that finds nothing does the whole fill say whether a way exists.
		const quick = this.fill(options, QUICK_FILL_CELLS);
		if (quick === false) return null;
		const costed = this.leastCost({ ...options, useCost: true, maxPops: COSTED_POPS });
		if (costed) return costed;
		if (quick === null && !this.reachable(options)) return null;
		const field = options.targetCells
			? stepField({
					grid: this.grid,
					scratch: this.scratch,
					...options,
					targetCells: options.targetCells
				})
			: 0;
		return this.leastCost({ ...options, useCost: false, maxPops: Infinity, field });
	}

	/** Distance estimate from cell (ix, iy): STEP_COST times the steps to the nearest box. */
	private estimate(ix: number, iy: number): number {
		const b = this.boxes;
		let best = Infinity;
		for (let q = 0, end = 4 * this.boxCount; q < end; q += 4) {
			const dx = b[q] - ix > 0 ? b[q] - ix : ix - b[q + 2] > 0 ? ix - b[q + 2] : 0;
			const dy = b[q + 1] - iy > 0 ? b[q + 1] - iy : iy - b[q + 3] > 0 ? iy - b[q + 3] : 0;
			if (dx + dy < best) best = dx + dy;
		}
		return best === Infinity ? 0 : best * STEP_COST;
	}

	private setBoxes(boxes: readonly (readonly [number, number, number, number])[]): void {
		if (this.boxes.length < boxes.length * 4) this.boxes = new Int32Array(boxes.length * 8);
		boxes.forEach((box, k) => this.boxes.set(box, k * 4));
		this.boxCount = boxes.length;
	}

	private leastCost(options: {
		sources: readonly number[];
		target: Uint8Array;
		net: number;
		boxes: readonly (readonly [number, number, number, number])[];
		targetCells?: readonly number[];
		/** Per cell the net whose home it is (see `search`). */
		home?: Int32Array;
		useCost: boolean;
		maxPops: number;
		/** Mark of a step field from the targets to steer by, instead of the boxes. */
		field?: number;
	}): number[] | null {
		const { nx, ny, owner } = this.grid;
		const field = options.field ?? 0;
		const { steps, stepsMark } = this.scratch;
		const cost = options.useCost ? this.grid.cost : null;
		const home = options.home ?? null;
		const { sources, target, net } = options;
		const { dist, prev, stamp, queue: heap } = this.scratch;
		this.setBoxes(options.boxes);
		const epoch = this.scratch.nextEpoch();
		heap.clear();
		// Sources in order of their estimate, each let in only once the search's lowest priority
		// reaches it: a large tree seeds a short join with the few cells near its target. A source
		// has no heading (its first step never pays a bend), so one state of it goes in, heading 0.
		const seeds = this.scratch.seedsFor(sources.length);
		let seedCount = 0;
		for (let k = 0; k < sources.length; k++) {
			const cell = sources[k];
			if (field && stepsMark[cell] !== field) continue;
			const ix = cell % nx;
			const f = field ? steps[cell] * STEP_COST : this.estimate(ix, (cell - ix) / nx);
			seeds[seedCount++] = f * SEED_SCALE + k;
		}
		const seeded = seeds.subarray(0, seedCount).sort();
		let nextSeed = 0;
		let budget = options.maxPops;
		for (;;) {
			while (
				nextSeed < seedCount &&
				(heap.size === 0 || Math.floor(seeded[nextSeed] / SEED_SCALE) <= heap.peekF())
			) {
				const key = seeded[nextSeed++];
				const f = Math.floor(key / SEED_SCALE);
				const s = sources[key - f * SEED_SCALE] * 4;
				if (stamp[s] === epoch && dist[s] <= 0 && prev[s] === -1) continue;
				// Every heading of the cell is a start (a walk back into it is never a way on).
				for (let h = 0; h < 4; h++) {
					stamp[s + h] = epoch;
					dist[s + h] = 0;
					prev[s + h] = -1;
				}
				heap.push(f, 0, s);
			}
			if (heap.size === 0) break;
			if (budget-- <= 0) return null;
			this.pops++;
			const state = heap.pop();
			const g = heap.poppedG;
			if (g > dist[state]) continue;
			const cell = state >> 2;
			const heading = state & 3;
			const atSource = prev[state] === -1;
			if (target[cell] && !atSource) return this.path(state);
			const ix = cell % nx;
			const iy = (cell - ix) / nx;
			// Never straight back: a lead that turns round is dearer than one that turned earlier.
			const back = atSource ? -1 : heading ^ 1;
			for (let h = 0; h < 4; h++) {
				if (h === back) continue;
				const jx = ix + DX[h],
					jy = iy + DY[h];
				if (jx < 0 || jy < 0 || jx >= nx || jy >= ny) continue;
				const next = jy * nx + jx;
				const o = owner[next];
				if (o !== FREE_CELL && o !== net && !target[next]) continue;
				if (field && stepsMark[next] !== field) continue;
				const extra = cost === null || (home !== null && home[next] === net) ? 0 : cost[next];
				const nd = g + STEP_COST + extra + (h === heading || atSource ? 0 : BEND_COST);
				const ns = next * 4 + h;
				if (stamp[ns] !== epoch || nd < dist[ns]) {
					stamp[ns] = epoch;
					dist[ns] = nd;
					prev[ns] = state;
					// The estimate: steps from the targets with a step field, else by the boxes.
					heap.push(nd + (field ? steps[next] * STEP_COST : this.estimate(jx, jy)), nd, ns);
				}
			}
		}
		return null;
	}

	private path(state: number): number[] {
		const cells: number[] = [];
		for (let s = state; s !== -1; s = this.scratch.prev[s]) cells.push(s >> 2);
		return cells.reverse();
	}
}
