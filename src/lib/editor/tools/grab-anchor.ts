/**
 * The point of a selection that snapping should place when it is dragged: the selected vertex
 * nearest the pointer if one is within reach, else the corner of the selection's bounds nearest
 * the pointer. Snapping that point (rather than the pointer) lands corners on the grid.
 */
import type { Design } from '$lib/core/design/schema';
import type { XY } from '$lib/core/geometry/vec';
import { shapesTightBounds } from '$lib/core/geometry/tight-bounds';

export function grabAnchor(
	design: Design,
	ids: readonly string[],
	pointer: XY,
	reach_mm: number
): XY {
	const wanted = new Set(ids);
	const electrodes = design.electrodes.filter((e) => wanted.has(e.id));
	let best: XY | null = null;
	let bestDistance = reach_mm;
	for (const e of electrodes)
		for (const contour of [e.outline, ...e.holes])
			for (const p of contour) {
				const d = Math.hypot(p.x - pointer.x, p.y - pointer.y);
				if (d <= bestDistance) [best, bestDistance] = [{ x: p.x, y: p.y }, d];
			}
	if (best) return best;
	const b = shapesTightBounds(electrodes);
	if (!(b.maxX >= b.minX)) return pointer;
	const corners = [
		{ x: b.minX, y: b.minY },
		{ x: b.maxX, y: b.minY },
		{ x: b.maxX, y: b.maxY },
		{ x: b.minX, y: b.maxY }
	];
	return corners.reduce((a, c) =>
		Math.hypot(c.x - pointer.x, c.y - pointer.y) < Math.hypot(a.x - pointer.x, a.y - pointer.y)
			? c
			: a
	);
}
