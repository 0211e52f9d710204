/**
 * Where on the glass a front/back overlap would show: in the viewing area (visible), inside the
 * seal but outside the viewing area (behind the bezel: it switches, hidden), or under the seal and
 * beyond (no fluid: nothing switches). One zone per routing-grid cell, by the cell's centre.
 */
import type { Rect } from '../design/schema';
import type { RouteGrid } from './route-grid';

export const ZONE_VIEW = 0;
export const ZONE_BEZEL = 1;
export const ZONE_DRY = 2;

const contains = (r: Rect, x: number, y: number) =>
	x > r.x_mm && y > r.y_mm && x < r.x_mm + r.width_mm && y < r.y_mm + r.height_mm;

export function crossingZones(
	grid: RouteGrid,
	areas: { viewing: Rect; sealInner: Rect }
): Uint8Array {
	const zones = new Uint8Array(grid.nx * grid.ny);
	for (let iy = 0; iy < grid.ny; iy++) {
		const y = grid.centreY(iy);
		for (let ix = 0; ix < grid.nx; ix++) {
			const x = grid.centreX(ix);
			zones[iy * grid.nx + ix] = contains(areas.viewing, x, y)
				? ZONE_VIEW
				: contains(areas.sealInner, x, y)
					? ZONE_BEZEL
					: ZONE_DRY;
		}
	}
	return zones;
}
