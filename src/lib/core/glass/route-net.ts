/**
 * Routes one net on a plate as a growing tree (the Steiner heuristic of maze routers: Lee, IRE
 * Trans. EC-10, 1961, with least-cost searches). The first terminal (a pad or a transfer point) is
 * the root. While few terminals are pending, one search from the whole tree to all of them joins
 * the cheapest to reach. With many (a common's back-plate pieces) the pending terminal nearest to
 * a joined one (Prim's order, Prim, BSTJ 36, 1957, on bounding-box distance) is joined next, by a
 * search from that terminal to any cell of the tree, leads included, steered towards its nearest
 * joined neighbour: a small start, so the search stays local. A terminal no search reaches is left
 * out, with every terminal in the region its search swept, and the others go on.
 *
 * Leads are cell-centre polylines with collinear points dropped; each new lead claims its cells
 * (with the clearance) so later nets keep their distance.
 */
import type { XY } from '../geometry/vec';
import type { GridSearch } from './grid-search';
import type { RouteGrid } from './route-grid';
import { SpareArrays } from './spare-arrays';

export interface Terminal {
	/** Electrode ids the terminal stands for (empty for a pad or transfer point). */
	electrodes: readonly string[];
	ring: Float64Array;
}

export interface NetRoute {
	leads: XY[][];
	/** Terminals no lead could reach. */
	unreached: Terminal[];
}

type Box = [number, number, number, number];

function cellsToPolyline(grid: RouteGrid, cells: readonly number[]): XY[] {
	const pts: XY[] = cells.map((c) => {
		const ix = c % grid.nx;
		return { x: grid.centreX(ix), y: grid.centreY((c - ix) / grid.nx) };
	});
	const out: XY[] = [pts[0]];
	for (let i = 1; i < pts.length - 1; i++) {
		const a = out[out.length - 1],
			b = pts[i],
			c = pts[i + 1];
		const collinear = Math.abs((b.x - a.x) * (c.y - b.y) - (b.y - a.y) * (c.x - b.x)) < 1e-12;
		if (!collinear) out.push(b);
	}
	if (pts.length > 1) out.push(pts[pts.length - 1]);
	return out;
}

function cellBox(grid: RouteGrid, cells: readonly number[]): Box {
	const box: Box = [Infinity, Infinity, -Infinity, -Infinity];
	for (const c of cells) {
		const ix = c % grid.nx;
		const iy = (c - ix) / grid.nx;
		box[0] = Math.min(box[0], ix);
		box[2] = Math.max(box[2], ix);
		box[1] = Math.min(box[1], iy);
		box[3] = Math.max(box[3], iy);
	}
	return box;
}

/** Per-cell masks and terminal indexes (0 = none, else terminal + 1), handed back cleared. */
const masks = new SpareArrays<Uint8Array>((cells) => new Uint8Array(cells), 8);
const indexes = new SpareArrays<Int32Array>((cells) => new Int32Array(cells), 8);

/** Up to this many pending terminals, one search from the tree looks for all of them at once. */
const FEW_TERMINALS = 8;

const boxGap = (a: Box, b: Box): number =>
	Math.max(0, a[0] - b[2], b[0] - a[2]) + Math.max(0, a[1] - b[3], b[1] - a[3]);

export interface NetOptions {
	grid: RouteGrid;
	search: GridSearch;
	net: number;
	terminals: readonly Terminal[];
	width_mm: number;
	clearance_mm: number;
	/** Per cell the net whose home it is (see GridSearch.search). */
	home?: Int32Array;
}

/** Routes the whole net at once. */
export function routeNet(options: NetOptions): NetRoute {
	const steps = growNet(options);
	for (;;) {
		const step = steps.next();
		if (step.done) return step.value;
	}
}

/**
 * Routes the net one join at a time: each `next()` joins (or gives up on) one terminal, so several
 * nets can grow in turn and none spreads over the plate before the others have their first leads.
 */
