/**
 * Collects snap candidates (on-curve vertices and flattened edges) of the electrodes near a point,
 * using the spatial index, and leaving out the electrodes being edited.
 */
import type { SnapCandidates, SnapEdge, SnapVertex } from './snap';
import { candidatesIn, pointArea, type SpatialIndex } from './spatial-index';
import type { XY } from './vec';

export function snapCandidatesNear(
	index: SpatialIndex,
	options: { point: XY; radius_mm: number; excludeIds?: Iterable<string> }
): SnapCandidates {
	const exclude = new Set(options.excludeIds ?? []);
	const vertices: SnapVertex[] = [];
	const edges: SnapEdge[] = [];
	for (const entry of candidatesIn(index, pointArea(options.point, options.radius_mm))) {
		if (exclude.has(entry.id)) continue;
		const e = entry.electrode;
		for (const contour of [e.outline, ...e.holes]) {
			for (const p of contour) vertices.push({ x: p.x, y: p.y, electrodeId: e.id });
		}
		for (const ring of entry.rings) edges.push({ electrodeId: e.id, ring });
	}
	return { vertices, edges };
}
