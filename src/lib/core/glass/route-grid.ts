/**
 * The routing grid of one plate: square cells of one trace pitch (trace width + minimum gap), each
 * holding the net that owns it (a conductor of that net lies within the clearance of the cell's
 * centre), FREE, BLOCKED (two nets, or outside the plate's domain) and an extra cost (e.g. over the
 * other plate's conductors, where a lead would light a ghost).
 *
 * A cell is owned by a net when its centre lies inside a conductor or within `clearance_mm` of its
 * edge, with clearance = minimum gap + half the trace width: a lead centred on a free cell then
 * keeps the minimum gap to every other net's conductor (to within the grid's discretisation, which
 * the glass check measures afterwards on the real geometry).
 */
import type { Rect } from '../design/schema';
import { ringBounds } from './rings';

export const FREE = -1;
export const BLOCKED = -2;
/** Most cells a routing grid may have (its search scratch is about 100 bytes a cell). */
export const MAX_GRID_CELLS = 8_000_000;

/** Cells of the routing grid over `domain` at a pitch of `cell_mm`. */
export const gridCells = (domain: Rect, cell_mm: number): number =>
	Math.max(1, Math.floor(domain.width_mm / cell_mm)) *
	Math.max(1, Math.floor(domain.height_mm / cell_mm));

function distanceToRing2(ring: Float64Array, px: number, py: number): number {
	let best = Infinity;
	const n = ring.length;
	for (let i = 0, j = n - 2; i < n; j = i, i += 2) {
		const ax = ring[j],
			ay = ring[j + 1];
		const dx = ring[i] - ax,
			dy = ring[i + 1] - ay;
		const len2 = dx * dx + dy * dy;
		const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / len2));
		const ex = ax + dx * t - px,
			ey = ay + dy * t - py;
		const d2 = ex * ex + ey * ey;
		if (d2 < best) best = d2;
	}
	return best;
}

export class RouteGrid {
	readonly x0: number;
	readonly y0: number;
	readonly nx: number;
	readonly ny: number;
	/** Owner of each cell (FREE, BLOCKED or a net), made on first use. */
	get owner(): Int32Array {
		return (this.owners ??= new Int32Array(this.nx * this.ny).fill(FREE));
	}
	private owners: Int32Array | null = null;
	/**
	 * Extra cost of entering each cell, in the searches' cost units (a step costs STEP_COST). Its
	 * own array to write into, or one the router shares between grids and nets (`setCost`).
	 */
	get cost(): Float32Array {
		return (this.costs ??= new Float32Array(this.nx * this.ny));
	}
	private costs: Float32Array | null = null;

	constructor(options: { domain: Rect; cell_mm: number }) {
		const { domain, cell_mm } = options;
		this.cell_mm = cell_mm;
		this.x0 = domain.x_mm;
		this.y0 = domain.y_mm;
		this.nx = Math.max(1, Math.floor(domain.width_mm / cell_mm));
		this.ny = Math.max(1, Math.floor(domain.height_mm / cell_mm));
		if (this.nx * this.ny > MAX_GRID_CELLS)
			throw new RangeError('the glass is too large for the routing grid at this trace pitch');
	}

	readonly cell_mm: number;

	centreX = (ix: number): number => this.x0 + (ix + 0.5) * this.cell_mm;
	centreY = (iy: number): number => this.y0 + (iy + 0.5) * this.cell_mm;

