import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { shapeToPathData } from '../../src/lib/core/geometry/path-data';
import { shapesTightBounds } from '../../src/lib/core/geometry/tight-bounds';
import { canShow, segmentsFor } from '../../src/lib/core/glyphs/segment-charsets';
import {
	generateStarburst,
	STARBURST_SEGMENT_NAMES
} from '../../src/lib/core/glyphs/starburst-segments';
import { closestPair, gapBetween, styleArb, TOLERANCE_mm, widthAcross } from './measure';

const charArb = fc
	.record({
		stroke: fc.double({ min: 0.2, max: 1.5, noNaN: true }),
		gap: fc.double({ min: 0.02, max: 0.3, noNaN: true }),
		wide: fc.double({ min: 1.15, max: 2.5, noNaN: true }),
		tall: fc.double({ min: 1.2, max: 3, noNaN: true }),
		slant: fc.double({ min: -20, max: 20, noNaN: true }),
		style: styleArb,
		count: fc.constantFrom(14 as const, 16 as const)
	})
	.map((r) => ({
		count: r.count,
		params: {
			x_mm: 3,
			y_mm: -2,
			stroke_mm: r.stroke,
			gap_mm: r.gap,
			width_mm: (5 * r.stroke + 4 * r.gap) * r.wide,
			height_mm: (7 * r.stroke + 4 * r.gap) * r.tall,
			slant_deg: r.slant,
			style: r.style,
			decimalPoint: true
		}
	}));

