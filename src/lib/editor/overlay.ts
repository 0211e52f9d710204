/**
 * What a tool shows on top of the drawing while it works: a marquee, the shape being drawn, a
 * guide line, the snap marker and a short readout. Plain data in document millimetres; the
 * canvas draws it (paper/overlay-items.ts) and tests read it.
 */
import type { Contour, Point } from '$lib/core/design/schema';
import type { Bounds } from '$lib/core/geometry/bounds';
import type { SnapKind } from '$lib/core/geometry/snap';
import type { XY } from '$lib/core/geometry/vec';

export interface Overlay {
	marquee: Bounds | null;
	snap: { point: XY; kind: Exclude<SnapKind, 'none'> } | null;
	/** A shape being drawn: its points so far and whether it is already closed. */
	draft: { points: readonly Point[]; closed: boolean; rubber?: XY } | null;
	guide: { from: XY; to: XY } | null;
	/** Outlines a generator would place, shown before they are added. */
	ghosts: readonly Contour[] | null;
	readout: { at: XY; text: string } | null;
}

export const EMPTY_OVERLAY: Overlay = {
	marquee: null,
	snap: null,
	draft: null,
	guide: null,
	ghosts: null,
	readout: null
};

export function rectFromCorners(a: XY, b: XY): Bounds {
	return {
		minX: Math.min(a.x, b.x),
		minY: Math.min(a.y, b.y),
		maxX: Math.max(a.x, b.x),
		maxY: Math.max(a.y, b.y)
	};
}
