/**
 * Small single-electrode marks that go with segmented characters: decimal point, colon dots,
 * minus sign and degree ring. Positions are given in the character's unslanted frame and then
 * follow the slant (a shear about the baseline), so marks sit where an italic character expects
 * them. Square dots are sheared with the character; round dots keep their circle and only move.
 */
import type { Contour } from '../design/schema';
import { KAPPA } from '../geometry/path-builder';
import {
	ellipseContour,
	rectangleContour,
	regularPolygonContour
} from '../geometry/primitive-shapes';
import { degToRad } from '../geometry/vec';
import type { SegmentStyle } from './segment-params';

export interface SlantFrame {
	baseline: number;
	slant_deg: number;
}

export function shearContour(contour: Contour, frame: SlantFrame): Contour {
	const k = Math.tan(degToRad(frame.slant_deg));
	if (k === 0) return contour;
	return contour.map((p) => {
		const q = { ...p, x: p.x + k * (frame.baseline - p.y) };
		if (p.in) q.in = [p.in[0] - k * p.in[1], p.in[1]];
		if (p.out) q.out = [p.out[0] - k * p.out[1], p.out[1]];
		return q;
	});
}

/** A dot whose unslanted box has top-left (x, y) and side `size`: a circle for round style, else a sheared square. */
export function dotContour(
	options: { x_mm: number; y_mm: number; size_mm: number; style: SegmentStyle } & SlantFrame
): Contour {
	const { x_mm: x, y_mm: y, size_mm: s } = options;
	if (options.style === 'round') {
		const k = Math.tan(degToRad(options.slant_deg));
		const cy = y + s / 2;
		return ellipseContour({
			cx_mm: x + s / 2 + k * (options.baseline - cy),
			cy_mm: cy,
			rx_mm: s / 2,
			ry_mm: s / 2
		});
	}
	return shearContour(rectangleContour({ x_mm: x, y_mm: y, width_mm: s, height_mm: s }), options);
}

/** Horizontal spacing (unslanted) that keeps a dot `gap` clear of a leaning edge and looks settled. */
export function markSpacing(options: {
	gap_mm: number;
	stroke_mm: number;
	slant_deg: number;
}): number {
	return (options.gap_mm + options.stroke_mm / 4) / Math.cos(degToRad(options.slant_deg));
}

/** A degree ring: outer diameter `size`, ring width `stroke`; round, square or octagonal by style. */
export function degreeRing(
	options: {
		x_mm: number;
		y_mm: number;
		size_mm: number;
		stroke_mm: number;
		style: SegmentStyle;
	} & SlantFrame
): {
	outline: Contour;
	holes: Contour[];
} {
	const { x_mm: x, y_mm: y, size_mm: s, stroke_mm: t } = options;
	const k = Math.tan(degToRad(options.slant_deg));
	const cy = y + s / 2;
	const cx = x + s / 2 + k * (options.baseline - cy);
	const inner = s / 2 - t;
	if (options.style === 'round') {
		return {
			outline: ellipseContour({ cx_mm: cx, cy_mm: cy, rx_mm: s / 2, ry_mm: s / 2 }),
			holes: [ellipseContour({ cx_mm: cx, cy_mm: cy, rx_mm: inner, ry_mm: inner })]
		};
	}
	if (options.style === 'square') {
		const sq = (r: number) =>
			shearContour(
				rectangleContour({ x_mm: x + s / 2 - r, y_mm: cy - r, width_mm: 2 * r, height_mm: 2 * r }),
				options
			);
		return { outline: sq(s / 2), holes: [sq(inner)] };
	}
	// Octagon whose flats are s apart (circumradius s/2 / cos 22.5°).
	const oct = (r: number) =>
		shearContour(
			regularPolygonContour({
				cx_mm: x + s / 2,
				cy_mm: cy,
				radius_mm: r / Math.cos(Math.PI / 8),
				sides: 8,
				rotation_deg: 22.5
			}),
			options
		);
	return { outline: oct(s / 2), holes: [oct(inner)] };
}

/** Handle length used by round marks (exported for tests). */
export const ROUND_MARK_KAPPA = KAPPA;
