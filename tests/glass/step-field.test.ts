/**
 * The step field from a search's targets against a plain breadth-first search written out here
 * (Moore, 1959; the textbook queue-less form: relax every labelled cell's neighbours until nothing
 * changes), on small random plates: same steps for every cell, same cells left unlabelled.
 */
import { describe, expect, it } from 'vitest';
import { BLOCKED, FREE, RouteGrid } from '../../src/lib/core/glass/route-grid';
import { scratchFor } from '../../src/lib/core/glass/search-scratch';
import { stepField } from '../../src/lib/core/glass/step-field';

function lcg(seed: number) {
	let s = seed;
	return () => (s = (s * 48271) % 2147483647) / 2147483647;
}

describe('step field from the targets', () => {
	it('matches a plain breadth-first count of steps', () => {
		for (let seed = 1; seed <= 40; seed++) {
			const random = lcg(seed * 7907);
			const grid = new RouteGrid({
				domain: { x_mm: 0, y_mm: 0, width_mm: 5 + Math.floor(random() * 12), height_mm: 7 },
				cell_mm: 1
			});
			const net = 2;
			const n = grid.nx * grid.ny;
			for (let c = 0; c < n; c++) {
				const r = random();
				grid.owner[c] = r < 0.25 ? BLOCKED : r < 0.35 ? 0 : r < 0.45 ? net : FREE;
			}
			const target = new Uint8Array(n);
			const targetCells = [Math.floor(random() * n), Math.floor(random() * n)];
			for (const c of targetCells) target[c] = 1;
			const scratch = scratchFor(n);
			const mark = stepField({ grid, scratch, target, targetCells, net });
			// Reference: label targets 0, then repeat until stable: a passable labelled cell (or a
			// target) gives each neighbour its steps + 1 when that is fewer.
			const expected = new Array<number>(n).fill(Infinity);
			for (const c of targetCells) expected[c] = 0;
			const passable = (c: number) =>
				target[c] === 1 || grid.owner[c] === FREE || grid.owner[c] === net;
			for (let changed = true; changed;) {
				changed = false;
				for (let c = 0; c < n; c++) {
					if (expected[c] === Infinity || !passable(c)) continue;
					const ix = c % grid.nx;
					const around = [
						ix > 0 ? c - 1 : -1,
						ix < grid.nx - 1 ? c + 1 : -1,
						c - grid.nx,
						c + grid.nx
					];
					for (const m of around)
						if (m >= 0 && m < n && expected[c] + 1 < expected[m]) {
							expected[m] = expected[c] + 1;
							changed = true;
						}
				}
			}
			for (let c = 0; c < n; c++) {
				const actual = scratch.stepsMark[c] === mark ? scratch.steps[c] : Infinity;
				expect(actual, `plate ${seed}, cell ${c}`).toBe(expected[c]);
			}
		}
	});
});
