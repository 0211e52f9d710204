/**
 * Least-cost path on the routing grid: A* (Hart, Nilsson & Raphael, IEEE Trans. SSC-4, 1968) over
 * (cell, heading) states, guided by the Manhattan distance to the nearest target box (admissible:
 * every step costs at least 1), with 4-neighbour steps, so a bend costs extra and leads come out as few
 * straight runs. Many sources, many targets; the search stops at the first target reached.
 *
 * Step cost = 1 + the cell's extra cost; a change of heading adds BEND_COST. A cell is passable
 * for net k when it is FREE or owned by k; target cells are always enterable. Before the search a
 * plain flood fill (cells only, no costs) asks whether any target can be reached at all, so a lead
 * that cannot exist costs one sweep of its region rather than a full least-cost search. A costed
 * search that runs past its budget of queue pops gives way to the plain shortest path (extra costs
 * ignored), which the distance estimate steers tightly: the lead exists, it may light more ghosts.
 */
import { FREE, type RouteGrid } from './route-grid';

const BEND_COST = 4;
/** Weight on the distance estimate (weighted A*, Pohl 1970): faster, paths at most this factor dearer. */
const HEURISTIC_WEIGHT = 1;
/** Queue pops the costed search may take before the plain shortest path is taken instead. */
const COSTED_POPS = 60_000;
const DX = [1, -1, 0, 0];
const DY = [0, 0, 1, -1];

/** Scratch arrays reused between searches on the same grid. */
export class GridSearch {
	private readonly dist: Float64Array;
	private readonly prev: Int32Array;
	private readonly stamp: Uint32Array;
	private epoch = 0;
	private readonly floodStamp: Uint32Array;
	private readonly floodQueue: Int32Array;
	private readonly floodStampB: Uint32Array;
	private readonly floodQueueB: Int32Array;
	private floodEpoch = 0;
	private heapCost: Float64Array = new Float64Array(1024);
	private heapState: Int32Array = new Int32Array(1024);
	private heapSize = 0;

	constructor(private readonly grid: RouteGrid) {
		const states = grid.nx * grid.ny * 4;
		this.dist = new Float64Array(states);
		this.prev = new Int32Array(states);
		this.stamp = new Uint32Array(states);
		this.floodStamp = new Uint32Array(grid.nx * grid.ny);
		this.floodQueue = new Int32Array(grid.nx * grid.ny);
		this.floodStampB = new Uint32Array(grid.nx * grid.ny);
		this.floodQueueB = new Int32Array(grid.nx * grid.ny);
	}

	/** Whether the last fill that found no way ran dry on the sources' side and swept `cell`. */
	floodedInVain(cell: number): boolean {
		return this.sourceSideDry && this.floodStamp[cell] === this.floodEpoch;
	}

	private sourceSideDry = false;

