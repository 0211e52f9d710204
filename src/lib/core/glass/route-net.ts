/**
 * Routes one net on a plate: starting from its first terminal (a pad or a transfer point), the
 * nearest unconnected terminal is joined by a least-cost lead, which then becomes part of the
 * connected set, until every terminal is joined or none can be reached (a growing-tree Steiner
 * heuristic, as maze routers use: Lee, IRE Trans. EC-10, 1961, with Dijkstra costs).
 *
 * Leads are cell-centre polylines with collinear points dropped; each new lead claims its cells
 * (with the clearance) so later nets keep their distance.
 */
import type { XY } from '../geometry/vec';
import { leadRing } from './rings';
import type { GridSearch } from './grid-search';
import type { RouteGrid } from './route-grid';

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

function cellBox(grid: RouteGrid, cells: readonly number[]): [number, number, number, number] {
	let x0 = Infinity,
		y0 = Infinity,
		x1 = -Infinity,
		y1 = -Infinity;
	for (const c of cells) {
		const ix = c % grid.nx;
		const iy = (c - ix) / grid.nx;
		x0 = Math.min(x0, ix);
		x1 = Math.max(x1, ix);
		y0 = Math.min(y0, iy);
		y1 = Math.max(y1, iy);
	}
	return [x0, y0, x1, y1];
}

export function routeNet(options: {
	grid: RouteGrid;
	search: GridSearch;
	net: number;
	terminals: readonly Terminal[];
	width_mm: number;
	clearance_mm: number;
}): NetRoute {
	const { grid, search, net, terminals, width_mm, clearance_mm } = options;
	const leads: XY[][] = [];
	if (terminals.length === 0) return { leads, unreached: [] };
	const inTree = new Uint8Array(grid.nx * grid.ny);
	const target = new Uint8Array(grid.nx * grid.ny);
	const owners = new Int32Array(grid.nx * grid.ny).fill(-1);
	const cellsOf = terminals.map((t) => grid.cellsInside(t.ring));
	const sources: number[] = [];
	const join = (cells: readonly number[]) => {
		for (const c of cells) {
			if (!inTree[c]) sources.push(c);
			inTree[c] = 1;
		}
	};
	join(cellsOf[0]);
	const pending = new Set<number>();
	for (let t = 1; t < terminals.length; t++) {
		pending.add(t);
		for (const c of cellsOf[t]) {
			target[c] = 1;
			owners[c] = t;
		}
	}
	const reach = (t: number) => {
		pending.delete(t);
		for (const c of cellsOf[t]) target[c] = 0;
		join(cellsOf[t]);
	};
	while (pending.size > 0) {
		const overlapping = [...pending].find((t) => cellsOf[t].some((c) => inTree[c]));
		if (overlapping !== undefined) {
			reach(overlapping);
			continue;
		}
		const boxes = [...pending].map((t) => cellBox(grid, cellsOf[t]));
		const cells = search.search({ sources, target, net, boxes });
		if (!cells) break;
		const lead = cellsToPolyline(grid, cells);
		leads.push(lead);
		for (let i = 1; i < lead.length; i++)
			grid.claim(leadRing({ a: lead[i - 1], b: lead[i], width_mm }), net, clearance_mm);
		join(cells);
		reach(owners[cells[cells.length - 1]]);
	}
	return { leads, unreached: [...pending].map((t) => terminals[t]) };
}
