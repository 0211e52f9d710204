import { describe, expect, it } from 'vitest';
import {
	distancePointToSegment,
	distanceSegmentToSegment,
	nearestPointOnContour
} from '../../src/lib/core/geometry/distance';
import { flattenContour } from '../../src/lib/core/geometry/flatten';
import { minimumGap } from '../../src/lib/core/geometry/minimum-gap';
import { pointInShape, shapeArea, signedArea } from '../../src/lib/core/geometry/polygon';
import {
	ellipseContour,
	rectangleContour,
	regularPolygonContour,
	roundedRectangleContour,
	penPathContour
} from '../../src/lib/core/geometry/primitive-shapes';
import {
	clipConvexPolygon,
	halfPlaneThrough,
	intersectLines
} from '../../src/lib/core/geometry/half-plane';

const rect = (x: number, y: number, w: number, h: number) =>
	rectangleContour({ x_mm: x, y_mm: y, width_mm: w, height_mm: h });

describe('area and containment', () => {
	it('signed area is positive for clockwise-on-screen rings', () => {
		const ring = flattenContour(rect(0, 0, 3, 2));
		expect(signedArea(ring)).toBe(6);
		const reversed = Float64Array.from([0, 0, 0, 2, 3, 2, 3, 0]);
		expect(signedArea(reversed)).toBe(-6);
	});

	it('areas of primitives match their formulas (cubic circle: +0.027 % at most)', () => {
		const r = 5;
		const circle = shapeArea(
			{ outline: ellipseContour({ cx_mm: 0, cy_mm: 0, rx_mm: r, ry_mm: r }), holes: [] },
			{ tolerance_um: 0.01 }
		);
		expect(Math.abs(circle / (Math.PI * r * r) - 1)).toBeLessThan(3e-4);
		const rr = shapeArea(
			{
				outline: roundedRectangleContour({
					x_mm: 0,
					y_mm: 0,
					width_mm: 10,
					height_mm: 6,
					radius_mm: 1
				}),
				holes: []
			},
			{ tolerance_um: 0.01 }
		);
		expect(Math.abs(rr - (60 - (4 - Math.PI)))).toBeLessThan(1e-3);
		const hexagon = shapeArea({
			outline: regularPolygonContour({ cx_mm: 0, cy_mm: 0, radius_mm: 2, sides: 6 }),
			holes: []
		});
		expect(hexagon).toBeCloseTo(((3 * Math.sqrt(3)) / 2) * 4, 12);
		expect(shapeArea({ outline: rect(0, 0, 4, 4), holes: [rect(1, 1, 1, 1)] })).toBe(15);
	});

	it('primitive constructors validate and clean their input', () => {
		expect(() => rectangleContour({ x_mm: 0, y_mm: 0, width_mm: 0, height_mm: 1 })).toThrow();
		expect(
			roundedRectangleContour({ x_mm: 0, y_mm: 0, width_mm: 2, height_mm: 2, radius_mm: 0 })
		).toHaveLength(4);
		expect(
			roundedRectangleContour({ x_mm: 0, y_mm: 0, width_mm: 4, height_mm: 2, radius_mm: 5 })
		).toHaveLength(6);
		expect(() => regularPolygonContour({ cx_mm: 0, cy_mm: 0, radius_mm: 1, sides: 2 })).toThrow(
			/3 sides/
		);
		expect(regularPolygonContour({ cx_mm: 0, cy_mm: 0, radius_mm: 1, sides: 4 })[0]).toEqual({
			x: expect.closeTo(0, 15),
			y: -1
		});
		expect(
			penPathContour([
				{ x: 0, y: 0, out: [0, 0] },
				{ x: 1, y: 0, in: [-0.5, 0] },
				{ x: 1, y: 1 }
			])
		).toEqual([
			{ x: 0, y: 0 },
			{ x: 1, y: 0, in: [-0.5, 0] },
			{ x: 1, y: 1 }
		]);
		expect(() =>
			penPathContour([
				{ x: 0, y: 0 },
				{ x: 1, y: 0 }
			])
		).toThrow(/3 points/);
	});

	it('point in shape uses even-odd: a hole is outside', () => {
		const shape = { outline: rect(0, 0, 10, 10), holes: [rect(4, 4, 2, 2)] };
		expect(pointInShape(shape, { x: 1, y: 1 })).toBe(true);
		expect(pointInShape(shape, { x: 5, y: 5 })).toBe(false);
		expect(pointInShape(shape, { x: 11, y: 5 })).toBe(false);
	});
});

