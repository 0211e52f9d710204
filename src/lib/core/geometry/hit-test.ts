/**
 * Hit-testing and marquee queries on a spatial index. A point hits an electrode when it lies in
 * its even-odd fill or within `tolerance_mm` of its boundary; the topmost (last drawn) wins. A
 * marquee either selects electrodes wholly inside it ('contains') or any that it touches
 * ('intersects').
 */
import type { Bounds } from './bounds';
import { nearestOnRing, segmentsCross } from './distance';
import { pointInRings } from './polygon';
import { candidatesIn, pointArea, type IndexedElectrode, type SpatialIndex } from './spatial-index';
import type { XY } from './vec';

export interface Hit {
	id: string;
	/** 'fill' inside the electrode, 'edge' near its boundary (outline or hole). */
	part: 'fill' | 'edge';
	/** Distance to the nearest boundary, in mm. */
	distance_mm: number;
}

function hitOf(entry: IndexedElectrode, point: XY, tolerance_mm: number): Hit | null {
	const distance_mm = Math.min(...entry.rings.map((r) => nearestOnRing(r, point).distance));
	if (pointInRings(entry.rings, point))
		return { id: entry.id, part: distance_mm <= tolerance_mm ? 'edge' : 'fill', distance_mm };
	return distance_mm <= tolerance_mm ? { id: entry.id, part: 'edge', distance_mm } : null;
}

/** Every electrode under the point, topmost first. */
export function hitTestAll(index: SpatialIndex, point: XY, tolerance_mm: number): Hit[] {
	const hits: Hit[] = [];
	const candidates = candidatesIn(index, pointArea(point, tolerance_mm));
	for (let i = candidates.length - 1; i >= 0; i--) {
		const hit = hitOf(candidates[i], point, tolerance_mm);
		if (hit) hits.push(hit);
	}
	return hits;
}

/** The topmost electrode under the point, or null. */
export function hitTest(index: SpatialIndex, point: XY, tolerance_mm: number): Hit | null {
	const candidates = candidatesIn(index, pointArea(point, tolerance_mm));
	for (let i = candidates.length - 1; i >= 0; i--) {
		const hit = hitOf(candidates[i], point, tolerance_mm);
		if (hit) return hit;
	}
	return null;
}

function ringTouchesRect(ring: Float64Array, rect: Bounds): boolean {
	const corners = [
		{ x: rect.minX, y: rect.minY },
		{ x: rect.maxX, y: rect.minY },
		{ x: rect.maxX, y: rect.maxY },
		{ x: rect.minX, y: rect.maxY }
	];
	const n = ring.length / 2;
	for (let i = 0; i < n; i++) {
		const a = { x: ring[2 * i], y: ring[2 * i + 1] };
		if (a.x >= rect.minX && a.x <= rect.maxX && a.y >= rect.minY && a.y <= rect.maxY) return true;
		const b = { x: ring[(2 * i + 2) % ring.length], y: ring[(2 * i + 3) % ring.length] };
		for (let k = 0; k < 4; k++)
			if (segmentsCross({ a, b }, { a: corners[k], b: corners[(k + 1) % 4] })) return true;
	}
	return false;
}

/** Ids in draw order of electrodes inside ('contains') or touching ('intersects') the rectangle. */
export function queryRect(
	index: SpatialIndex,
	rect: Bounds,
	mode: 'contains' | 'intersects' = 'contains'
): string[] {
	const candidates = candidatesIn(index, rect);
	if (mode === 'contains') {
		return candidates
			.filter(
				(e) =>
					e.bounds.minX >= rect.minX &&
					e.bounds.maxX <= rect.maxX &&
					e.bounds.minY >= rect.minY &&
					e.bounds.maxY <= rect.maxY
			)
			.map((e) => e.id);
	}
	const centre = { x: (rect.minX + rect.maxX) / 2, y: (rect.minY + rect.maxY) / 2 };
	return candidates
		.filter((e) => e.rings.some((r) => ringTouchesRect(r, rect)) || pointInRings(e.rings, centre))
		.map((e) => e.id);
}