export function* growNet(options: NetOptions): Generator<void, NetRoute> {
	const { grid, search, net, terminals, width_mm, clearance_mm, home } = options;
	const leads: XY[][] = [];
	const unreached: Terminal[] = [];
	if (terminals.length === 0) return { leads, unreached };
	const inTree = masks.take(grid.nx * grid.ny);
	let targets: Uint8Array | null = null;
	const treeCells: number[] = [];
	// Which terminal each cell belongs to: one per cell in a shared index, any further ones (where
	// terminals overlap) in a map beside it.
	const firstAt = indexes.take(grid.nx * grid.ny);
	const moreAt = new Map<number, number[]>();
	const cellsOf = terminals.map((t) => grid.cellsInside(t.ring));
	cellsOf.forEach((cells, t) => {
		for (const c of cells) {
			if (firstAt[c] === 0) firstAt[c] = t + 1;
			else if (firstAt[c] !== t + 1) {
				const list = moreAt.get(c);
				if (list) list.push(t);
				else moreAt.set(c, [t]);
			}
		}
	});
	/** Calls `visit` for each terminal at the cell. */
	const terminalsAt = (c: number, visit: (t: number) => void) => {
		if (firstAt[c] === 0) return;
		visit(firstAt[c] - 1);
		const more = moreAt.get(c);
		if (more) for (const t of more) visit(t);
	};
	const boxes = cellsOf.map((cells) => cellBox(grid, cells));
	const pending = new Set<number>();
	const nearest = terminals.map(() => ({ gap: Infinity, to: 0 }));
	const touched: number[] = [];
	const touch = (t: number) => {
		if (pending.has(t)) touched.push(t);
	};
	const join = (cells: readonly number[]) => {
		for (const c of cells) {
			if (inTree[c]) continue;
			inTree[c] = 1;
			treeCells.push(c);
			terminalsAt(c, touch);
		}
	};
	const reach = (t: number) => {
		pending.delete(t);
		join(cellsOf[t]);
		for (const p of pending) {
			const gap = boxGap(boxes[p], boxes[t]);
			if (gap < nearest[p].gap) nearest[p] = { gap, to: t };
		}
	};
	const layLead = (cells: readonly number[]) => {
		const lead = cellsToPolyline(grid, cells);
		leads.push(lead);
		const half = width_mm / 2;
		// A lead steps from cell to neighbouring cell, so each run is straight along x or y and its
		// ring is a rectangle.
		for (let i = 1; i < lead.length; i++) {
			const a = lead[i - 1],
				b = lead[i];
			grid.claimBox(
				Math.min(a.x, b.x) - half,
				Math.min(a.y, b.y) - half,
				Math.max(a.x, b.x) + half,
				Math.max(a.y, b.y) + half,
				net,
				clearance_mm
			);
		}
		join(cells);
	};
	for (let t = 1; t < terminals.length; t++) pending.add(t);
	reach(0);
	while (pending.size > 0) {
		const t = touched.pop();
		if (t !== undefined) {
			if (pending.has(t)) reach(t);
			continue;
		}
		if (pending.size <= FEW_TERMINALS) {
			// Few terminals: search from the whole tree to all of them and take the cheapest reached.
			targets ??= masks.take(grid.nx * grid.ny);
			const targetCells: number[] = [];
			for (const p of pending)
				for (const c of cellsOf[p]) {
					targets[c] = 1;
					targetCells.push(c);
				}
			const cells = search.search({
				sources: treeCells,
				target: targets,
				targetCells,
				net,
				boxes: [...pending].map((p) => boxes[p]),
				home
			});
			for (const c of targetCells) targets[c] = 0;
			if (!cells) {
				for (const p of pending) unreached.push(terminals[p]);
				pending.clear();
				yield;
				continue;
			}
			layLead(cells);
			let hit: number | undefined;
			terminalsAt(cells[cells.length - 1], (p) => {
				if (hit === undefined && pending.has(p)) hit = p;
			});
			if (hit !== undefined) reach(hit);
			yield;
			continue;
		}
		let next = -1;
		for (const p of pending) if (next < 0 || nearest[p].gap < nearest[next].gap) next = p;
		const cells = search.search({
			sources: cellsOf[next],
			target: inTree,
			targetCells: treeCells,
			net,
			boxes: [boxes[nearest[next].to]],
			home
		});
		if (!cells) {
			// The net's passable cells only shrink as leads are laid, so every terminal in the region
			// the failed search swept stays cut off from the tree as well.
			for (const p of [...pending])
				if (p === next || cellsOf[p].some((c) => search.floodedInVain(c))) {
					pending.delete(p);
					unreached.push(terminals[p]);
				}
			yield;
			continue;
		}
		layLead(cells);
		reach(next);
		yield;
	}
	for (const c of treeCells) inTree[c] = 0;
	masks.give(inTree);
	if (targets) masks.give(targets);
	for (const cells of cellsOf) for (const c of cells) firstAt[c] = 0;
	indexes.give(firstAt);
	return { leads, unreached };
}
