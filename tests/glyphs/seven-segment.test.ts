import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { shapeToPathData } from '../../src/lib/core/geometry/path-data';
import { shapesTightBounds } from '../../src/lib/core/geometry/tight-bounds';
import { GlyphError } from '../../src/lib/core/glyphs/glyph-types';
import {
	generateSevenSegment,
	sevenSegmentDigit,
	SEVEN_SEGMENT_NAMES
} from '../../src/lib/core/glyphs/seven-segment';
import { closestPair, gapBetween, rangeOf, styleArb, TOLERANCE_mm, widthAcross } from './measure';

/** Segments meeting at an angle are exactly one gap apart; collinear ones (b–c, e–f) are farther. */
const NEIGHBOURS = ['ab', 'af', 'bg', 'cg', 'cd', 'de', 'eg', 'fg'];

const digitArb = fc
	.record({
		stroke: fc.double({ min: 0.2, max: 2, noNaN: true }),
		gap: fc.double({ min: 0.02, max: 0.4, noNaN: true }),
		wide: fc.double({ min: 1.05, max: 2.5, noNaN: true }),
		tall: fc.double({ min: 1.05, max: 3, noNaN: true }),
		slant: fc.double({ min: -25, max: 25, noNaN: true }),
		x: fc.double({ min: -50, max: 50, noNaN: true }),
		y: fc.double({ min: -50, max: 50, noNaN: true }),
		style: styleArb
	})
	.map((r) => ({
		x_mm: r.x,
		y_mm: r.y,
		stroke_mm: r.stroke,
		gap_mm: r.gap,
		width_mm: (3 * r.stroke + 2 * r.gap) * r.wide,
		height_mm: (5 * r.stroke + 4 * r.gap) * r.tall,
		slant_deg: r.slant,
		style: r.style,
		decimalPoint: true
	}));

describe('7-segment digits', () => {
	it('have the requested height, stroke, width and gap within 1 µm, and never overlap (random parameters, slants, styles)', () => {
		let worst = 0;
		fc.assert(
			fc.property(digitArb, (p) => {
				const g = generateSevenSegment(p);
				const part = Object.fromEntries(g.parts.map((x) => [x.key, x]));
				const segments = SEVEN_SEGMENT_NAMES.map((s) => part[s]);
				const b = shapesTightBounds(segments);
				const errors = [
					b.maxY - b.minY - p.height_mm,
					b.minY - p.y_mm,
					widthAcross(part.a, { x: 1, y: 0 }) - p.stroke_mm,
					widthAcross(part.g, { x: 1, y: 0 }) - p.stroke_mm,
					widthAcross(part.b, { x: -Math.tan((p.slant_deg * Math.PI) / 180), y: 1 }) - p.stroke_mm,
					widthAcross(part.e, { x: -Math.tan((p.slant_deg * Math.PI) / 180), y: 1 }) - p.stroke_mm
				];
				// Along a leaning outer edge x + tan(slant)·y is constant: its extremes give the width.
				const lean = Math.tan((p.slant_deg * Math.PI) / 180);
				const across = (x: number, y: number) => x + lean * y;
				errors.push(rangeOf(part.b, across).max - rangeOf(part.f, across).min - p.width_mm);
				for (const pair of NEIGHBOURS)
					errors.push(gapBetween(part[pair[0]], part[pair[1]]) - p.gap_mm);
				for (const e of errors) worst = Math.max(worst, Math.abs(e));
				for (const [k, e] of errors.entries())
					expect(Math.abs(e), `measure ${k}`).toBeLessThanOrEqual(TOLERANCE_mm);
				const closest = closestPair(g.parts);
				expect(closest.gap, closest.pair).toBeGreaterThanOrEqual(p.gap_mm - TOLERANCE_mm);
			}),
			{ numRuns: 120 }
		);
		console.log(
			`[7-segment geometry] 120 random digits, worst |Δ| = ${(worst * 1000).toExponential(2)} µm (tolerance 1 µm)`
		);
	});

	it('refuse proportions in which bars would vanish', () => {
		expect(() =>
			generateSevenSegment({ height_mm: 10, width_mm: 2, stroke_mm: 1, gap_mm: 0.1 })
		).toThrow(GlyphError);
		expect(() =>
			generateSevenSegment({ height_mm: 10, width_mm: 6, stroke_mm: 1, gap_mm: 0.1, slant_deg: 40 })
		).toThrow(/slant/);
	});

	it('keep the outline API used by scripts', () => {
		const outlines = sevenSegmentDigit({
			x_mm: 0,
			y_mm: 0,
			height_mm: 10,
			width_mm: 6,
			stroke_mm: 1,
			gap_mm: 0.1,
			slant_deg: 0
		});
		expect(Object.keys(outlines)).toEqual(['a', 'b', 'c', 'd', 'e', 'f', 'g']);
	});

	it('regression guard: golden SVG path data (pointed, slanted 8°, 3 decimals)', () => {
		const g = generateSevenSegment({
			x_mm: 1,
			y_mm: 2,
			height_mm: 10,
			width_mm: 6,
			stroke_mm: 1.2,
			gap_mm: 0.15,
			slant_deg: 8,
			decimalPoint: true
		});
		const svg = Object.fromEntries(g.parts.map((p) => [p.key, shapeToPathData(p, 3)]));
		expect(svg).toMatchInlineSnapshot(`
			{
			  "a": "M3.732 2L7.094 2L7.609 2.593L6.911 3.2L3.548 3.2L3.033 2.607Z",
			  "b": "M8.223 3.298L7.803 6.287L7.104 6.894L6.589 6.302L7.009 3.313L7.708 2.706Z",
			  "c": "M7.605 7.698L7.185 10.687L6.486 11.294L5.971 10.702L6.391 7.713L7.089 7.106Z",
			  "d": "M2.495 10.8L5.857 10.8L6.373 11.393L5.674 12L2.311 12L1.796 11.407Z",
			  "dp": "M7.623 10.8L8.823 10.8L8.654 12L7.454 12Z",
			  "e": "M2.816 7.698L2.396 10.687L1.698 11.294L1.182 10.702L1.602 7.713L2.301 7.106Z",
			  "f": "M3.435 3.298L3.015 6.287L2.316 6.894L1.801 6.302L2.221 3.313L2.92 2.706Z",
			  "g": "M3.113 6.4L6.476 6.4L6.991 6.993L6.292 7.6L2.93 7.6L2.414 7.007Z",
			}
		`);
	});

	it('regression guard: golden SVG path data (round ends, upright)', () => {
		const g = generateSevenSegment({
			height_mm: 8,
			width_mm: 5,
			stroke_mm: 1,
			gap_mm: 0.2,
			style: 'round'
		});
		expect(shapeToPathData(g.parts[6], 3)).toMatchInlineSnapshot(
			`"M1.349 4.5L3.651 4.5C3.928 4.5 4.151 4.276 4.151 4C4.151 3.724 3.928 3.5 3.651 3.5L1.349 3.5C1.072 3.5 0.849 3.724 0.849 4C0.849 4.276 1.072 4.5 1.349 4.5Z"`
		);
	});
});
