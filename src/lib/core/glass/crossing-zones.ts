/**
 * Where on the glass a front/back overlap would show: in the viewing area (visible), inside the
 * seal but outside the viewing area (behind the bezel: it switches, hidden), or under the seal and
 * beyond (no fluid: nothing switches). A routing-grid cell is in the zone of its centre.
 */
import type { Rect } from '../design/schema';
import type { RouteGrid } from './route-grid';

export const ZONE_VIEW = 0;
export const ZONE_BEZEL = 1;
export const ZONE_DRY = 2;

const contains = (r: Rect, x: number, y: number) =>
	x > r.x_mm && y > r.y_mm && x < r.x_mm + r.width_mm && y < r.y_mm + r.height_mm;

export interface CrossingAreas {
	viewing: Rect;
	sealInner: Rect;
}

/** The zone of a cell of the grid. */
export function cellZone(grid: RouteGrid, areas: CrossingAreas): (cell: number) => number {
	return (cell) => {
		const ix = cell % grid.nx;
		const x = grid.centreX(ix);
		const y = grid.centreY((cell - ix) / grid.nx);
		return contains(areas.viewing, x, y)
			? ZONE_VIEW
			: contains(areas.sealInner, x, y)
				? ZONE_BEZEL
				: ZONE_DRY;
	};
}

/** The cells of each grid row in the viewing area, as [first, last] column (empty: first > last). */
export function viewingColumns(grid: RouteGrid, viewing: Rect): (iy: number) => [number, number] {
	// Centres strictly inside: x0 + (ix + 0.5)·c > left and < right.
	const c = grid.cell_mm;
	const first = Math.max(0, Math.floor((viewing.x_mm - grid.x0) / c - 0.5) + 1);
	const last = Math.min(
		grid.nx - 1,
		Math.ceil((viewing.x_mm + viewing.width_mm - grid.x0) / c - 0.5) - 1
	);
	return (iy) => {
		const y = grid.centreY(iy);
		return y > viewing.y_mm && y < viewing.y_mm + viewing.height_mm ? [first, last] : [1, 0];
	};
}
