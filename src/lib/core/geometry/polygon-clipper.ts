/**
 * Robust polygon booleans and offsets on an integer grid: the only file of the core that imports
 * the Clipper library (Vatti's clipping algorithm, B. Vatti, Comm. ACM 35(7), 1992; offsetting by
 * the Clipper port `clipper-lib` 6.4, integer coordinates, exact predicates).
 *
 * Conventions
 * - A region is a list of rings in millimetres, each a flat Float64Array [x0, y0, x1, y1, …]
 *   (closed implicitly), in glass coordinates (x right, y down). Input regions are read with the
 *   even-odd rule unless `fill: 'non-zero'` is given, matching how the design fills its outlines.
 * - Curves are flattened first (`flatten.ts`) at `tolerance_um` ≤ 1 µm (default 0.5 µm).
 * - Coordinates are snapped to a grid of 10 nm: `CLIP_UNITS_PER_mm` = 1e5 integer units per mm.
 *   Below ±474 mm the library's fast 53-bit path is exact; beyond it it switches to 128-bit maths.
 * - Every result is clean: outer rings have positive signed area (shoelace ½Σ(xᵢyᵢ₊₁ − xᵢ₊₁yᵢ)),
 *   holes negative, no two rings cross, so its area is the plain sum of signed ring areas.
 */
import ClipperLib from 'clipper-lib';
import { flattenShape } from './flatten';
import { signedArea } from './polygon';
import type { Shape } from './shape';

export const CLIP_UNITS_PER_mm = 1e5;
export const CLIP_FLATTEN_TOLERANCE_um = 0.5;
/** Largest deviation of a round join from the true arc, in µm. */
export const DEFAULT_ARC_TOLERANCE_um = 0.5;
/** A miter longer than this many offset distances is squared off. */
export const DEFAULT_MITER_LIMIT = 2;

export type Region = readonly Float64Array[];
export type FillRule = 'even-odd' | 'non-zero';
export type JoinKind = 'round' | 'miter' | 'square';

type IntPath = ClipperLib.IntPoint[];

const FILL = {
	'even-odd': ClipperLib.PolyFillType.pftEvenOdd,
	'non-zero': ClipperLib.PolyFillType.pftNonZero
} as const;

const JOIN = {
	round: ClipperLib.JoinType.jtRound,
	miter: ClipperLib.JoinType.jtMiter,
	square: ClipperLib.JoinType.jtSquare
} as const;

/** Millimetre rings → integer paths on the 10 nm grid (consecutive duplicates dropped). */
export function regionToIntPaths(region: Region): IntPath[] {
	return region.map((ring) => {
		const path: IntPath = [];
		for (let i = 0; i + 1 < ring.length; i += 2) {
			const X = Math.round(ring[i] * CLIP_UNITS_PER_mm);
			const Y = Math.round(ring[i + 1] * CLIP_UNITS_PER_mm);
			const last = path[path.length - 1];
			if (!last || last.X !== X || last.Y !== Y) path.push({ X, Y });
		}
		if (path.length > 1 && path[0].X === path[path.length - 1].X) {
			if (path[0].Y === path[path.length - 1].Y) path.pop();
		}
		return path;
	});
}

export function intPathsToRegion(paths: readonly IntPath[]): Float64Array[] {
	return paths
		.filter((p) => p.length >= 3)
		.map((p) => {
			const ring = new Float64Array(p.length * 2);
			p.forEach((pt, i) => {
				ring[2 * i] = pt.X / CLIP_UNITS_PER_mm;
				ring[2 * i + 1] = pt.Y / CLIP_UNITS_PER_mm;
			});
			return ring;
		});
}

/** A shape (outline and holes, curves included) as a region flattened at `tolerance_um`. */
export function shapeToRegion(shape: Shape, options: { tolerance_um?: number } = {}): Region {
	const tolerance_um = options.tolerance_um ?? CLIP_FLATTEN_TOLERANCE_um;
	if (!(tolerance_um > 0 && tolerance_um <= 1)) {
		throw new RangeError(`tolerance_um must be in (0, 1] µm, got ${tolerance_um}`);
	}
	return flattenShape(shape, { tolerance_um });
}

function clip(options: {
	type: ClipperLib.ClipType;
	subject: Region;
	clip: Region;
	fill: FillRule;
}): Float64Array[] {
	const clipper = new ClipperLib.Clipper();
	clipper.AddPaths(regionToIntPaths(options.subject), ClipperLib.PolyType.ptSubject, true);
	clipper.AddPaths(regionToIntPaths(options.clip), ClipperLib.PolyType.ptClip, true);
	const solution: IntPath[] = [];
	clipper.Execute(options.type, solution, FILL[options.fill], FILL[options.fill]);
	return intPathsToRegion(solution);
}

