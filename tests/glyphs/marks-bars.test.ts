import { describe, expect, it } from 'vitest';
import { shapeArea } from '../../src/lib/core/geometry/polygon';
import { shapeTightBounds } from '../../src/lib/core/geometry/tight-bounds';
import { generateBarGraph } from '../../src/lib/core/glyphs/bar-graph';
import {
	generateColon,
	generateDecimalPoint,
	generateDegree,
	generateMinus
} from '../../src/lib/core/glyphs/mark-generators';
import { closestPair } from './measure';

describe('marks', () => {
	it('decimal point: a square (sheared with the slant) or a round dot of the given size', () => {
		const square = generateDecimalPoint({ x_mm: 1, y_mm: 2, size_mm: 1.5 });
		expect(shapeTightBounds(square.parts[0])).toEqual({ minX: 1, minY: 2, maxX: 2.5, maxY: 3.5 });
		const round = generateDecimalPoint({ size_mm: 1, style: 'round' });
		expect(shapeArea(round.parts[0], { tolerance_um: 0.01 })).toBeCloseTo(Math.PI / 4, 3);
		const slanted = generateDecimalPoint({ size_mm: 1, slant_deg: 45 / 2 });
		expect(slanted.parts[0].outline[0].x).toBeCloseTo(Math.tan(Math.PI / 8), 12);
	});

	it('colon: two dots at 30 % and 70 % of the height, gap-free of each other', () => {
		const colon = generateColon({ size_mm: 1, height_mm: 10 });
		expect(colon.parts.map((p) => p.key)).toEqual(['upper', 'lower']);
		const [upper, lower] = colon.parts.map((p) => shapeTightBounds(p));
		expect((upper.minY + upper.maxY) / 2).toBeCloseTo(3, 12);
		expect((lower.minY + lower.maxY) / 2).toBeCloseTo(7, 12);
	});

	it('minus: a bar of stroke height at mid-height, within the width', () => {
		const minus = generateMinus({ width_mm: 6, stroke_mm: 1, height_mm: 10 });
		const b = shapeTightBounds(minus.parts[0]);
		expect([b.minY, b.maxY]).toEqual([4.5, 5.5]);
		expect(b.minX).toBeGreaterThan(0);
		expect(b.maxX).toBeLessThan(6);
		const round = generateMinus({ width_mm: 6, stroke_mm: 1, height_mm: 10, style: 'round' });
		expect(shapeTightBounds(round.parts[0]).minX).toBeCloseTo(0, 12);
	});

	it('degree: one electrode, a ring with a hole, by style', () => {
		for (const style of ['round', 'square', 'pointed'] as const) {
			const deg = generateDegree({ size_mm: 3, stroke_mm: 0.8, style });
			expect(deg.parts).toHaveLength(1);
			expect(deg.parts[0].holes).toHaveLength(1);
			const b = shapeTightBounds(deg.parts[0]);
			expect(b.maxY - b.minY).toBeCloseTo(3, 9);
		}
		expect(() => generateDegree({ size_mm: 1, stroke_mm: 0.6 })).toThrow(/half its size/);
	});
});

describe('bar graphs', () => {
	it('lays out bars along each direction with the given spacing', () => {
		const right = generateBarGraph({ count: 4, width_mm: 2, height_mm: 3, spacing_mm: 0.5 });
		expect(right.parts.map((p) => shapeTightBounds(p).minX)).toEqual([0, 2.5, 5, 7.5]);
		const left = generateBarGraph({
			count: 4,
			width_mm: 2,
			height_mm: 3,
			spacing_mm: 0.5,
			direction: 'left'
		});
		expect(left.parts.map((p) => shapeTightBounds(p).minX)).toEqual([7.5, 5, 2.5, 0]);
		const up = generateBarGraph({
			count: 3,
			width_mm: 3,
			height_mm: 1,
			spacing_mm: 0.5,
			y_mm: 10,
			direction: 'up'
		});
		expect(up.parts.map((p) => shapeTightBounds(p).maxY)).toEqual([14, 12.5, 11]);
		const down = generateBarGraph({
			count: 3,
			width_mm: 3,
			height_mm: 1,
			spacing_mm: 0.5,
			direction: 'down'
		});
		expect(down.parts.map((p) => shapeTightBounds(p).minY)).toEqual([0, 1.5, 3]);
		expect(right.parts.map((p) => p.key)).toEqual(['bar1', 'bar2', 'bar3', 'bar4']);
	});

	it('steps rise from the baseline; rounded and chevron bars keep their spacing', () => {
		const steps = generateBarGraph({ count: 4, width_mm: 1, height_mm: 4, shape: 'steps' });
		const r = (v: number) => Math.round(v * 1e9) / 1e9;
		expect(
			steps.parts.map((p) =>
				Object.fromEntries(Object.entries(shapeTightBounds(p)).map(([k, v]) => [k, r(v)]))
			)
		).toEqual([
			{ minX: 0, minY: 3, maxX: 1, maxY: 4 },
			{ minX: 1.3, minY: 2, maxX: 2.3, maxY: 4 },
			{ minX: 2.6, minY: 1, maxX: 3.6, maxY: 4 },
			{ minX: 3.9, minY: 0, maxX: 4.9, maxY: 4 }
		]);
		for (const shape of ['rounded', 'chevron'] as const) {
			for (const direction of ['right', 'up'] as const) {
				const g = generateBarGraph({
					count: 5,
					width_mm: 2,
					height_mm: 2,
					spacing_mm: 0.4,
					shape,
					direction
				});
				expect(closestPair(g.parts).gap).toBeGreaterThan(0.2);
			}
		}
		const chevron = generateBarGraph({
			count: 2,
			width_mm: 2,
			height_mm: 2,
			spacing_mm: 0.4,
			shape: 'chevron'
		});
		expect(chevron.parts[0].outline).toHaveLength(6);
		expect(() => generateBarGraph({ count: 0, width_mm: 1, height_mm: 1 })).toThrow();
	});
});
