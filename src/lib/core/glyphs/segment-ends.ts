/**
 * How a bar ends at a joint, per style, so that every pair of neighbouring segments is exactly
 * `gap` apart and no two overlap.
 *
 * pointed   — the end is the wedge between the two angle bisectors of this bar's axis and each
 *             crossing axis at the joint; every bisector face is pulled back gap/2, so facing
 *             segments are separated by parallel faces exactly gap apart (a mitre joint).
 * chamfered — the pointed wedge with its tip cut flat halfway between the tip and the first strip
 *             corner, so each face keeps the part facing its neighbour (the gap stays exact).
 * square    — flat ends. At a corner the vertical bar covers the joint; at a T the stem covers it;
 *             the other bars stop `gap` short of the covering bar's edge.
 * round     — semicircular caps; the cap centre sits t from the joint with t chosen so that caps of
 *             crossing bars are exactly gap apart: horizontal bars use t = D/√2 (D = gap + stroke)
 *             and a leaning bar solves |t_h·u_h − t·u| = D, i.e. t = t_h·cosθ + √(D² − t_h²·sin²θ).
 *
 * A "stem" end meets the side of a bar that runs through the joint (the 14-segment top and
 * bottom): it stops `gap` from that bar's edge, pointed, chamfered or flat by style.
 */
import { halfPlaneThrough, type HalfPlane } from '../geometry/half-plane';
import { add, cross, dot, normalize, perpendicular, scale, sub, type XY } from '../geometry/vec';

export interface BarEndContext {
	readonly joint: XY;
	/** Unit direction from the joint along this bar. */
	readonly u: XY;
	readonly half: number;
	readonly gap: number;
	readonly vertical: boolean;
	/** The frame axis crossing this bar (used for free ends). */
	readonly crossAxis: XY;
	/** Other bars ending at this joint, with their unit directions away from it. */
	readonly neighbours: readonly {
		readonly u: XY;
		readonly vertical: boolean;
		readonly hasPartner: boolean;
	}[];
	/** The edge of a bar that runs through the joint: a point on it, its direction, and its normal toward this bar. */
	readonly stem?: { readonly edgePoint: XY; readonly edgeDir: XY; readonly normal: XY };
}

const PARALLEL = 1e-9;
const towards = (n: XY, u: XY) => (dot(n, u) >= 0 ? n : scale(n, -1));

/** Distinct crossing axes at the joint (collinear neighbours excluded; a free end uses the frame). */
function crossingAxes(ctx: BarEndContext): XY[] {
	const axes: XY[] = [];
	for (const nb of ctx.neighbours) {
		if (Math.abs(cross(nb.u, ctx.u)) < PARALLEL) continue;
		if (!axes.some((a) => Math.abs(cross(a, nb.u)) < PARALLEL)) axes.push(nb.u);
	}
	return axes.length > 0 || ctx.neighbours.length > 0 ? axes : [ctx.crossAxis];
}

/** The two bisector half-planes between this bar's axis and the axis `w`, through `at`, pulled back `shift`. */
function bisectorPlanes(ctx: BarEndContext, w: XY, at: XY, shift: number): HalfPlane[] {
	return [add(ctx.u, w), sub(ctx.u, w)].map((b) =>
		halfPlaneThrough({
			point: at,
			normal: towards(perpendicular(normalize(b)), ctx.u),
			shift_mm: shift
		})
	);
}

/** Distance along the axis from the joint to the point `gap + extra` from the stem edge. */
function stemDistance(ctx: BarEndContext, extra: number): number {
	const s = ctx.stem!;
	return (ctx.gap + extra - dot(sub(ctx.joint, s.edgePoint), s.normal)) / dot(ctx.u, s.normal);
}

