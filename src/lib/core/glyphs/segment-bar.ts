/**
 * Builds one segment bar between two joints of a frame: a strip `stroke` wide along the axis,
 * cut at both ends by the style's half-planes (convex clipping), or for the round style a stadium
 * (two semicircular caps joined by straight edges, arcs as cubics).
 */
import type { Contour } from '../design/schema';
import { clipConvexPolygon, dropDuplicateVertices, type HalfPlane } from '../geometry/half-plane';
import { pathFrom } from '../geometry/path-builder';
import { add, distance, normalize, perpendicular, scale, sub, type XY } from '../geometry/vec';
import { GlyphError } from './glyph-types';
import { chamferPlane, endHalfPlanes, roundCapOffset, type BarEndContext } from './segment-ends';
import type { SegmentStyle } from './segment-params';

/** A long strip along p→q, `half` to each side, reaching `margin` past both ends. */
export function stripPolygon(options: { p: XY; q: XY; half: number; margin: number }): XY[] {
	const u = normalize(sub(options.q, options.p));
	const n = perpendicular(u);
	const a = sub(options.p, scale(u, options.margin));
	const b = add(options.q, scale(u, options.margin));
	return [
		add(a, scale(n, -options.half)),
		add(b, scale(n, -options.half)),
		add(b, scale(n, options.half)),
		add(a, scale(n, options.half))
	];
}

export function clippedContour(
	polygon: readonly XY[],
	planes: readonly HalfPlane[],
	what: string
): Contour {
	let poly: XY[] = [...polygon];
	for (const plane of planes) poly = clipConvexPolygon(poly, plane);
	poly = dropDuplicateVertices(poly);
	if (poly.length < 3)
		throw new GlyphError(
			`segment ${what} vanishes: the character is too small for its stroke and gap`
		);
	return poly.map((p) => ({ x: p.x, y: p.y }));
}

/** A stadium around the segment c1→c2 with radius `half`. */
export function stadiumContour(options: { c1: XY; c2: XY; half: number }): Contour {
	const { c1, c2, half } = options;
	const n = perpendicular(normalize(sub(c2, c1)));
	return pathFrom(add(c1, scale(n, half)))
		.lineTo(add(c2, scale(n, half)))
		.arcAround(c2, -180)
		.lineTo(add(c1, scale(n, -half)))
		.arcAround(c1, -180)
		.close();
}

export function barContour(options: {
	key: string;
	style: SegmentStyle;
	from: BarEndContext;
	to: BarEndContext;
}): Contour {
	const { from, to, style } = options;
	if (style === 'round') {
		const c1 = add(from.joint, scale(from.u, roundCapOffset(from)));
		const c2 = add(to.joint, scale(to.u, roundCapOffset(to)));
		const length = distance(from.joint, to.joint);
		if (distance(from.joint, c1) + distance(to.joint, c2) >= length) {
			throw new GlyphError(
				`segment ${options.key} vanishes: the character is too small for its stroke and gap`
			);
		}
		return stadiumContour({ c1, c2, half: from.half });
	}
	const strip = stripPolygon({
		p: from.joint,
		q: to.joint,
		half: from.half,
		margin: 4 * (from.half + from.gap)
	});
	const planes = [...endHalfPlanes(style, from), ...endHalfPlanes(style, to)];
	if (style !== 'chamfered') return clippedContour(strip, planes, options.key);
	const pointed = clippedContour(strip, planes, options.key);
	return clippedContour(
		pointed,
		[chamferPlane(from, pointed), chamferPlane(to, pointed)],
		options.key
	);
}