describe('distances', () => {
	it('point to segment, segment to segment, and crossing segments', () => {
		expect(distancePointToSegment({ x: 1, y: 1 }, { a: { x: 0, y: 0 }, b: { x: 2, y: 0 } })).toBe(
			1
		);
		expect(distancePointToSegment({ x: 5, y: 4 }, { a: { x: 0, y: 0 }, b: { x: 2, y: 0 } })).toBe(
			5
		);
		expect(
			distanceSegmentToSegment(
				{ a: { x: 0, y: 0 }, b: { x: 2, y: 2 } },
				{ a: { x: 0, y: 2 }, b: { x: 2, y: 0 } }
			)
		).toBe(0);
		expect(
			distanceSegmentToSegment(
				{ a: { x: 0, y: 0 }, b: { x: 1, y: 0 } },
				{ a: { x: 3, y: 0 }, b: { x: 3, y: 5 } }
			)
		).toBe(2);
	});

	it('nearest point on a Bezier contour lands on the curve', () => {
		const circle = ellipseContour({ cx_mm: 0, cy_mm: 0, rx_mm: 2, ry_mm: 2 });
		const hit = nearestPointOnContour(circle, { x: 3, y: 3 });
		expect(hit.distance_mm).toBeCloseTo(Math.hypot(3, 3) - 2, 3);
		expect(hit.x).toBeCloseTo(hit.y, 9);
		const square = nearestPointOnContour(rect(0, 0, 2, 2), { x: 1, y: -1 });
		expect(square).toMatchObject({
			x: expect.closeTo(1, 9),
			y: expect.closeTo(0, 12),
			edgeIndex: 0,
			distance_mm: expect.closeTo(1, 9)
		});
	});

	it('minimum gap between bars whose long edges continue one another, at any slant', () => {
		// Two bars one behind the other along a slanted axis, their long edges on the same lines
		// (as the upper and lower right bars of a slanted character): the gap is the spacing g
		// between the facing ends, exactly, by construction (plane geometry). Collinear edges
		// must never read as crossing however the rounding falls.
		const g = 0.03;
		// Each coordinate carries rounding-sized noise (a few units in the last place), as computed
		// outlines do; the seed is fixed only so that a failure replays.
		let state = 12345;
		const noise = (v: number) => {
			state = (state * 1103515245 + 12345) % 2 ** 31;
			return v * (1 + ((state / 2 ** 31) * 2 - 1) * 4e-16);
		};
		const bar = (from: number, to: number, angle_rad: number) => {
			const ux = Math.cos(angle_rad);
			const uy = Math.sin(angle_rad);
			const at = (s: number, t: number) => ({
				x: noise(3 + s * ux - t * uy),
				y: noise(-2 + s * uy + t * ux)
			});
			return { outline: [at(from, 0), at(to, 0), at(to, 1.3), at(from, 1.3)], holes: [] };
		};
		let worst = 0;
		for (let k = 0; k <= 4000; k++) {
			const angle_rad = ((50 + (80 * k) / 4000) * Math.PI) / 180;
			const lower = bar(0, 11.3, angle_rad);
			const upper = bar(11.3 + g, 22.6, angle_rad);
			const gap = minimumGap(lower, upper);
			// The two long edges on one line: their distance is the same spacing g.
			const edges = distanceSegmentToSegment(
				{ a: lower.outline[0], b: lower.outline[1] },
				{ a: upper.outline[0], b: upper.outline[1] }
			);
			worst = Math.max(worst, Math.abs(gap - g), Math.abs(edges - g));
		}
		expect(worst).toBeLessThan(1e-9);
	});

	it('minimum gap between shapes: 0 when touching, inside, or overlapping; distance otherwise', () => {
		const a = { outline: rect(0, 0, 2, 2), holes: [] };
		expect(minimumGap(a, { outline: rect(2.5, 0, 1, 1), holes: [] })).toBeCloseTo(0.5, 15);
		expect(minimumGap(a, { outline: rect(1, 1, 2, 2), holes: [] })).toBe(0);
		expect(minimumGap(a, { outline: rect(0.5, 0.5, 0.5, 0.5), holes: [] })).toBe(0);
		const framed = { outline: rect(0, 0, 10, 10), holes: [rect(2, 2, 6, 6)] };
		expect(minimumGap(framed, { outline: rect(3, 3, 1, 1), holes: [] })).toBeCloseTo(1, 15);
		expect(minimumGap(a, { outline: rect(5, 6, 1, 1), holes: [] })).toBeCloseTo(5, 15);
	});

	it('clips convex polygons by half-planes and intersects lines', () => {
		const square = [
			{ x: 0, y: 0 },
			{ x: 2, y: 0 },
			{ x: 2, y: 2 },
			{ x: 0, y: 2 }
		];
		const half = clipConvexPolygon(
			square,
			halfPlaneThrough({ point: { x: 1, y: 0 }, normal: { x: 1, y: 0 } })
		);
		expect(half).toEqual([
			{ x: 1, y: 0 },
			{ x: 2, y: 0 },
			{ x: 2, y: 2 },
			{ x: 1, y: 2 }
		]);
		expect(
			intersectLines({
				p: { x: 0, y: 0 },
				u: { x: 1, y: 1 },
				q: { x: 2, y: 0 },
				v: { x: -1, y: 1 }
			})
		).toEqual({ x: 1, y: 1 });
		expect(
			intersectLines({ p: { x: 0, y: 0 }, u: { x: 1, y: 0 }, q: { x: 0, y: 1 }, v: { x: 2, y: 0 } })
		).toBeNull();
	});
});