function pointedPlanes(ctx: BarEndContext): { planes: HalfPlane[]; tipAlong: number } {
	if (ctx.stem) {
		const along = stemDistance(ctx, 0);
		const tip = add(ctx.joint, scale(ctx.u, along));
		return { planes: bisectorPlanes(ctx, ctx.stem.edgeDir, tip, 0), tipAlong: along };
	}
	const planes = crossingAxes(ctx).flatMap((w) => bisectorPlanes(ctx, w, ctx.joint, ctx.gap / 2));
	if (planes.length === 0)
		return {
			planes: [halfPlaneThrough({ point: ctx.joint, normal: ctx.u, shift_mm: ctx.gap / 2 })],
			tipAlong: ctx.gap / 2
		};
	// Where the axis leaves the last face: the axis point of the (slightly off-axis) tip region.
	const tipAlong = Math.max(
		...planes.map((p) => (p.offset - dot(p.normal, ctx.joint)) / dot(p.normal, ctx.u))
	);
	return { planes, tipAlong };
}

function squarePlanes(ctx: BarEndContext): HalfPlane[] {
	if (ctx.stem)
		return [
			halfPlaneThrough({ point: ctx.stem.edgePoint, normal: ctx.stem.normal, shift_mm: ctx.gap })
		];
	const crossing = ctx.neighbours.filter((nb) => Math.abs(cross(nb.u, ctx.u)) >= PARALLEL);
	if (crossing.length === 0) {
		const collinear = ctx.neighbours.length > 0;
		return [
			halfPlaneThrough({ point: ctx.joint, normal: ctx.u, shift_mm: collinear ? ctx.gap / 2 : 0 })
		];
	}
	const hasPartner = ctx.neighbours.some((nb) => Math.abs(cross(nb.u, ctx.u)) < PARALLEL);
	const covers = !hasPartner && (ctx.vertical || crossing.some((nb) => nb.hasPartner));
	return crossing.map((nb) => {
		const normal = towards(perpendicular(nb.u), ctx.u);
		return halfPlaneThrough({
			point: ctx.joint,
			normal,
			shift_mm: covers ? -ctx.half : ctx.half + ctx.gap
		});
	});
}

/** Depth of the chamfer of the diagonals, relative to half the stroke. */
export const CHAMFER_DEPTH_OF_HALF_STROKE = 0.5;

/** Half-planes that cut a bar's end for the polygon styles (chamfers are added by `chamferPlane`). */
export function endHalfPlanes(
	style: 'pointed' | 'chamfered' | 'square',
	ctx: BarEndContext
): HalfPlane[] {
	return style === 'square' ? squarePlanes(ctx) : pointedPlanes(ctx).planes;
}

/**
 * The flat cut of a chamfered end, from the pointed bar already clipped: halfway between the bar's
 * front (its vertex nearest the joint along the axis) and its first corner on a strip edge, so
 * the mitre face toward each neighbour keeps its part next to the inner corner.
 */
export function chamferPlane(ctx: BarEndContext, pointedBar: readonly XY[]): HalfPlane {
	const n = perpendicular(ctx.u);
	const along = pointedBar.map((v) => dot(sub(v, ctx.joint), ctx.u));
	const middle = (Math.min(...along) + Math.max(...along)) / 2;
	const near = pointedBar.filter((_, i) => along[i] < middle);
	const front = Math.min(...near.map((v) => dot(sub(v, ctx.joint), ctx.u)));
	const onEdge = near.filter(
		(v) => Math.abs(Math.abs(dot(sub(v, ctx.joint), n)) - ctx.half) < 1e-9 * (1 + ctx.half)
	);
	const corner = Math.min(...onEdge.map((v) => dot(sub(v, ctx.joint), ctx.u)));
	return halfPlaneThrough({
		point: add(ctx.joint, scale(ctx.u, front + 0.5 * (corner - front))),
		normal: ctx.u
	});
}

/** Distance from the joint to the centre of a round cap. */
export function roundCapOffset(ctx: BarEndContext): number {
	const D = ctx.gap + 2 * ctx.half;
	if (ctx.stem) return stemDistance(ctx, ctx.half);
	const crossing = ctx.neighbours.filter((nb) => Math.abs(cross(nb.u, ctx.u)) >= PARALLEL);
	if (crossing.length === 0) return ctx.neighbours.length > 0 ? D / 2 : 0;
	const tH = D / Math.SQRT2;
	if (!ctx.vertical) return tH;
	return Math.max(
		...crossing.map((nb) => {
			const c = dot(nb.u, ctx.u);
			const s2 = 1 - c * c;
			return tH * c + Math.sqrt(D * D - tH * tH * s2);
		})
	);
}
