/**
 * Diagonal segments of 14- and 16-segment characters. Each diagonal lives in one of the four cells
 * between the bars: the cell is bounded by the inner edges of the surrounding bars moved inward by
 * the gap, so a diagonal kept inside its cell clears every bar by at least the gap (and touches
 * that clearance where it runs into the cell's corners). The diagonal runs corner to corner of its
 * cell; polygon styles are the strip clipped by the cell, the round style a stadium whose caps
 * just fit the corners (cap centre t = r / min sin α from the corner, α the angle to each side).
 */
import type { Contour } from '../design/schema';
import { halfPlaneThrough, intersectLines, type HalfPlane } from '../geometry/half-plane';
import {
	add,
	cross,
	distance,
	dot,
	normalize,
	perpendicular,
	scale,
	sub,
	type XY
} from '../geometry/vec';
import { clippedContour, stadiumContour, stripPolygon } from './segment-bar';
import { CHAMFER_DEPTH_OF_HALF_STROKE } from './segment-ends';
import type { AxisLine, Column, Row, SegmentFrame } from './segment-frame';
import { GlyphError } from './glyph-types';

interface CellSide {
	readonly line: AxisLine;
	readonly inward: XY;
}

function side(frame: SegmentFrame, axis: AxisLine, toward: XY): CellSide {
	let inward = perpendicular(axis.dir);
	if (dot(inward, toward) < 0) inward = scale(inward, -1);
	return {
		line: { point: add(axis.point, scale(inward, frame.half + frame.gap)), dir: axis.dir },
		inward
	};
}

const meet = (a: CellSide, b: CellSide): XY =>
	intersectLines({ p: a.line.point, u: a.line.dir, q: b.line.point, v: b.line.dir })!;

export interface DiagonalDef {
	readonly key: string;
	readonly columns: readonly [Column, Column];
	readonly rows: readonly [Row, Row];
	/** Which cell corners the diagonal joins: from top-left to bottom-right, or top-right to bottom-left. */
	readonly slope: 'falling' | 'rising';
}

export function diagonalContour(frame: SegmentFrame, def: DiagonalDef): Contour {
	const [c0, c1] = def.columns;
	const [r0, r1] = def.rows;
	const right = { x: 1, y: 0 };
	const downY = { x: 0, y: 1 };
	const left = side(frame, frame.columns[c0], right);
	const rightSide = side(frame, frame.columns[c1], scale(right, -1));
	const top = side(frame, frame.rows[r0], downY);
	const bottom = side(frame, frame.rows[r1], scale(downY, -1));
	const sides = [left, rightSide, top, bottom];
	const [p, q, pSides, qSides] =
		def.slope === 'falling'
			? [meet(top, left), meet(bottom, rightSide), [top, left], [bottom, rightSide]]
			: [meet(top, rightSide), meet(bottom, left), [top, rightSide], [bottom, left]];
	const length = distance(p, q);
	if (!(length > 4 * frame.half))
		throw new GlyphError(`diagonal ${def.key} has no room: widen the character or thin its stroke`);
	const u = normalize(sub(q, p));
	if (frame.params.style === 'round') {
		const capOffset = (at: CellSide[]) =>
			frame.half / Math.min(...at.map((s) => Math.abs(cross(u, s.line.dir))));
		const t0 = capOffset(pSides);
		const t1 = capOffset(qSides);
		if (t0 + t1 >= length)
			throw new GlyphError(
				`diagonal ${def.key} has no room: widen the character or thin its stroke`
			);
		return stadiumContour({ c1: add(p, scale(u, t0)), c2: sub(q, scale(u, t1)), half: frame.half });
	}
	const planes: HalfPlane[] = sides.map((s) =>
		halfPlaneThrough({ point: s.line.point, normal: s.inward })
	);
	if (frame.params.style === 'chamfered') {
		const depth = CHAMFER_DEPTH_OF_HALF_STROKE * frame.half;
		planes.push(halfPlaneThrough({ point: add(p, scale(u, depth)), normal: u }));
		planes.push(halfPlaneThrough({ point: sub(q, scale(u, depth)), normal: scale(u, -1) }));
	}
	return clippedContour(
		stripPolygon({ p, q, half: frame.half, margin: frame.half }),
		planes,
		def.key
	);
}
