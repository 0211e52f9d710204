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
	}

	/** Whether the last flood fill that found no target passed through `cell`. */
	floodedInVain(cell: number): boolean {
		return this.floodStamp[cell] === this.floodEpoch && !this.floodFound;
	}

	private floodFound = false;

	/** Whether some target cell can be reached from the sources through cells passable for `net`. */
	reachable(options: { sources: readonly number[]; target: Uint8Array; net: number }): boolean {
		const { grid, floodStamp: seen, floodQueue: queue } = this;
		const { sources, target, net } = options;
		const mark = ++this.floodEpoch;
		let head = 0,
			tail = 0;
		for (const c of sources) {
			if (seen[c] === mark) continue;
			seen[c] = mark;
			queue[tail++] = c;
		}
		while (head < tail) {
			const cell = queue[head++];
			const ix = cell % grid.nx;
			const iy = (cell - ix) / grid.nx;
			for (let h = 0; h < 4; h++) {
				const jx = ix + DX[h],
					jy = iy + DY[h];
				if (jx < 0 || jy < 0 || jx >= grid.nx || jy >= grid.ny) continue;
				const next = jy * grid.nx + jx;
				if (seen[next] === mark) continue;
				if (target[next]) return (this.floodFound = true);
				const o = grid.owner[next];
				if (o !== FREE && o !== net) continue;
				seen[next] = mark;
				queue[tail++] = next;
			}
		}
		return (this.floodFound = false);
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
