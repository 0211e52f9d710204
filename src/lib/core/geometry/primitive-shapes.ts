/**
 * Primitive outlines the drawing tools create: rectangle, rounded rectangle, ellipse, regular
 * polygon and a pen path. Curved corners are cubic quarter arcs with handle length κ·r (see
 * path-builder.ts). Contours run clockwise on screen, starting at the top-left.
 */
import type { Contour, Point } from '../design/schema';
import { KAPPA, pathFrom } from './path-builder';
import { degToRad } from './vec';

export interface BoxSpec {
	x_mm: number;
	y_mm: number;
	width_mm: number;
	height_mm: number;
}

function checkBox(box: BoxSpec): void {
	if (!(box.width_mm > 0 && box.height_mm > 0))
		throw new RangeError('expected a width and height above 0 mm');
}

export function rectangleContour(box: BoxSpec): Contour {
	checkBox(box);
	const { x_mm: x, y_mm: y, width_mm: w, height_mm: h } = box;
	return [
		{ x, y },
		{ x: x + w, y },
		{ x: x + w, y: y + h },
		{ x, y: y + h }
	];
}

/** Corner radius is clamped to half the shorter side; radius 0 gives a plain rectangle. */
export function roundedRectangleContour(box: BoxSpec & { radius_mm: number }): Contour {
	checkBox(box);
	const { x_mm: x, y_mm: y, width_mm: w, height_mm: h } = box;
	const r = Math.min(Math.max(box.radius_mm, 0), w / 2, h / 2);
	if (r === 0) return rectangleContour(box);
	const path = pathFrom({ x: x + r, y });
	if (w > 2 * r) path.lineTo({ x: x + w - r, y });
	path.arcAround({ x: x + w - r, y: y + r }, 90);
	if (h > 2 * r) path.lineTo({ x: x + w, y: y + h - r });
	path.arcAround({ x: x + w - r, y: y + h - r }, 90);
	if (w > 2 * r) path.lineTo({ x: x + r, y: y + h });
	path.arcAround({ x: x + r, y: y + h - r }, 90);
	if (h > 2 * r) path.lineTo({ x, y: y + r });
	path.arcAround({ x: x + r, y: y + r }, 90);
	return path.close();
}

export function ellipseContour(options: {
	cx_mm: number;
	cy_mm: number;
	rx_mm: number;
	ry_mm: number;
}): Contour {
	const { cx_mm: cx, cy_mm: cy, rx_mm: rx, ry_mm: ry } = options;
	if (!(rx > 0 && ry > 0)) throw new RangeError('expected radii above 0 mm');
	const kx = KAPPA * rx;
	const ky = KAPPA * ry;
	return [
		{ x: cx, y: cy - ry, in: [-kx, 0], out: [kx, 0] },
		{ x: cx + rx, y: cy, in: [0, -ky], out: [0, ky] },
		{ x: cx, y: cy + ry, in: [kx, 0], out: [-kx, 0] },
		{ x: cx - rx, y: cy, in: [0, ky], out: [0, -ky] }
	];
}

/** Vertices on a circle of `radius_mm`; the first sits straight above the centre, turned by `rotation_deg`. */
export function regularPolygonContour(options: {
	cx_mm: number;
	cy_mm: number;
	radius_mm: number;
	sides: number;
	rotation_deg?: number;
}): Contour {
	const { cx_mm, cy_mm, radius_mm, sides } = options;
	if (!Number.isInteger(sides) || sides < 3)
		throw new RangeError('expected a whole number of at least 3 sides');
	if (!(radius_mm > 0)) throw new RangeError('expected a radius above 0 mm');
	const start = degToRad((options.rotation_deg ?? 0) - 90);
	return Array.from({ length: sides }, (_, i) => {
		const a = start + (2 * Math.PI * i) / sides;
		return { x: cx_mm + radius_mm * Math.cos(a), y: cy_mm + radius_mm * Math.sin(a) };
	});
}

/** A pen path: the clicked points with their handles (relative), closed. Zero handles are dropped. */
export function penPathContour(points: readonly Point[]): Contour {
	if (points.length < 3) throw new RangeError('a pen path needs at least 3 points');
	return points.map((p) => {
		if (![p.x, p.y, ...(p.in ?? []), ...(p.out ?? [])].every(Number.isFinite))
			throw new RangeError('expected finite coordinates');
		const q: Point = { x: p.x, y: p.y };
		if (p.in && (p.in[0] !== 0 || p.in[1] !== 0)) q.in = [p.in[0], p.in[1]];
		if (p.out && (p.out[0] !== 0 || p.out[1] !== 0)) q.out = [p.out[0], p.out[1]];
		return q;
	});
}
