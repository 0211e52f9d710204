/**
 * Addresses a contour or a point of an electrode for node editing. Contour 0 is the outline and
 * contour 1 + h is hole h; point `index` counts along that contour.
 */
import type { Contour, Design, Electrode, Point } from '../design/schema';
import { requireThat } from './command-error';
import { editDesign } from './design-draft';
import type { Patch } from './patch';

export interface ContourRef {
	electrodeId: string;
	/** 0 = outline, 1 + h = holes[h]. */
	contour: number;
}

export interface PointRef extends ContourRef {
	index: number;
}

export function contourOf(electrode: Electrode, contour: number): Contour {
	const c = contour === 0 ? electrode.outline : electrode.holes[contour - 1];
	requireThat(
		Number.isInteger(contour) && c,
		`electrode "${electrode.id}" has no contour ${contour}`
	);
	return c;
}

export function withContour(electrode: Electrode, contour: number, next: Contour): Electrode {
	if (contour === 0) return { ...electrode, outline: next };
	return { ...electrode, holes: electrode.holes.map((h, i) => (i === contour - 1 ? next : h)) };
}

/** Replaces one contour of one electrode with `edit(contour)`. */
export function editContour(
	design: Design,
	ref: ContourRef,
	edit: (contour: Contour) => Contour
): Patch {
	return editDesign(design, (draft) => {
		draft.electrodes.update(ref.electrodeId, (e) =>
			withContour(e, ref.contour, edit(contourOf(e, ref.contour)))
		);
	});
}

export function checkPointIndex(contour: Contour, index: number): void {
	requireThat(
		Number.isInteger(index) && index >= 0 && index < contour.length,
		`no point ${index} on this contour`
	);
}

/** A point without zero-length handles. */
export function cleanPoint(p: Point): Point {
	const q: Point = { x: p.x, y: p.y };
	if (p.in && (p.in[0] !== 0 || p.in[1] !== 0)) q.in = [p.in[0], p.in[1]];
	if (p.out && (p.out[0] !== 0 || p.out[1] !== 0)) q.out = [p.out[0], p.out[1]];
	return q;
}

/** Smooth: both handles present and pointing in opposite directions (collinear through the point). */
export function isSmoothPoint(p: Point): boolean {
	if (!p.in || !p.out) return false;
	const cross = p.in[0] * p.out[1] - p.in[1] * p.out[0];
	const dot = p.in[0] * p.out[0] + p.in[1] * p.out[1];
	const scale = Math.hypot(...p.in) * Math.hypot(...p.out);
	return dot < 0 && Math.abs(cross) <= 1e-9 * scale;
}
