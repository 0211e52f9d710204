/**
 * Boolean operations on shapes with curves preserved, using paper.js headless as the geometry
 * kernel (its curve–curve intersection and path reconstruction, Lehni & Puckey, paper.js 0.12).
 * This is the only file of the core that touches paper.js: one private PaperScope with a 1×1 view
 * and nothing inserted into a project. Our contours go in as paths with relative handles (the
 * same convention as paper's segments) and come back as outlines with holes, one Shape per
 * disjoint island, holes assigned to the innermost outline containing them (even-odd).
 */
import paper from 'paper/dist/paper-core';
import type { Contour, Point } from '../design/schema';
import { flattenContour } from './flatten';
import { pointInRing, signedArea } from './polygon';
import type { Shape } from './shape';

const scope = new paper.PaperScope();
scope.setup(new scope.Size(1, 1));

type PaperItem = paper.PathItem;

function contourToPath(contour: Contour): paper.Path {
	const segments = contour.map(
		(p) =>
			new scope.Segment(
				new scope.Point(p.x, p.y),
				p.in ? new scope.Point(p.in[0], p.in[1]) : undefined,
				p.out ? new scope.Point(p.out[0], p.out[1]) : undefined
			)
	);
	return new scope.Path({ segments, closed: true, insert: false });
}

function shapeToItem(shape: Shape): PaperItem {
	const children = [shape.outline, ...shape.holes].map(contourToPath);
	const item = new scope.CompoundPath({ children, insert: false });
	item.fillRule = 'evenodd';
	return item;
}

const handle = (h: paper.Point): [number, number] | undefined =>
	h.x === 0 && h.y === 0 ? undefined : [h.x, h.y];

function pathToContour(path: paper.Path): Contour {
	return path.segments.map((s) => {
		const p: Point = { x: s.point.x, y: s.point.y };
		const hin = handle(s.handleIn);
		const hout = handle(s.handleOut);
		if (hin) p.in = hin;
		if (hout) p.out = hout;
		return p;
	});
}

/** Splits a boolean result into islands: outlines with the holes directly inside them. */
function itemToShapes(item: paper.Item): Shape[] {
	const paths = (
		item instanceof scope.CompoundPath ? (item.children as paper.Path[]) : [item as paper.Path]
	).filter((p) => p.segments.length >= 3 && Math.abs(p.area) > 1e-12);
	const rings = paths.map((p) => flattenContour(pathToContour(p), { tolerance_um: 0.1 }));
	const areas = rings.map((r) => Math.abs(signedArea(r)));
	// Depth = how many other rings contain this one; even depth is an outline, odd a hole.
	const parents = rings.map((ring, i) => {
		const probe = { x: ring[0], y: ring[1] };
		return rings
			.map((_, j) => j)
			.filter((j) => j !== i && areas[j] > areas[i] && pointInRing(rings[j], probe));
	});
	const depth = parents.map((p) => p.length);
	const shapes = new Map<number, { outline: Contour; holes: Contour[] }>();
	paths.forEach((p, i) => {
		if (depth[i] % 2 === 0) shapes.set(i, { outline: pathToContour(p), holes: [] });
	});
	paths.forEach((p, i) => {
		if (depth[i] % 2 === 1) {
			const owner = parents[i].reduce(
				(best, j) => (areas[j] < areas[best] ? j : best),
				parents[i][0]
			);
			shapes.get(owner)?.holes.push(pathToContour(p));
		}
	});
	return [...shapes.values()];
}

function combine(items: PaperItem[], op: 'unite' | 'intersect'): PaperItem {
	return items.reduce((acc, next) => acc[op](next, { insert: false }) as PaperItem);
}

export function uniteShapes(shapes: readonly Shape[]): Shape[] {
	if (shapes.length === 0) return [];
	return itemToShapes(combine(shapes.map(shapeToItem), 'unite'));
}

export function intersectShapes(shapes: readonly Shape[]): Shape[] {
	if (shapes.length === 0) return [];
	return itemToShapes(combine(shapes.map(shapeToItem), 'intersect'));
}

export function subtractShapes(base: Shape, cutters: readonly Shape[]): Shape[] {
	if (cutters.length === 0) return [base];
	const cut = combine(cutters.map(shapeToItem), 'unite');
	return itemToShapes(shapeToItem(base).subtract(cut, { insert: false }));
}
