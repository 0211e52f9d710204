import { describe, expect, it } from 'vitest';
import {
	intersectShapes,
	subtractShapes,
	uniteShapes
} from '../../src/lib/core/geometry/paper-kernel';
import { shapeArea } from '../../src/lib/core/geometry/polygon';
import { ellipseContour, rectangleContour } from '../../src/lib/core/geometry/primitive-shapes';
import type { Shape } from '../../src/lib/core/geometry/shape';

const rect = (x: number, y: number, w: number, h: number): Shape => ({
	outline: rectangleContour({ x_mm: x, y_mm: y, width_mm: w, height_mm: h }),
	holes: []
});
const area = (shapes: Shape[]) =>
	shapes.reduce((sum, s) => sum + shapeArea(s, { tolerance_um: 0.01 }), 0);

describe('paper.js geometry kernel', () => {
	it('unites, intersects and subtracts polygons exactly (1e-9 mm²)', () => {
		expect(Math.abs(area(uniteShapes([rect(0, 0, 2, 2), rect(1, 1, 2, 2)])) - 7)).toBeLessThan(
			1e-9
		);
		expect(Math.abs(area(intersectShapes([rect(0, 0, 2, 2), rect(1, 1, 2, 2)])) - 1)).toBeLessThan(
			1e-9
		);
		expect(Math.abs(area(subtractShapes(rect(0, 0, 2, 2), [rect(1, 1, 2, 2)])) - 3)).toBeLessThan(
			1e-9
		);
	});

	it('returns disjoint islands separately and holes as holes, islands in holes as islands', () => {
		expect(uniteShapes([rect(0, 0, 1, 1), rect(3, 0, 1, 1)])).toHaveLength(2);
		const frame = subtractShapes(rect(0, 0, 10, 10), [rect(2, 2, 6, 6)]);
		expect(frame).toHaveLength(1);
		expect(frame[0].holes).toHaveLength(1);
		const target = uniteShapes([...frame, rect(4, 4, 2, 2)]);
		expect(target.map((s) => s.holes.length).sort()).toEqual([0, 1]);
		expect(Math.abs(area(target) - (100 - 36 + 4))).toBeLessThan(1e-9);
	});

	it('takes even-odd shapes with holes as input and keeps curve handles', () => {
		const ring: Shape = {
			outline: ellipseContour({ cx_mm: 0, cy_mm: 0, rx_mm: 4, ry_mm: 4 }),
			holes: [ellipseContour({ cx_mm: 0, cy_mm: 0, rx_mm: 2, ry_mm: 2 })]
		};
		const [half] = intersectShapes([ring, rect(-5, -5, 10, 5)]);
		expect(half.holes).toHaveLength(0);
		expect(half.outline.some((p) => p.in || p.out)).toBe(true);
		expect(area([half])).toBeCloseTo(area([ring]) / 2, 9);
	});
});