	/** Adds the passable, unseen neighbours of `cell` to one side's queue; true when the sides meet. */
	private spread(options: {
		cell: number;
		net: number;
		mine: Uint32Array;
		theirs: Uint32Array | null;
		target: Uint8Array | null;
		queue: Int32Array;
		tail: number;
	}): number {
		const { grid } = this;
		const { cell, net, mine, theirs, target, queue } = options;
		const mark = this.floodEpoch;
		let tail = options.tail;
		const ix = cell % grid.nx;
		const iy = (cell - ix) / grid.nx;
		for (let h = 0; h < 4; h++) {
			const jx = ix + DX[h],
				jy = iy + DY[h];
			if (jx < 0 || jy < 0 || jx >= grid.nx || jy >= grid.ny) continue;
			const next = jy * grid.nx + jx;
			if (mine[next] === mark) continue;
			if ((target && target[next]) || (theirs && theirs[next] === mark)) return -1;
			const o = grid.owner[next];
			if (o !== FREE && o !== net) continue;
			mine[next] = mark;
			queue[tail++] = next;
		}
		return tail;
	}

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
		const { floodStamp: a, floodStampB: b, floodQueue: qa, floodQueueB: qb } = this;
		const { sources, target, net } = options;
		const mark = ++this.floodEpoch;
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
		const theirs = twoSided ? b : null;
		for (;;) {
			if (ha === ta) {
				this.sourceSideDry = true;
				return false;
			}
			ta = this.spread({ cell: qa[ha++], net, mine: a, theirs, target, queue: qa, tail: ta });
			if (ta < 0) return true;
			if (!twoSided) continue;
			if (hb === tb) {
				// The target's region is complete: the sources reach it only through a neighbour in it.
				for (const c of sources)
					if (this.spread({ cell: c, net, mine: a, theirs: b, target, queue: qa, tail: 0 }) < 0)
						return true;
				return false;
			}
			tb = this.spread({
				cell: qb[hb++],
				net,
				mine: b,
				theirs: a,
				target: null,
				queue: qb,
				tail: tb
			});
			if (tb < 0) return true;
		}
	}

	private push(cost: number, state: number): void {
		if (this.heapSize === this.heapCost.length) {
			const c = new Float64Array(this.heapSize * 2);
			c.set(this.heapCost);
			const s = new Int32Array(this.heapSize * 2);
			s.set(this.heapState);
			this.heapCost = c;
			this.heapState = s;
		}
		let i = this.heapSize++;
		while (i > 0) {
			const parent = (i - 1) >> 1;
			if (this.heapCost[parent] <= cost) break;
			this.heapCost[i] = this.heapCost[parent];
			this.heapState[i] = this.heapState[parent];
			i = parent;
		}
		this.heapCost[i] = cost;
		this.heapState[i] = state;
	}

	private pop(): number {
		const top = this.heapState[0];
		const lastCost = this.heapCost[--this.heapSize];
		const lastState = this.heapState[this.heapSize];
		let i = 0;
		for (;;) {
			let child = 2 * i + 1;
			if (child >= this.heapSize) break;
			if (child + 1 < this.heapSize && this.heapCost[child + 1] < this.heapCost[child]) child++;
			if (this.heapCost[child] >= lastCost) break;
			this.heapCost[i] = this.heapCost[child];
			this.heapState[i] = this.heapState[child];
			i = child;
		}
		this.heapCost[i] = lastCost;
		this.heapState[i] = lastState;
		return top;
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
	}): number[] | null {
		if (!this.reachable(options)) return null;
		return (
			this.leastCost({ ...options, useCost: true, maxPops: COSTED_POPS }) ??
			this.leastCost({ ...options, useCost: false, maxPops: Infinity })
		);
	}

	private leastCost(options: {
		sources: readonly number[];
		target: Uint8Array;
		net: number;
		boxes: readonly (readonly [number, number, number, number])[];
		useCost: boolean;
		maxPops: number;
	}): number[] | null {
		const { grid } = this;
		const { sources, target, net, boxes, useCost } = options;
		let budget = options.maxPops;
		const estimate = (cell: number) => {
			const ix = cell % grid.nx;
			const iy = (cell - ix) / grid.nx;
			let best = Infinity;
			for (const b of boxes) {
				const d = Math.max(0, b[0] - ix, ix - b[2]) + Math.max(0, b[1] - iy, iy - b[3]);
				if (d < best) best = d;
			}
			return best === Infinity ? 0 : best * HEURISTIC_WEIGHT;
		};
		this.epoch++;
		this.heapSize = 0;
		const seen = (s: number) => this.stamp[s] === this.epoch;
		for (const cell of sources) {
			for (let h = 0; h < 4; h++) {
				const s = cell * 4 + h;
				this.stamp[s] = this.epoch;
				this.dist[s] = 0;
				this.prev[s] = -1;
				this.push(estimate(cell), s);
			}
		}
		while (this.heapSize > 0) {
			if (budget-- <= 0) return null;
			const priority = this.heapCost[0];
			const state = this.pop();
			const cell = state >> 2;
			const cost = this.dist[state];
			if (priority > cost + estimate(cell) + 1e-9) continue;
			const heading = state & 3;
			if (target[cell] && this.prev[state] !== -1) return this.path(state);
			const ix = cell % grid.nx;
			const iy = (cell - ix) / grid.nx;
			for (let h = 0; h < 4; h++) {
				const jx = ix + DX[h],
					jy = iy + DY[h];
				if (jx < 0 || jy < 0 || jx >= grid.nx || jy >= grid.ny) continue;
				const next = jy * grid.nx + jx;
				const o = grid.owner[next];
				if (!target[next] && o !== FREE && o !== net) continue;
				const step =
					1 +
					(useCost ? grid.cost[next] : 0) +
					(h === heading || this.prev[state] === -1 ? 0 : BEND_COST);
				const ns = next * 4 + h;
				const nd = cost + step;
				if (!seen(ns) || nd < this.dist[ns]) {
					this.stamp[ns] = this.epoch;
					this.dist[ns] = nd;
					this.prev[ns] = state;
					this.push(nd + estimate(next), ns);
				}
			}
		}
		return null;
	}

	private path(state: number): number[] {
		const cells: number[] = [];
		for (let s = state; s !== -1; s = this.prev[s]) cells.push(s >> 2);
		return cells.reverse();
	}
}
