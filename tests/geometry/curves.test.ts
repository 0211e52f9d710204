import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	cubicExtremaParameters,
	cubicPoint,
	splitCubic,
	type Cubic
} from '../../src/lib/core/geometry/bezier';
import {
	composeAffine,
	rotationAbout,
	scalingAbout,
	transformContour,
	translation,
	applyAffine,
	mirrorAbout
} from '../../src/lib/core/geometry/affine';
import { contourTightBounds } from '../../src/lib/core/geometry/tight-bounds';
import { contourBounds, unionBounds } from '../../src/lib/core/geometry/bounds';
import { flattenContour } from '../../src/lib/core/geometry/flatten';
import { nearestPointOnContour } from '../../src/lib/core/geometry/distance';
import { KAPPA, pathFrom } from '../../src/lib/core/geometry/path-builder';

const coord = fc.double({ min: -20, max: 20, noNaN: true });
const cubicArb = fc.tuple(
	coord,
	coord,
	coord,
	coord,
	coord,
	coord,
	coord,
	coord
) as fc.Arbitrary<Cubic>;

describe('Bezier kernels', () => {
	it('de Casteljau split traces the same curve (1e-9 mm)', () => {
		fc.assert(
			fc.property(
				cubicArb,
				fc.double({ min: 0.01, max: 0.99, noNaN: true }),
				fc.double({ min: 0, max: 1, noNaN: true }),
				(c, t, s) => {
					const [left, right] = splitCubic(c, t);
					const whole = cubicPoint(c, s);
					const part = s <= t ? cubicPoint(left, s / t) : cubicPoint(right, (s - t) / (1 - t));
					expect(Math.hypot(whole.x - part.x, whole.y - part.y)).toBeLessThan(1e-9);
				}
			),
			{ numRuns: 300 }
		);
	});

	it('finds the axis extremes: exact bounds of a quarter-circle arc and a bulge', () => {
		const bulge: Cubic = [0, 0, 0, -4, 4, -4, 4, 0];
		const ts = cubicExtremaParameters(bulge);
		expect(ts).toContain(0.5);
		expect(cubicPoint(bulge, 0.5).y).toBe(-3);
		const contour = [
			{ x: 0, y: 0, out: [0, -4] as [number, number] },
			{ x: 4, y: 0, in: [0, -4] as [number, number] },
			{ x: 2, y: 2 }
		];
		expect(contourTightBounds(contour)).toEqual({ minX: 0, minY: -3, maxX: 4, maxY: 2 });
		expect(contourBounds(contour).minY).toBe(-4);
		expect(unionBounds([contour]).maxY).toBe(2);
	});

	it('flattens within the tolerance (worst chord deviation ≤ tolerance)', () => {
		const circle = pathFrom({ x: 10, y: 0 }).arcAround({ x: 0, y: 0 }, 360).close();
		for (const tolerance_um of [10, 1, 0.1]) {
			const ring = flattenContour(circle, { tolerance_um });
			let worst = 0;
			const n = ring.length / 2;
			for (let i = 0; i < n; i++) {
				const j = (i + 1) % n;
				const mid = {
					x: (ring[2 * i] + ring[2 * j]) / 2,
					y: (ring[2 * i + 1] + ring[2 * j + 1]) / 2
				};
				worst = Math.max(worst, nearestPointOnContour(circle, mid).distance_mm);
			}
			expect(worst * 1000).toBeLessThanOrEqual(tolerance_um);
		}
	});
});

describe('affine transforms', () => {
	it('composes first-then-second and maps handles by the linear part only', () => {
		const m = composeAffine(
			translation(1, 2),
			scalingAbout({ sx: 2, sy: 3, centre: { x: 0, y: 0 } })
		);
		expect(applyAffine(m, { x: 1, y: 1 })).toEqual({ x: 4, y: 9 });
		const [p] = transformContour(m, [
			{ x: 0, y: 0, out: [1, 1] },
			{ x: 1, y: 0 },
			{ x: 0, y: 1 }
		]);
		expect(p).toEqual({ x: 2, y: 6, out: [2, 3] });
	});

	it('rotates quarter turns exactly, clockwise on screen, and mirrors about a centre', () => {
		const r = rotationAbout({ angle_deg: 90, centre: { x: 1, y: 1 } });
		expect(applyAffine(r, { x: 2, y: 1 })).toEqual({ x: 1, y: 2 });
		expect(
			applyAffine(rotationAbout({ angle_deg: -270, centre: { x: 0, y: 0 } }), { x: 1, y: 0 })
		).toEqual({ x: 0, y: 1 });
		const q = applyAffine(rotationAbout({ angle_deg: 30, centre: { x: 0, y: 0 } }), { x: 1, y: 0 });
		expect(q.x).toBeCloseTo(Math.sqrt(3) / 2, 15);
		expect(
			applyAffine(mirrorAbout({ direction: 'horizontal', centre: { x: 5, y: 0 } }), { x: 1, y: 7 })
		).toEqual({ x: 9, y: 7 });
	});

	it('builds arcs with κ = 4(√2 − 1)/3 handles for a quarter circle', () => {
		// κ = 4(√2 − 1)/3 = 0.5522847498 by hand: the handle length that makes a cubic Bezier
		// meet a quarter circle at its midpoint (a standard result of curve drawing).
		expect(KAPPA).toBeCloseTo(0.5522847498, 10);
		const quarter = pathFrom({ x: 1, y: 0 })
			.arcAround({ x: 0, y: 0 }, 90)
			.lineTo({ x: 0, y: 0 })
			.close();
		expect(quarter[0].out![1]).toBeCloseTo(0.5522847498, 10);
		expect(quarter[1]).toMatchObject({ x: expect.closeTo(0, 15), y: 1 });
	});

	it('splits a two-point lens so a closed contour has 3 points, without changing it', () => {
		const lens = pathFrom({ x: 0, y: 0 })
			.cubicTo({ x: 1, y: -1 }, { x: 3, y: -1 }, { x: 4, y: 0 })
			.cubicTo({ x: 3, y: 1 }, { x: 1, y: 1 }, { x: 0, y: 0 })
			.close();
		expect(lens).toHaveLength(3);
		expect(contourTightBounds(lens)).toEqual({ minX: 0, minY: -0.75, maxX: 4, maxY: 0.75 });
	});
});
