/**
 * A lower bound on a lead's extra cost for the costed search's distance estimate, read off the
 * grid's cost field, so the search is not misled where every step costs more than 1 (a lead
 * across the viewing area, into an electrode under its own back plate).
 *
 * For a level c, D_c(cell) = steps from the cell to the nearest cell costing less than c (a
 * breadth-first distance transform, Moore 1959). A lead of k steps from p enters, at steps
 * 1 … D_c(p) − 1, cells within that distance of p, all costing ≥ c; its last T_c = min over the
 * target cells of D_c(t) cells lie that close to its target and cost ≥ c too. So at least
 * min(k, max(0, D_c(p) − 1) + T_c) of its cells cost ≥ c, and with k ≥ M (the step estimate):
 *
 *   cost ≥ M + Σ_levels w_c · min(M, max(0, D_c(p) − 1) + T_c),
 *
 * with the levels the two lowest positive costs L1 < L2 and weights w = L1, L2 − L1 (a cell
 * costing ≥ L2 pays both). Admissible whenever M is; bends only add.
 */
import type { RouteGrid } from './route-grid';

/** Distance transforms are capped here (cells): far beyond any lead on a plate the grid allows. */
const FAR = 1 << 20;

export class CostFloor {
	/** Weights of the levels (0 when the level is absent). */
	readonly weight: [number, number] = [0, 0];
	/** Steps to a cell below each level. */
	readonly reach: [Int32Array, Int32Array];

	private readonly nx: number;
	private readonly ny: number;

	constructor(grid: RouteGrid) {
		const { cost } = grid;
		this.nx = grid.nx;
		this.ny = grid.ny;
		let l1 = Infinity;
		for (let i = 0; i < cost.length; i++) if (cost[i] > 0 && cost[i] < l1) l1 = cost[i];
		let l2 = Infinity;
		for (let i = 0; i < cost.length; i++) if (cost[i] > l1 && cost[i] < l2) l2 = cost[i];
		if (l1 < Infinity) this.weight[0] = l1;
		if (l2 < Infinity) this.weight[1] = l2 - l1;
		this.reach = [
			this.weight[0] > 0 ? distanceBelow(grid, l1) : new Int32Array(0),
			this.weight[1] > 0 ? distanceBelow(grid, l2) : new Int32Array(0)
		];
	}

	/** T_c of level `k` for targets inside a cell box [ix0, iy0, ix1, iy1]: the least over the box. */
	leastReachIn(k: 0 | 1, box: readonly [number, number, number, number]): number {
		if (this.weight[k] === 0) return 0;
		const reach = this.reach[k];
		let best = FAR;
		for (let iy = Math.max(0, box[1]); iy <= Math.min(this.ny - 1, box[3]); iy++)
			for (let ix = Math.max(0, box[0]); ix <= Math.min(this.nx - 1, box[2]); ix++)
				if (reach[iy * this.nx + ix] < best) best = reach[iy * this.nx + ix];
		return best === FAR ? 0 : best;
	}
}

/** Breadth-first steps from every cell costing less than `level` (0 there), over all cells. */
function distanceBelow(grid: RouteGrid, level: number): Int32Array {
	const { nx, cost } = grid;
	const n = nx * grid.ny;
	const dist = new Int32Array(n).fill(FAR);
	const queue = new Int32Array(n);
	let head = 0,
		tail = 0;
	for (let c = 0; c < n; c++)
		if (cost[c] < level) {
			dist[c] = 0;
			queue[tail++] = c;
		}
	while (head < tail) {
		const c = queue[head++];
		const ix = c % nx;
		const d = dist[c] + 1;
		// Left, right, below, above: each cell enters the queue once, at its least distance.
		if (ix > 0 && dist[c - 1] > d) {
			dist[c - 1] = d;
			queue[tail++] = c - 1;
		}
		if (ix < nx - 1 && dist[c + 1] > d) {
			dist[c + 1] = d;
			queue[tail++] = c + 1;
		}
		if (c >= nx && dist[c - nx] > d) {
			dist[c - nx] = d;
			queue[tail++] = c - nx;
		}
		if (c + nx < n && dist[c + nx] > d) {
			dist[c + nx] = d;
			queue[tail++] = c + nx;
		}
	}
	return dist;
}
