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
import { scratchFor, type SearchScratch } from './search-scratch';

const BEND_COST = 4;
/** Weight on the distance estimate (weighted A*, Pohl 1970): faster, paths at most this factor dearer. */
const HEURISTIC_WEIGHT = 1;
/** Queue pops the costed search may take before the plain shortest path is taken instead. */
const COSTED_POPS = 60_000;
const DX = Int32Array.of(1, -1, 0, 0);
const DY = Int32Array.of(0, 0, 1, -1);
/** Local copy: a module-level constant reads cheaper in the hot loops than an imported binding. */
const FREE_CELL: number = FREE;

/** Scratch arrays reused between searches on the same grid. */
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
		const { floodA: a, floodB: b, queueA: qa, queueB: qb } = this.scratch;
		const { nx, ny, owner } = this.grid;
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
			// One cell of the sources' side: a target or the other side's mark ends the fill.
			let cell = qa[ha++];
			let ix = cell % nx;
			let iy = (cell - ix) / nx;
			for (let h = 0; h < 4; h++) {
				const jx = ix + DX[h],
					jy = iy + DY[h];
				if (jx < 0 || jy < 0 || jx >= nx || jy >= ny) continue;
				const next = jy * nx + jx;
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
					const cy = (c - cx) / nx;
					for (let h = 0; h < 4; h++) {
						const jx = cx + DX[h],
							jy = cy + DY[h];
						if (jx < 0 || jy < 0 || jx >= nx || jy >= ny) continue;
						const next = jy * nx + jx;
						if (a[next] !== mark && (target[next] || b[next] === mark)) return true;
					}
				}
				return false;
			}
			// One cell of the targets' side.
			cell = qb[hb++];
			ix = cell % nx;
			iy = (cell - ix) / nx;
			for (let h = 0; h < 4; h++) {
				const jx = ix + DX[h],
					jy = iy + DY[h];
				if (jx < 0 || jy < 0 || jx >= nx || jy >= ny) continue;
				const next = jy * nx + jx;
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
	}): number[] | null {
		if (!this.reachable(options)) return null;
		return (
			this.leastCost({ ...options, useCost: true, maxPops: COSTED_POPS }) ??
			this.leastCost({ ...options, useCost: false, maxPops: Infinity })
		);
	}

	/** Distance estimate from cell (ix, iy) to the nearest of the current boxes, in cells. */
	private estimate(ix: number, iy: number): number {
		const b = this.boxes;
		let best = Infinity;
		for (let k = 0; k < this.boxCount * 4; k += 4) {
			const dx = b[k] - ix > 0 ? b[k] - ix : ix - b[k + 2] > 0 ? ix - b[k + 2] : 0;
			const dy = b[k + 1] - iy > 0 ? b[k + 1] - iy : iy - b[k + 3] > 0 ? iy - b[k + 3] : 0;
			if (dx + dy < best) best = dx + dy;
		}
		return best === Infinity ? 0 : best * HEURISTIC_WEIGHT;
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
		useCost: boolean;
		maxPops: number;
	}): number[] | null {
		const { nx, ny, owner } = this.grid;
		const cost = options.useCost ? this.grid.cost : null;
		const { sources, target, net } = options;
		const { dist, prev, stamp, queue: heap } = this.scratch;
		this.setBoxes(options.boxes);
		const epoch = this.scratch.nextEpoch();
		heap.clear();
		for (const cell of sources) {
			const ix = cell % nx;
			const f = this.estimate(ix, (cell - ix) / nx);
			for (let h = 0; h < 4; h++) {
				const s = cell * 4 + h;
				stamp[s] = epoch;
				dist[s] = 0;
				prev[s] = -1;
				heap.push(f, 0, s);
			}
		}
		let budget = options.maxPops;
		while (heap.size > 0) {
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
			for (let h = 0; h < 4; h++) {
				const jx = ix + DX[h],
					jy = iy + DY[h];
				if (jx < 0 || jy < 0 || jx >= nx || jy >= ny) continue;
				const next = jy * nx + jx;
				const o = owner[next];
				if (o !== FREE_CELL && o !== net && !target[next]) continue;
				const nd = g + 1 + (cost ? cost[next] : 0) + (h === heading || atSource ? 0 : BEND_COST);
				const ns = next * 4 + h;
				if (stamp[ns] !== epoch || nd < dist[ns]) {
					stamp[ns] = epoch;
					dist[ns] = nd;
					prev[ns] = state;
					heap.push(nd + this.estimate(jx, jy), nd, ns);
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