/** Everything covered by any of the regions (each read with `fill`). */
export function unionRegions(regions: readonly Region[], options: { fill?: FillRule } = {}) {
	const fill = options.fill ?? 'even-odd';
	// Each input is cleaned on its own first, so the even-odd rule never cancels an overlap between
	// two different regions; the clean pieces are then merged with the non-zero rule.
	const clean = regions.flatMap((r) =>
		clip({ type: ClipperLib.ClipType.ctUnion, subject: r, clip: [], fill })
	);
	return clip({ type: ClipperLib.ClipType.ctUnion, subject: clean, clip: [], fill: 'non-zero' });
}

/** The region read with `fill`, as clean rings (outer positive, holes negative). */
export const normalizeRegion = (region: Region, options: { fill?: FillRule } = {}) =>
	clip({
		type: ClipperLib.ClipType.ctUnion,
		subject: region,
		clip: [],
		fill: options.fill ?? 'even-odd'
	});

export const intersectRegions = (a: Region, b: Region, options: { fill?: FillRule } = {}) =>
	clip({
		type: ClipperLib.ClipType.ctIntersection,
		subject: a,
		clip: b,
		fill: options.fill ?? 'even-odd'
	});

export const subtractRegions = (a: Region, b: Region, options: { fill?: FillRule } = {}) =>
	clip({
		type: ClipperLib.ClipType.ctDifference,
		subject: a,
		clip: b,
		fill: options.fill ?? 'even-odd'
	});

/**
 * Grows (delta_mm > 0) or shrinks (delta_mm < 0) a region by a distance along its normals. Round
 * joins follow the arc within `arcTolerance_um`; miter joins are cut at `miterLimit` × |delta|.
 */
export function offsetRegion(
	region: Region,
	options: {
		delta_mm: number;
		join?: JoinKind;
		miterLimit?: number;
		arcTolerance_um?: number;
		fill?: FillRule;
		/** The rings are already clean (outer positive, holes negative, none crossing): skip the clean-up. */
		clean?: boolean;
	}
): Float64Array[] {
	if (!Number.isFinite(options.delta_mm)) {
		throw new RangeError(`delta_mm must be a finite distance, got ${options.delta_mm}`);
	}
	const arcTolerance_um = options.arcTolerance_um ?? DEFAULT_ARC_TOLERANCE_um;
	if (!(arcTolerance_um > 0)) throw new RangeError('arcTolerance_um must be above 0');
	const clean = options.clean ? region : normalizeRegion(region, { fill: options.fill });
	const offset = new ClipperLib.ClipperOffset(
		options.miterLimit ?? DEFAULT_MITER_LIMIT,
		(arcTolerance_um / 1000) * CLIP_UNITS_PER_mm
	);
	offset.AddPaths(
		regionToIntPaths(clean),
		JOIN[options.join ?? 'round'],
		ClipperLib.EndType.etClosedPolygon
	);
	const solution: IntPath[] = [];
	offset.Execute(solution, options.delta_mm * CLIP_UNITS_PER_mm);
	return intPathsToRegion(solution);
}

/** Filled area in mm² of a region read with `fill` (holes and overlaps counted correctly). */
export function regionArea_mm2(region: Region, options: { fill?: FillRule } = {}): number {
	const clean = regionToIntPaths(normalizeRegion(region, options));
	let sum = 0;
	for (const path of clean) sum += ClipperLib.Clipper.Area(path);
	return sum / (CLIP_UNITS_PER_mm * CLIP_UNITS_PER_mm);
}

/**
 * A region split into islands: each outer ring with the holes directly inside it. A region known
 * to be clean (`clean: true`, e.g. a boolean's result) with no hole is returned ring by ring.
 */
export function regionToPolygons(
	region: Region,
	options: { fill?: FillRule; clean?: boolean } = {}
): { outer: Float64Array; holes: Float64Array[] }[] {
	if (options.clean && region.every((r) => signedArea(r) > 0))
		return region.map((outer) => ({ outer, holes: [] }));
	const clipper = new ClipperLib.Clipper();
	clipper.AddPaths(regionToIntPaths(region), ClipperLib.PolyType.ptSubject, true);
	const tree = new ClipperLib.PolyTree();
	const fill = FILL[options.fill ?? 'even-odd'];
	clipper.Execute(ClipperLib.ClipType.ctUnion, tree, fill, fill);
	return ClipperLib.JS.PolyTreeToExPolygons(tree).map((p) => ({
		outer: intPathsToRegion([p.outer])[0],
		holes: intPathsToRegion(p.holes)
	}));
}

/** Islands as design shapes (straight-edged contours in mm), e.g. for drawing back plates. */
export function regionToShapes(region: Region, options: { fill?: FillRule } = {}): Shape[] {
	const contour = (ring: Float64Array) =>
		Array.from({ length: ring.length / 2 }, (_, i) => ({ x: ring[2 * i], y: ring[2 * i + 1] }));
	return regionToPolygons(region, options).map((p) => ({
		outline: contour(p.outer),
		holes: p.holes.map(contour)
	}));
}
