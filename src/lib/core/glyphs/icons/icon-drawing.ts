/**
 * Drawing helpers for icons on the 24-unit grid: circles, rings, strokes (a line of given width as
 * a rectangle, an arc as an annular sector), rotation copies, unions and differences (through the
 * geometry kernel), and placement of the finished parts into millimetres.
 */
import type { Contour } from '../../design/schema';
import {
	composeAffine,
	rotationAbout,
	scalingAbout,
	transformContour,
	transformShape,
	translation,
	type Affine
} from '../../geometry/affine';
import { pathFrom } from '../../geometry/path-builder';
import { subtractShapes, uniteShapes } from '../../geometry/paper-kernel';
import { ellipseContour, rectangleContour } from '../../geometry/primitive-shapes';
import type { Shape } from '../../geometry/shape';
import { add, normalize, perpendicular, scale, sub, type XY } from '../../geometry/vec';
import type { ElectrodeDraft } from '../glyph-types';
import { ICON_GRID_UNITS, type IconPlacement } from './icon-types';

export const shape = (outline: Contour, holes: Contour[] = []): Shape => ({ outline, holes });

export const circle = (c: XY, r: number): Contour =>
	ellipseContour({ cx_mm: c.x, cy_mm: c.y, rx_mm: r, ry_mm: r });

export const ring = (c: XY, outer: number, inner: number): Shape =>
	shape(circle(c, outer), [circle(c, inner)]);

export const box = (x0: number, y0: number, x1: number, y1: number): Contour =>
	rectangleContour({ x_mm: x0, y_mm: y0, width_mm: x1 - x0, height_mm: y1 - y0 });

export const polygon = (points: readonly (readonly [number, number])[]): Contour =>
	points.map(([x, y]) => ({ x, y }));

/** A straight stroke from p to q, `width` wide, with flat ends. */
export function strokeLine(p: XY, q: XY, width: number): Contour {
	const n = scale(perpendicular(normalize(sub(q, p))), width / 2);
	return [add(p, n), add(q, n), sub(q, n), sub(p, n)].map((v) => ({ x: v.x, y: v.y }));
}

/** A circular stroke around `c` of radius r from angle `from_deg` sweeping `sweep_deg` (clockwise on screen). */
export function strokeArc(options: {
	c: XY;
	r: number;
	from_deg: number;
	sweep_deg: number;
	width: number;
}): Contour {
	const { c, r, width } = options;
	const a = (options.from_deg * Math.PI) / 180;
	const b = a + (options.sweep_deg * Math.PI) / 180;
	const at = (radius: number, angle: number) => ({
		x: c.x + radius * Math.cos(angle),
		y: c.y + radius * Math.sin(angle)
	});
	return pathFrom(at(r + width / 2, a))
		.arcAround(c, options.sweep_deg)
		.lineTo(at(r - width / 2, b))
		.arcAround(c, -options.sweep_deg)
		.close();
}

export const rotated = (contour: Contour, angle_deg: number, centre: XY): Contour =>
	transformContour(rotationAbout({ angle_deg, centre }), contour);

export const unite = (...shapes: Shape[]): Shape[] => uniteShapes(shapes);

/** Union of the pieces minus the cutters; expects one island. */
export function carve(pieces: Shape[], cutters: Shape[]): Shape {
	const [body, ...rest] = uniteShapes(pieces);
	if (rest.length > 0) throw new Error('icon body fell apart into islands');
	const [result, ...more] = subtractShapes(body, cutters);
	if (more.length > 0) throw new Error('icon body fell apart into islands');
	return result;
}

/** Single island of a union (an icon part must be one electrode). */
export function joined(...pieces: Shape[]): Shape {
	const islands = uniteShapes(pieces);
	if (islands.length !== 1) throw new Error(`icon part has ${islands.length} islands`);
	return islands[0];
}

export const part = (key: string, name: string, s: Shape): ElectrodeDraft => ({
	key,
	name,
	kind: 'icon',
	outline: s.outline,
	holes: s.holes
});

/** Moves parts drawn on the 24-unit grid into the placement box (mm). */
export function placeParts(
	parts: readonly ElectrodeDraft[],
	placement: IconPlacement
): ElectrodeDraft[] {
	if (!(placement.size_mm > 0)) throw new RangeError('expected an icon size above 0 mm');
	const m: Affine = composeAffine(
		scalingAbout({
			sx: placement.size_mm / ICON_GRID_UNITS,
			sy: placement.size_mm / ICON_GRID_UNITS,
			centre: { x: 0, y: 0 }
		}),
		translation(placement.x_mm, placement.y_mm)
	);
	return parts.map((p) => ({ ...p, ...transformShape(m, { outline: p.outline, holes: p.holes }) }));
}

export const pt = (x: number, y: number): XY => ({ x, y });
