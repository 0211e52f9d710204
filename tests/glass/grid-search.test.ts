/**
 * The routing grid's searches on hand-drawn 10 × 10 mm plates (1 mm cells), where the answer is
 * plain geometry: a walled-in cell has no way out for other nets, the wall's own net passes, and an
 * open plate gives the straight run.
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
});