	/**
	 * Calls `visit(cell, inside)` for every cell whose centre lies inside or within `reach_mm` of the
	 * ring. Row by row: the even-odd crossings of the row's centre line, sorted, give the inside runs
	 * (the same crossing test as `pointInRing`, so the two agree cell for cell); only cells outside
	 * the ring measure their distance to it.
	 */
	forCellsNear(
		ring: Float64Array,
		reach_mm: number,
		visit: (cell: number, inside: boolean) => void
	) {
		const b = ringBounds(ring);
		const c = this.cell_mm;
		const ix0 = Math.max(0, Math.floor((b.minX - reach_mm - this.x0) / c));
		const ix1 = Math.min(this.nx - 1, Math.ceil((b.maxX + reach_mm - this.x0) / c));
		const iy0 = Math.max(0, Math.floor((b.minY - reach_mm - this.y0) / c));
		const iy1 = Math.min(this.ny - 1, Math.ceil((b.maxY + reach_mm - this.y0) / c));
		const reach2 = reach_mm * reach_mm;
		const n = ring.length;
		const crossings = new Float64Array(n / 2);
		for (let iy = iy0; iy <= iy1; iy++) {
			const y = this.centreY(iy);
			let m = 0;
			for (let i = 0, j = n - 2; i < n; j = i, i += 2) {
				const yi = ring[i + 1],
					yj = ring[j + 1];
				if (yi > y !== yj > y)
					crossings[m++] = ((ring[j] - ring[i]) * (y - yi)) / (yj - yi) + ring[i];
			}
			// Insertion sort: a row crosses a ring at a handful of points.
			for (let i = 1; i < m; i++) {
				const x = crossings[i];
				let j = i - 1;
				while (j >= 0 && crossings[j] > x) {
					crossings[j + 1] = crossings[j];
					j--;
				}
				crossings[j + 1] = x;
			}
			const row = crossings;
			// `k` counts the crossings at or left of the centre: inside while an odd number lie right of it.
			let k = 0;
			for (let ix = ix0; ix <= ix1; ix++) {
				const x = this.centreX(ix);
				while (k < m && row[k] <= x) k++;
				const inside = (m - k) % 2 === 1;
				if (inside || (reach_mm > 0 && distanceToRing2(ring, x, y) < reach2 - 1e-12))
					visit(iy * this.nx + ix, inside);
			}
		}
	}

	/** Marks the cells a conductor of `net` keeps clear of other nets. */
	claim(ring: Float64Array, net: number, clearance_mm: number): void {
		const owner = this.owner;
		this.forCellsNear(ring, clearance_mm, (cell) => {
			const o = owner[cell];
			if (o === FREE) owner[cell] = net;
			else if (o !== net) owner[cell] = BLOCKED;
		});
	}

	/**
	 * `claim` for an axis-aligned rectangle [x0, x1] × [y0, y1] (a straight run of a routed lead):
	 * the same cells, each row's run worked out from the rectangle instead of measured cell by cell.
	 */
	claimBox(
		x0: number,
		y0: number,
		x1: number,
		y1: number,
		net: number,
		clearance_mm: number
	): void {
		const owner = this.owner;
		const c = this.cell_mm;
		const reach2 = clearance_mm * clearance_mm - 1e-12;
		const iy0 = Math.max(0, Math.floor((y0 - clearance_mm - this.y0) / c));
		const iy1 = Math.min(this.ny - 1, Math.ceil((y1 + clearance_mm - this.y0) / c));
		const ix0 = Math.max(0, Math.floor((x0 - clearance_mm - this.x0) / c));
		const ix1 = Math.min(this.nx - 1, Math.ceil((x1 + clearance_mm - this.x0) / c));
		for (let iy = iy0; iy <= iy1; iy++) {
			const y = this.centreY(iy);
			const dy = y < y0 ? y0 - y : y > y1 ? y - y1 : 0;
			if (dy * dy >= reach2) continue;
			for (let ix = ix0; ix <= ix1; ix++) {
				const x = this.centreX(ix);
				const dx = x < x0 ? x0 - x : x > x1 ? x - x1 : 0;
				if (dx * dx + dy * dy >= reach2) continue;
				const cell = iy * this.nx + ix;
				const o = owner[cell];
				if (o === FREE) owner[cell] = net;
				else if (o !== net) owner[cell] = BLOCKED;
			}
		}
	}

	/** Takes `values` as the cost field (not copied: the caller must not change it while in use). */
	setCost(values: Float32Array): void {
		if (values.length !== this.nx * this.ny)
			throw new RangeError('cost field size differs from the routing grid');
		this.costs = values;
	}

	/** Cells whose centre lies inside the ring; the nearest cell when none does (a small ring). */
	cellsInside(ring: Float64Array): number[] {
		const cells: number[] = [];
		this.forCellsNear(ring, 0, (cell, inside) => {
			if (inside) cells.push(cell);
		});
		if (cells.length === 0) {
			const b = ringBounds(ring);
			const ix = Math.floor(((b.minX + b.maxX) / 2 - this.x0) / this.cell_mm);
			const iy = Math.floor(((b.minY + b.maxY) / 2 - this.y0) / this.cell_mm);
			if (ix >= 0 && iy >= 0 && ix < this.nx && iy < this.ny) cells.push(iy * this.nx + ix);
		}
		return cells;
	}
}
