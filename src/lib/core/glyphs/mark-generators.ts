/**
 * Stand-alone, regenerable marks: decimal point, colon (two dots), minus sign and degree ring.
 * Each is a one- or two-electrode generated group. Positions: (x_mm, y_mm) is the top-left of the
 * mark's unslanted box; `height_mm` is the character height the colon and minus centre on.
 */
import { z } from 'zod';
import type { Contour } from '../design/schema';
import type { GeneratedGroup } from './glyph-types';
import { degreeRing, dotContour } from './marks';
import { segmentStyleSchema, MAX_SLANT_deg } from './segment-params';
import { segmentFrame } from './segment-frame';
import { layoutBars } from './segment-layout';

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
const positive = () => finite().refine((v) => v > 0, 'expected a number above 0');
const base = {
	x_mm: finite().default(0),
	y_mm: finite().default(0),
	slant_deg: finite()
		.refine((v) => Math.abs(v) <= MAX_SLANT_deg, `expected a slant within ±${MAX_SLANT_deg}°`)
		.default(0),
	style: segmentStyleSchema.default('pointed')
};

export const decimalPointSchema = z.object({ ...base, size_mm: positive() });
export const colonSchema = z.object({ ...base, size_mm: positive(), height_mm: positive() });
export const minusSchema = z.object({
	...base,
	width_mm: positive(),
	stroke_mm: positive(),
	height_mm: positive()
});
export const degreeSchema = z.object({ ...base, size_mm: positive(), stroke_mm: positive() });

export function generateDecimalPoint(input: z.input<typeof decimalPointSchema>): GeneratedGroup {
	const p = decimalPointSchema.parse(input);
	const outline = dotContour({ ...p, baseline: p.y_mm + p.size_mm });
	return {
		kind: 'decimal-point',
		params: p,
		name: 'Decimal point',
		idPrefix: 'dp',
		parts: [{ key: 'dp', name: 'DP', kind: 'segment', outline, holes: [] }]
	};
}

/** Dots centred at 30 % and 70 % of the height. */
export function generateColon(input: z.input<typeof colonSchema>): GeneratedGroup {
	const p = colonSchema.parse(input);
	const baseline = p.y_mm + p.height_mm;
	const dot = (fraction: number) =>
		dotContour({ ...p, y_mm: p.y_mm + fraction * p.height_mm - p.size_mm / 2, baseline });
	return {
		kind: 'colon',
		params: p,
		name: 'Colon',
		idPrefix: 'colon',
		parts: [
			{ key: 'upper', name: 'COL upper', kind: 'segment', outline: dot(0.3), holes: [] },
			{ key: 'lower', name: 'COL lower', kind: 'segment', outline: dot(0.7), holes: [] }
		]
	};
}

/** A bar at mid-height, ends styled like a digit's middle segment. */
export function generateMinus(input: z.input<typeof minusSchema>): GeneratedGroup {
	const p = minusSchema.parse(input);
	const outline = minusContour(p);
	return {
		kind: 'minus',
		params: p,
		name: 'Minus sign',
		idPrefix: 'minus',
		parts: [{ key: 'minus', name: 'MINUS', kind: 'segment', outline, holes: [] }]
	};
}

/** The middle bar of a digit `width_mm` wide with free ends (no neighbours to mitre against). */
export function minusContour(p: z.output<typeof minusSchema>): Contour {
	const frame = segmentFrame({ ...p, gap_mm: p.stroke_mm / 4, decimalPoint: false });
	return layoutBars(frame, [{ key: 'minus', from: 'LM', to: 'RM' }]).minus;
}

export function generateDegree(input: z.input<typeof degreeSchema>): GeneratedGroup {
	const p = degreeSchema.parse(input);
	if (p.stroke_mm * 2 >= p.size_mm)
		throw new RangeError('the degree ring needs a stroke below half its size');
	const ring = degreeRing({ ...p, baseline: p.y_mm + p.size_mm });
	return {
		kind: 'degree',
		params: p,
		name: 'Degree sign',
		idPrefix: 'degree',
		parts: [{ key: 'degree', name: 'DEG', kind: 'icon', ...ring }]
	};
}
