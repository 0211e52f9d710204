/**
 * Breadth-first steps from a search's targets through the cells passable for its net (Moore, Proc.
 * Int. Symp. Theory of Switching, 1959): a lower bound on every lead's remaining cost on the routing
 * grid (each step costs at least 1), exact but for bends and extra costs. Cells the fill never
 * reaches cannot reach a target. The steps land in the scratch's `steps`, valid where `stepsMark`
 * holds the returned mark.
 */
import { FREE, type RouteGrid } from './route-grid';
import type { SearchScratch } from './search-scratch';

export function stepField(options: {
	grid: RouteGrid;
	scratch: SearchScratch;
	target: Uint8Array;
	targetCells: readonly number[];
	net: number;
}): number {
	const { nx, ny, owner } = options.grid;
	const { scratch, target, targetCells, net } = options;
	const { steps, stepsMark, queueB: queue } = scratch;
	const free: number = FREE;
	const mark = scratch.nextFieldMark();
	let head = 0,
		tail = 0;
	for (const c of targetCells) {
		if (stepsMark[c] === mark) continue;
		stepsMark[c] = mark;
		steps[c] = 0;
		queue[tail++] = c;
	}
	const n = nx * ny;
	const step = [1, -1, nx, -nx];
	while (head < tail) {
		const cell = queue[head++];
		const ix = cell % nx;
		const d = steps[cell] + 1;
		for (let h = 0; h < 4; h++) {
			const next = cell + step[h];
			if (h < 2 ? ix === (h === 0 ? nx - 1 : 0) : next < 0 || next >= n) continue;
			if (stepsMark[next] === mark) continue;
			stepsMark[next] = mark;
			steps[next] = d;
			// A cell the net may not cross can still start a lead: it gets its steps, no more.
			const o = owner[next];
			if (o === free || o === net || target[next]) queue[tail++] = next;
		}
	}
	return mark;
}