describe('14- and 16-segment characters', () => {
	it('never overlap: every pair of segments is at least the gap apart (random parameters, slants, styles)', () => {
		let worst = Infinity;
		fc.assert(
			fc.property(charArb, ({ count, params }) => {
				const g = generateStarburst(params, { count });
				expect(g.parts.map((p) => p.key)).toEqual([...STARBURST_SEGMENT_NAMES[count], 'dp']);
				const closest = closestPair(g.parts);
				worst = Math.min(worst, closest.gap - params.gap_mm);
				expect(closest.gap, closest.pair).toBeGreaterThanOrEqual(params.gap_mm - TOLERANCE_mm);
				const b = shapesTightBounds(g.parts.filter((p) => p.key !== 'dp'));
				expect(Math.abs(b.maxY - b.minY - params.height_mm)).toBeLessThanOrEqual(TOLERANCE_mm);
				const part = Object.fromEntries(g.parts.map((p) => [p.key, p]));
				expect(Math.abs(gapBetween(part.f, part.g1) - params.gap_mm)).toBeLessThanOrEqual(
					TOLERANCE_mm
				);
				expect(
					Math.abs(widthAcross(part.g2, { x: 1, y: 0 }) - params.stroke_mm)
				).toBeLessThanOrEqual(TOLERANCE_mm);
			}),
			{ numRuns: 80 }
		);
		console.log(
			`[14/16-segment geometry] 80 random characters, smallest gap − requested = ${(worst * 1000).toFixed(3)} µm (allowed ≥ −1 µm)`
		);
	});

	it('every bar is one stroke wide and every bar-to-bar corner is exactly the gap (upright, all styles)', () => {
		// Design intent, measured on the flattened outlines: bars meeting at a corner or a T leave
		// exactly the requested gap; collinear neighbours and stems never come closer than it; the
		// character spans the requested width and height; every bar is one stroke across.
		const corners: Record<14 | 16, string[]> = {
			14: ['a-f', 'a-b', 'd-c', 'd-e', 'g1-f', 'g1-e', 'g2-b', 'g2-c'],
			16: ['a1-f', 'a2-b', 'd1-c', 'd2-e', 'g1-f', 'g1-e', 'g2-b', 'g2-c']
		};
		const apart: Record<14 | 16, string[]> = {
			14: ['b-c', 'e-f', 'g1-g2', 'i-a', 'i-g1', 'i-g2', 'l-d', 'l-g1', 'l-g2'],
			16: ['a1-a2', 'd1-d2', 'g1-g2', 'b-c', 'e-f', 'i-a1', 'i-a2', 'i-g1', 'i-g2', 'l-d1', 'l-d2']
		};
		const vertical = ['b', 'c', 'e', 'f', 'i', 'l'];
		const horizontal: Record<14 | 16, string[]> = {
			14: ['a', 'd', 'g1', 'g2'],
			16: ['a1', 'a2', 'd1', 'd2', 'g1', 'g2']
		};
		const sizes = [
			{ height_mm: 12, width_mm: 8, stroke_mm: 1, gap_mm: 0.15 },
			{ height_mm: 9.3, width_mm: 7.1, stroke_mm: 0.7, gap_mm: 0.05 },
			{ height_mm: 20, width_mm: 11, stroke_mm: 1.6, gap_mm: 0.3 }
		];
		for (const count of [14, 16] as const)
			for (const style of ['pointed', 'chamfered', 'square', 'round'] as const)
				for (const size of sizes) {
					const g = generateStarburst({ ...size, style }, { count });
					const part = Object.fromEntries(g.parts.map((p) => [p.key, p]));
					const at = `${count}-segment ${style} ${size.height_mm} mm`;
					const gap = (pair: string) => {
						const [a, b] = pair.split('-');
						return gapBetween(part[a], part[b]);
					};
					for (const pair of corners[count])
						expect(Math.abs(gap(pair) - size.gap_mm), `${at} ${pair}`).toBeLessThanOrEqual(
							TOLERANCE_mm
						);
					for (const pair of apart[count])
						expect(gap(pair), `${at} ${pair}`).toBeGreaterThanOrEqual(size.gap_mm - TOLERANCE_mm);
					for (const key of vertical)
						expect(
							Math.abs(widthAcross(part[key], { x: 0, y: 1 }) - size.stroke_mm),
							`${at} ${key}`
						).toBeLessThanOrEqual(TOLERANCE_mm);
					for (const key of horizontal[count])
						expect(
							Math.abs(widthAcross(part[key], { x: 1, y: 0 }) - size.stroke_mm),
							`${at} ${key}`
						).toBeLessThanOrEqual(TOLERANCE_mm);
					const b = shapesTightBounds(g.parts.filter((p) => p.key !== 'dp'));
					expect(Math.abs(b.maxX - b.minX - size.width_mm), at).toBeLessThanOrEqual(TOLERANCE_mm);
					expect(Math.abs(b.maxY - b.minY - size.height_mm), at).toBeLessThanOrEqual(TOLERANCE_mm);
				}
	});

	it('diagonals touch the gap clearance of the bars around their cell', () => {
		const g = generateStarburst(
			{ height_mm: 12, width_mm: 8, stroke_mm: 1, gap_mm: 0.15 },
			{ count: 16 }
		);
		const part = Object.fromEntries(g.parts.map((p) => [p.key, p]));
		for (const [diag, bar] of [
			['h', 'f'],
			['h', 'a1'],
			['j', 'i'],
			['k', 'g2'],
			['m', 'e']
		]) {
			expect(gapBetween(part[diag], part[bar])).toBeCloseTo(0.15, 9);
		}
	});

	it('refuses characters too narrow for their diagonals', () => {
		expect(() =>
			generateStarburst({ height_mm: 10, width_mm: 4, stroke_mm: 1, gap_mm: 0.1 }, { count: 14 })
		).toThrow(/narrow/);
	});

	it('map characters to segments with the usual names', () => {
		expect(segmentsFor('8', 7)).toEqual(['a', 'b', 'c', 'd', 'e', 'f', 'g']);
		expect(segmentsFor('r', 7)).toEqual(['e', 'g']);
		expect(segmentsFor('B', 7)).toEqual(['c', 'd', 'e', 'f', 'g']);
		expect(segmentsFor('M', 7)).toBeNull();
		expect(segmentsFor('M', 14)).toEqual(['b', 'c', 'e', 'f', 'h', 'j']);
		expect(segmentsFor('x', 14)).toEqual(['h', 'j', 'k', 'm']);
		expect(segmentsFor('0', 16)).toEqual(['a1', 'a2', 'b', 'c', 'd1', 'd2', 'e', 'f', 'j', 'm']);
		expect(canShow('ä', 16)).toBe(false);
		for (const count of [14, 16] as const) {
			const names = new Set(STARBURST_SEGMENT_NAMES[count]);
			for (const ch of 'ABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789+-*/<>=_')
				expect(
					segmentsFor(ch, count)!.every((s) => names.has(s)),
					ch
				).toBe(true);
		}
	});

	it('regression guard: golden SVG path (16-segment diagonal h, chamfered)', () => {
		const g = generateStarburst(
			{ height_mm: 12, width_mm: 8, stroke_mm: 1, gap_mm: 0.15, style: 'chamfered' },
			{ count: 16 }
		);
		expect(
			shapeToPathData(
				g.parts.find((p) => p.key === 'h')!,
				3
			)
		).toMatchInlineSnapshot(
			`"M1.714 1.15L3.35 4.272L3.35 5.068L2.811 5.35L2.786 5.35L1.15 2.228L1.15 1.432L1.689 1.15Z"`
		);
	});
});
