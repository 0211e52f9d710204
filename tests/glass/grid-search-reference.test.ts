/**
 * The routing grid's least-cost search against the textbook algorithm (Dijkstra, Numer. Math. 1,
 * 1959), written out here without a queue: a linear scan for the cheapest unsettled state over
 * (cell, heading) states with the same step rule (STEP_COST + the cell's extra cost, BEND_COST on a
 * change of heading after the first step; a cell passable when free, the net's own, or a target). On small
 * random plates every path the search returns must be a valid walk from a source to a target and
 * cost exactly the reference optimum, and the search must find no path exactly when none exists.
 */
import { describe, expect, it } from 'vitest';
import { GridSearch } from '../../src/lib/core/glass/grid-search';
import { BLOCKED, FREE, RouteGrid } from '../../src/lib/core/glass/route-grid';
import { expectWithin, type ReferenceCase } from '../helpers/tolerance';

/** The search's step rule, in its cost units. */
const STEP_COST = 4;
const BEND_COST = 16;
const DX = [1, -1, 0, 0];
const DY = [0, 0, 1, -1];

function lcg(seed: number) {
	let s = seed;
	return () => (s = (s * 48271) % 2147483647) / 2147483647;
}

interface Case {
	grid: RouteGrid;
	net: number;
	sources: number[];
	target: Uint8Array;
}

const passable = (c: Case, cell: number) => {
	const o = c.grid.owner[cell];
	return c.target[cell] !== 0 || o === FREE || o === c.net;
};

/** Cheapest cost from any source to any target by plain Dijkstra, or Infinity. */
function referenceCost(c: Case): number {
	const { nx, ny } = c.grid;
	const n = nx * ny * 4;
	const dist = new Float64Array(n).fill(Infinity);
	const done = new Uint8Array(n);
	const fromSource = new Uint8Array(n);
	for (const s of c.sources)
		for (let h = 0; h < 4; h++) {
			dist[s * 4 + h] = 0;
			fromSource[s * 4 + h] = 1;
		}
	for (;;) {
		let best = -1;
		for (let s = 0; s < n; s++)
			if (!done[s] && dist[s] < Infinity && (best < 0 || dist[s] < dist[best])) best = s;
		if (best < 0) return Infinity;
		done[best] = 1;
		const cell = best >> 2;
		if (c.target[cell] && !fromSource[best]) return dist[best];
		const ix = cell % nx,
			iy = Math.floor(cell / nx);
		for (let h = 0; h < 4; h++) {
			const jx = ix + DX[h],
				jy = iy + DY[h];
			if (jx < 0 || jy < 0 || jx >= nx || jy >= ny) continue;
			const next = jy * nx + jx;
			if (!passable(c, next)) continue;
			const bend = fromSource[best] || h === (best & 3) ? 0 : BEND_COST;
			const nd = dist[best] + STEP_COST + c.grid.cost[next] + bend;
			const ns = next * 4 + h;
			if (nd < dist[ns]) {
				dist[ns] = nd;
				fromSource[ns] = 0;
			}
		}
	}
}

/** Cost of a returned path under the same step rule; throws on an invalid walk. */
function pathCost(c: Case, path: number[]): number {
	const { nx } = c.grid;
	expect(c.sources).toContain(path[0]);
	expect(c.target[path[path.length - 1]]).toBe(1);
	let total = 0;
	let heading = -1;
	for (let i = 1; i < path.length; i++) {
		const d = path[i] - path[i - 1];
		const h = d === 1 ? 0 : d === -1 ? 1 : d === nx ? 2 : d === -nx ? 3 : -1;
		expect(h).toBeGreaterThanOrEqual(0);
		expect(passable(c, path[i])).toBe(true);
		total += STEP_COST + c.grid.cost[path[i]] + (heading >= 0 && h !== heading ? BEND_COST : 0);
		heading = h;
	}
	return total;
}

function randomCase(seed: number, options: { integerCosts: boolean }): Case {
	const random = lcg(seed);
	const size = 6 + Math.floor(random() * 9);
	const grid = new RouteGrid({
		domain: { x_mm: 0, y_mm: 0, width_mm: size, height_mm: size - 2 },
		cell_mm: 1
	});
	const net = 1;
	for (let cell = 0; cell < grid.nx * grid.ny; cell++) {
		const r = random();
		grid.owner[cell] = r < 0.2 ? BLOCKED : r < 0.3 ? 0 : r < 0.4 ? net : FREE;
		const extra = random() < 0.3 ? random() * 40 : 0;
		grid.cost[cell] = options.integerCosts ? Math.round(extra) : extra;
	}
	const pick = () => Math.floor(random() * grid.nx * grid.ny);
	const sources = [...new Set(Array.from({ length: 1 + Math.floor(random() * 3) }, pick))];
	const target = new Uint8Array(grid.nx * grid.ny);
	for (let k = 0; k < 1 + Math.floor(random() * 4); k++) target[pick()] = 1;
	return { grid, net, sources, target };
}

