/**
 * The routing grid's searches on hand-drawn 10 × 10 mm plates (1 mm cells), where the answer is
 * plain geometry: a walled-in cell has no way out for other nets, the wall's own net passes, an
 * open plate gives the straight run, and a lead into its own terminal through the terminal's dear
 * surround pays nothing extra there (its home), where another net's lead would go round.
 */
import { describe, expect, it } from 'vitest';
import { GridSearch } from '../../src/lib/core/glass/grid-search';
import { RouteGrid } from '../../src/lib/core/glass/route-grid';
import { rectRing } from '../../src/lib/core/glass/rings';

const plate = () =>
	new RouteGrid({ domain: { x_mm: 0, y_mm: 0, width_mm: 10, height_mm: 10 }, cell_mm: 1 });
const cell = (grid: RouteGrid, ix: number, iy: number) => iy * grid.nx + ix;

/** Net 0 owns a square ring of cells around cell (4, 4): the cells whose centres lie in 3–6 mm but not 4–5 mm. */
function walled(): RouteGrid {
	const grid = plate();
	grid.claim(rectRing({ x_mm: 3, y_mm: 3, width_mm: 3, height_mm: 3 }), 0, 0);
	grid.owner[cell(grid, 4, 4)] = -1;
	return grid;
}

describe('routing grid searches', () => {
	it('find no way out of a ring of another net, without a least-cost search', () => {
		const grid = walled();
		const search = new GridSearch(grid);
		const target = new Uint8Array(grid.nx * grid.ny);
		target[cell(grid, 0, 0)] = 1;
		const from = { sources: [cell(grid, 4, 4)], target, boxes: [[0, 0, 0, 0]] as const };
		expect(search.reachable({ ...from, net: 1 })).toBe(false);
		expect(search.search({ ...from, net: 1 })).toBeNull();
		// Every cell the fill swept lies inside the ring: here only the walled-in cell itself.
		expect(search.floodedInVain(cell(grid, 4, 4))).toBe(true);
		expect(search.floodedInVain(cell(grid, 8, 8))).toBe(false);
		// The ring's own net may cross it.
		expect(search.reachable({ ...from, net: 0 })).toBe(true);
		expect(search.search({ ...from, net: 0 })).not.toBeNull();
	});

	it('take the straight run across an open plate', () => {
		const grid = plate();
		const search = new GridSearch(grid);
		const target = new Uint8Array(grid.nx * grid.ny);
		target[cell(grid, 9, 2)] = 1;
		const path = search.search({
			sources: [cell(grid, 0, 2)],
			target,
			net: 0,
			boxes: [[9, 2, 9, 2]]
		});
		// Hand count: cells (0, 2) … (9, 2), ten cells in one row.
		expect(path).toEqual(Array.from({ length: 10 }, (_, i) => cell(grid, i, 2)));
	});

	it("cross a dear surround freely where it is the lead's own home", () => {
		// Target cell (5, 5) sits in a ring of cells costing 1000 (its back plate, say), open to
		// the left at (4, 5); the lead starts at (5, 9), below it.
		const grid = plate();
		for (let iy = 4; iy <= 6; iy++)
			for (let ix = 4; ix <= 6; ix++)
				if (ix !== 5 || iy !== 5) grid.cost[cell(grid, ix, iy)] = 1000;
		grid.cost[cell(grid, 4, 5)] = 0;
		const target = new Uint8Array(grid.nx * grid.ny);
		target[cell(grid, 5, 5)] = 1;
		const from = { sources: [cell(grid, 5, 9)], target, net: 2, boxes: [[5, 5, 5, 5]] as const };
		const search = new GridSearch(grid);
		// Not home: going round to the gap is far cheaper than 1000, so no dear cell is entered.
		const around = search.search(from)!;
		expect(around.slice(1).some((c) => grid.cost[c] > 0)).toBe(false);
		// Home: the ring is net 2's own surround, so the lead runs straight up from (5, 9): four
		// steps, through (5, 6), hand count.
		const home = new Int32Array(grid.nx * grid.ny).fill(-1);
		for (let iy = 4; iy <= 6; iy++) for (let ix = 4; ix <= 6; ix++) home[cell(grid, ix, iy)] = 2;
		const straight = search.search({ ...from, home });
		expect(straight).toEqual([9, 8, 7, 6, 5].map((iy) => cell(grid, 5, iy)));
	});

	it('claim the same cells around a straight run, whichever way it is given', () => {
		// 1 mm cells; a run filling [2, 4] × [2, 3] mm with clearance 0.6 mm. Hand geometry: centres
		// 0.5 mm off a side are in, a centre 0.5 mm off both sides of a corner is √0.5 ≈ 0.707 mm
		// away and out: cells x 1–4, y 1–3 less the four corners.
		const boxed = plate();
		boxed.claimBox(2, 2, 4, 3, 7, 0.6);
		const ringed = plate();
		ringed.claim(rectRing({ x_mm: 2, y_mm: 2, width_mm: 2, height_mm: 1 }), 7, 0.6);
		const claimed = (grid: RouteGrid) =>
			[...grid.owner.keys()]
				.filter((c) => grid.owner[c] === 7)
				.map((c) => [c % 10, Math.floor(c / 10)]);
		const expected: number[][] = [];
		for (let iy = 1; iy <= 3; iy++)
			for (let ix = 1; ix <= 4; ix++)
				if (!((ix === 1 || ix === 4) && (iy === 1 || iy === 3))) expected.push([ix, iy]);
		expect(claimed(boxed)).toEqual(expected);
		expect(claimed(ringed)).toEqual(expected);
	});
});
