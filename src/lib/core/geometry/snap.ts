/**
 * Snapping for the canvas's pointer: given a raw point in mm, return where it should land. Order
 * of preference: a vertex of another electrode, then an edge, then a 15°-step direction from an
 * anchor, then the grid. Vertex, edge and angle snaps apply only within `tolerance_mm`; the grid
 * (when a pitch is given) always applies. Distances are Euclidean, in millimetres.
 */
import { nearestOnRing } from './distance';
import { degToRad, type XY } from './vec';

export interface SnapVertex {
	readonly x: number;
	readonly y: number;
	readonly electrodeId: string;
}

export interface SnapEdge {
	readonly electrodeId: string;
	/** A flattened closed ring [x0, y0, x1, y1, …]. */
	readonly ring: Float64Array;
}

export interface SnapCandidates {
	readonly vertices: readonly SnapVertex[];
	readonly edges: readonly SnapEdge[];
}

export type SnapKind = 'grid' | 'vertex' | 'edge' | 'angle' | 'none';

export interface SnapResult {
	point: XY;
	kind: SnapKind;
	/** The electrode snapped to, for vertex and edge snaps. */
	target?: { electrodeId: string };
}

export interface SnapOptions {
	point: XY;
	tolerance_mm: number;
	gridPitch_mm?: number;
	gridOrigin?: XY;
	candidates?: SnapCandidates;
	/** Anchor for direction snapping (the previous point of a pen path, the start of a drag). */
	angleFrom?: XY;
	angleStep_deg?: number;
}

function snapToVertex(options: SnapOptions): SnapResult | null {
	let best: SnapVertex | null = null;
	let bestDistance = options.tolerance_mm;
	for (const v of options.candidates?.vertices ?? []) {
		const d = Math.hypot(v.x - options.point.x, v.y - options.point.y);
		if (d <= bestDistance) [best, bestDistance] = [v, d];
	}
	return best
		? { point: { x: best.x, y: best.y }, kind: 'vertex', target: { electrodeId: best.electrodeId } }
		: null;
}

function snapToEdge(options: SnapOptions): SnapResult | null {
	let best: SnapResult | null = null;
	let bestDistance = options.tolerance_mm;
	for (const edge of options.candidates?.edges ?? []) {
		const hit = nearestOnRing(edge.ring, options.point);
		if (hit.distance <= bestDistance) {
			bestDistance = hit.distance;
			best = {
				point: { x: hit.x, y: hit.y },
				kind: 'edge',
				target: { electrodeId: edge.electrodeId }
			};
		}
	}
	return best;
}

function snapToAngle(options: SnapOptions): SnapResult | null {
	const anchor = options.angleFrom;
	if (!anchor) return null;
	const dx = options.point.x - anchor.x;
	const dy = options.point.y - anchor.y;
	const r = Math.hypot(dx, dy);
	if (r === 0) return null;
	const step = degToRad(options.angleStep_deg ?? 15);
	const angle = Math.round(Math.atan2(dy, dx) / step) * step;
	const ux = Math.cos(angle);
	const uy = Math.sin(angle);
	const along = dx * ux + dy * uy;
	const point = { x: anchor.x + ux * along, y: anchor.y + uy * along };
	const off = Math.hypot(point.x - options.point.x, point.y - options.point.y);
	return off <= options.tolerance_mm ? { point, kind: 'angle' } : null;
}

function snapToGrid(options: SnapOptions): SnapResult | null {
	const pitch = options.gridPitch_mm;
	if (!pitch || !(pitch > 0)) return null;
	const origin = options.gridOrigin ?? { x: 0, y: 0 };
	const round = (v: number, o: number) => o + Math.round((v - o) / pitch) * pitch;
	return {
		point: { x: round(options.point.x, origin.x), y: round(options.point.y, origin.y) },
		kind: 'grid'
	};
}

export function snapPoint(options: SnapOptions): SnapResult {
	return (
		snapToVertex(options) ??
		snapToEdge(options) ??
		snapToAngle(options) ??
		snapToGrid(options) ?? { point: { x: options.point.x, y: options.point.y }, kind: 'none' }
	);
}
