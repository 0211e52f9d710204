import polygonClipping, { type MultiPolygon, type Polygon } from 'polygon-clipping';
import { describe, expect, it } from 'vitest';
import {
	intersectRegions,
	normalizeRegion,
	offsetRegion,
	regionArea_mm2,
	regionToPolygons,
	regionToShapes,
	shapeToRegion,
	subtractRegions,
	unionRegions
} from '../../src/lib/core/geometry/polygon-clipper';
import { ringSelfCrossings } from '../../src/lib/core/geometry/ring-crossings';
import { ellipseContour, rectangleContour } from '../../src/lib/core/geometry/primitive-shapes';
import { expectWithin, type ReferenceCase } from '../helpers/tolerance';

const ring = (...xy: number[]) => Float64Array.from(xy);
const square = (x: number, y: number, s: number) => ring(x, y, x + s, y, x + s, y + s, x, y + s);

/** Deterministic pseudo-random numbers in [0, 1) (mulberry32). */
function random(seed: number) {
	let a = seed >>> 0;
	return () => {
		a = (a + 0x6d2b79f5) >>> 0;
		let t = a;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

/** A simple star-shaped polygon: random radii at increasing angles around a centre. */
function starPolygon(next: () => number, cx: number, cy: number): Float64Array {
	const n = 5 + Math.floor(next() * 20);
	const out: number[] = [];
	for (let i = 0; i < n; i++) {
		const angle = ((i + 0.2 + 0.6 * next()) / n) * 2 * Math.PI;
		const r = 1 + 9 * next();
		out.push(cx + r * Math.cos(angle), cy + r * Math.sin(angle));
	}
	return Float64Array.from(out);
}

const toPc = (r: Float64Array): Polygon => [
	Array.from({ length: r.length / 2 }, (_, i) => [r[2 * i], r[2 * i + 1]] as [number, number])
];
const ringArea = (r: [number, number][]) =>
	r.reduce(
		(s, p, i) => s + (p[0] * r[(i + 1) % r.length][1] - r[(i + 1) % r.length][0] * p[1]),
		0
	) / 2;
const pcArea = (m: MultiPolygon) =>
	m.reduce(
		(s, poly) =>
			s +
			Math.abs(ringArea(poly[0])) -
			poly.slice(1).reduce((h, r) => h + Math.abs(ringArea(r)), 0),
		0
	);

describe('integer polygon kernel', () => {
	it('matches an independent polygon library on random booleans (polygon-clipping 0.15, 60 pairs)', () => {
		const next = random(7);
		const cases: ReferenceCase[] = [];
		for (let k = 0; k < 60; k++) {
			const a = starPolygon(next, 10 * next(), 10 * next());
			const b = starPolygon(next, 10 * next(), 10 * next());
			const pa = toPc(a);
			const pb = toPc(b);
			cases.push(
				{ label: `${k} A`, expected: pcArea([pa]), actual: regionArea_mm2([a]) },
				{
					label: `${k} A∪B`,
					expected: pcArea(polygonClipping.union(pa, pb)),
					actual: regionArea_mm2(unionRegions([[a], [b]]))
				},
				{
					label: `${k} A∩B`,
					expected: pcArea(polygonClipping.intersection(pa, pb)),
					actual: regionArea_mm2(intersectRegions([a], [b]))
				},
				{
					label: `${k} A−B`,
					expected: pcArea(polygonClipping.difference(pa, pb)),
					actual: regionArea_mm2(subtractRegions([a], [b]))
				}
			);
		}
		// Each new crossing vertex snaps to the 10 nm grid (≤ 7.1 nm), moving the area by ≤ ½·7.1e-6 mm ×
		// its two edges (≤ 20 mm each here): a few such vertices bound the error near 5e-4 mm², i.e.
		// about 2e-6 of these 20–300 mm² areas.
		expectWithin(cases, {
			tolerance: 5e-4,
			unit: 'mm²',
			source: 'polygon-clipping 0.15 (npm), random star polygons'
		});
	});

	it('offsets a convex polygon by Steiner’s formula A + P·d + π·d² (round) and miter squares exactly', () => {
		// Steiner's formula for the parallel body of a convex set (J. Steiner, 1840; any convex
		// geometry text, e.g. Schneider, "Convex Bodies", 2nd ed., 2014, §4.1).
		const s = 4;
		const cases: ReferenceCase[] = [];
		for (const d of [0.05, 0.3, 1]) {
			cases.push({
				label: `round +${d}`,
				expected: s * s + 4 * s * d + Math.PI * d * d,
				actual: regionArea_mm2(
					offsetRegion([square(0, 0, s)], { delta_mm: d, join: 'round', arcTolerance_um: 0.05 })
				)
			});
			cases.push({
				label: `miter +${d}`,
				expected: (s + 2 * d) ** 2,
				actual: regionArea_mm2(offsetRegion([square(0, 0, s)], { delta_mm: d, join: 'miter' }))
			});
			cases.push({
				label: `shrink −${d}`,
				expected: (s - 2 * d) ** 2,
				actual: regionArea_mm2(offsetRegion([square(0, 0, s)], { delta_mm: -d, join: 'miter' }))
			});
		}
		// Round corners are polygons whose chords lie within arcTolerance (5e-5 mm) of the arc, so
		// their area falls short by at most arcTolerance × arc length (2π·1 mm) ≈ 3.1e-4 mm².
		expectWithin(cases, {
			tolerance: 4e-4,
			unit: 'mm²',
			source: 'Steiner formula (convex geometry)'
		});
	});

	it('shrinks a 0.04 mm bar to nothing at half of 0.05 mm and keeps a 0.06 mm one', () => {
		expect(offsetRegion([ring(0, 0, 5, 0, 5, 0.04, 0, 0.04)], { delta_mm: -0.025 })).toHaveLength(
			0
		);
		expect(offsetRegion([ring(0, 0, 5, 0, 5, 0.06, 0, 0.06)], { delta_mm: -0.025 })).toHaveLength(
			1
		);
	});

	it('counts holes and overlapping outlines as the even-odd rule fills them', () => {
		const frame = [square(0, 0, 10), square(2, 2, 6)];
		expect(regionArea_mm2(frame)).toBeCloseTo(64, 9);
		const polys = regionToPolygons(frame);
		expect(polys).toHaveLength(1);
		expect(polys[0].holes).toHaveLength(1);
		expect(regionToShapes(frame)[0].holes).toHaveLength(1);
		// A clean region (a boolean's result) splits the same way, with or without holes.
		const clean = normalizeRegion(frame);
		const fast = regionToPolygons(clean, { clean: true });
		expect(fast.map((p) => p.holes.length)).toEqual([1]);
		const two = normalizeRegion([square(0, 0, 1), square(3, 0, 1)]);
		expect(regionToPolygons(two, { clean: true }).map((p) => p.holes.length)).toEqual([0, 0]);
		// Two squares overlapping by 1 mm², read as one union (non-zero after cleaning each).
		expect(regionArea_mm2(unionRegions([[square(0, 0, 2)], [square(1, 1, 2)]]))).toBeCloseTo(7, 9);
		// A figure-eight: the shoelace sum would give 0; the filled area is two triangles of 1 mm².
		const bowtie = ring(0, 0, 2, 2, 2, 0, 0, 2);
		expect(regionArea_mm2([bowtie])).toBeCloseTo(2, 9);
		expect(normalizeRegion([bowtie])).toHaveLength(2);
	});

	it('flattens curves within 1 µm: a circle of radius 2 mm has area π·4 within its chord error', () => {
		const circle = {
			outline: ellipseContour({ cx_mm: 0, cy_mm: 0, rx_mm: 2, ry_mm: 2 }),
			holes: []
		};
		const area = regionArea_mm2(shapeToRegion(circle, { tolerance_um: 0.5 }));
		// Four-arc cubic circles deviate by 2.7e-4·r from the true circle (common practice figure).
		expect(Math.abs(area - Math.PI * 4)).toBeLessThan(2 * Math.PI * 2 * (2.8e-4 * 2 + 1e-3));
		expect(() => shapeToRegion(circle, { tolerance_um: 5 })).toThrow(/tolerance_um/);
		const rect = {
			outline: rectangleContour({ x_mm: 0, y_mm: 0, width_mm: 3, height_mm: 2 }),
			holes: []
		};
		expect(regionArea_mm2(shapeToRegion(rect))).toBeCloseTo(6, 9);
	});

	it('finds where a ring crosses or touches itself, and nothing on simple rings', () => {
		expect(ringSelfCrossings(square(0, 0, 1))).toEqual([]);
		const next = random(3);
		for (let k = 0; k < 20; k++) expect(ringSelfCrossings(starPolygon(next, 0, 0))).toEqual([]);
		const crossings = ringSelfCrossings(ring(0, 0, 2, 2, 2, 0, 0, 2));
		expect(crossings).toHaveLength(1);
		expect(crossings[0].x).toBeCloseTo(1, 9);
		expect(crossings[0].y).toBeCloseTo(1, 9);
		// A vertex touching a far edge, and a spike folding back on itself.
		expect(ringSelfCrossings(ring(0, 0, 4, 0, 4, 4, 2, 0, 0, 4)).length).toBeGreaterThan(0);
		expect(ringSelfCrossings(ring(0, 0, 4, 0, 6, 0, 5, 0, 4, 4)).length).toBeGreaterThan(0);
	});
});