function boxesOf(c: Case): [number, number, number, number][] {
	const boxes: [number, number, number, number][] = [];
	c.target.forEach((t, cell) => {
		if (!t) return;
		const ix = cell % c.grid.nx,
			iy = Math.floor(cell / c.grid.nx);
		boxes.push([ix, iy, ix, iy]);
	});
	return boxes;
}

describe('least-cost search against textbook Dijkstra on random plates', () => {
	for (const integerCosts of [true, false])
		it(`finds the optimum cost (${integerCosts ? 'whole-number' : 'fractional'} cell costs)`, () => {
			const cases: ReferenceCase[] = [];
			for (let seed = 1; seed <= 150; seed++) {
				const c = randomCase(seed * 7919 + (integerCosts ? 0 : 1), { integerCosts });
				const search = new GridSearch(c.grid);
				const targetCells = [...c.target.keys()].filter((cell) => c.target[cell]);
				const path = search.search({ ...c, boxes: boxesOf(c), targetCells });
				const expected = referenceCost(c);
				if (expected === Infinity) {
					expect(path).toBeNull();
					continue;
				}
				expect(path).not.toBeNull();
				cases.push({ label: `plate ${seed}`, expected, actual: pathCost(c, path!) });
			}
			expect(cases.length).toBeGreaterThan(30);
			expectWithin(cases, {
				tolerance: 1e-9,
				unit: 'cost units',
				source: 'Dijkstra, Numer. Math. 1, 1959 (textbook least-cost search)'
			});
		});
});

/**
 * A plate shaped like a real one: a dear viewing area (extra 2 per cell) crossed by thin lines of
 * another plate's conductors (extra 40), some cells taken by other nets; leads from outside into
 * the area and between points inside it, where the distance estimate adds the extra cost no lead
 * near its ends can avoid. Any overestimate there would show as a dearer path than the reference.
 */
function viewingAreaCase(seed: number): Case {
	const random = lcg(seed);
	const grid = new RouteGrid({
		domain: { x_mm: 0, y_mm: 0, width_mm: 36, height_mm: 26 },
		cell_mm: 1
	});
	const net = 1;
	for (let iy = 0; iy < grid.ny; iy++)
		for (let ix = 0; ix < grid.nx; ix++) {
			const cell = iy * grid.nx + ix;
			const inArea = ix >= 4 && ix <= 31 && iy >= 4 && iy <= 21;
			const onLine = inArea && iy % 6 === 0 && ix % 9 !== 0;
			grid.cost[cell] = inArea ? 2 + (onLine ? 40 : 0) : 0;
			if (random() < 0.08) grid.owner[cell] = BLOCKED;
		}
	const inside = () => 5 + Math.floor(random() * 26) + (5 + Math.floor(random() * 16)) * grid.nx;
	const anywhere = () => Math.floor(random() * grid.nx * grid.ny);
	const sources = [random() < 0.5 ? anywhere() : inside()];
	const target = new Uint8Array(grid.nx * grid.ny);
	const t = inside();
	for (const c of [t, t + 1, t + grid.nx]) target[c] = 1;
	for (const c of [...sources, t, t + 1, t + grid.nx]) grid.owner[c] = FREE;
	return { grid, net, sources, target };
}

describe('least-cost search against textbook Dijkstra across a dear viewing area', () => {
	it('finds the optimum cost when the estimate counts the unavoidable extra cost', () => {
		const cases: ReferenceCase[] = [];
		for (let seed = 1; seed <= 24; seed++) {
			const c = viewingAreaCase(seed * 104729);
			const search = new GridSearch(c.grid);
			const targetCells = [...c.target.keys()].filter((cell) => c.target[cell]);
			const path = search.search({ ...c, boxes: boxesOf(c), targetCells });
			const expected = referenceCost(c);
			if (expected === Infinity) {
				expect(path).toBeNull();
				continue;
			}
			expect(path).not.toBeNull();
			cases.push({ label: `plate ${seed}`, expected, actual: pathCost(c, path!) });
		}
		expect(cases.length).toBeGreaterThan(15);
		expectWithin(cases, {
			tolerance: 1e-9,
			unit: 'cost units',
			source: 'Dijkstra, Numer. Math. 1, 1959 (textbook least-cost search)'
		});
	});
});
