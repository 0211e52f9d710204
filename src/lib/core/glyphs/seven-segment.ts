/**
 * Parametric 7-segment digits. Each segment is a hexagon along its centre line with 45° pointed
 * ends at the joints, so neighbouring segments meet along mitre lines; shortening every segment by
 * gap/√2 at each end leaves exactly `gap_mm` between neighbours, measured perpendicular to the
 * mitre. The digit's bounding box before slant is width × height. Slant shears x by −tan(slant)·y
 * about the baseline, leaning the digit to the right as in common italic numerals.
 *
 * Segment letters follow the usual convention: a top, b upper right, c lower right, d bottom,
 * e lower left, f upper left, g middle.
 */
import type { Contour } from '../design/schema';

export type SevenSegmentName = 'a' | 'b' | 'c' | 'd' | 'e' | 'f' | 'g';
export const SEVEN_SEGMENT_NAMES: readonly SevenSegmentName[] = ['a', 'b', 'c', 'd', 'e', 'f', 'g'];

export interface SevenSegmentParams {
	x_mm: number;
	y_mm: number;
	height_mm: number;
	width_mm: number;
	stroke_mm: number;
	gap_mm: number;
	slant_deg: number;
}

type Vec = readonly [number, number];

/** A hexagonal bar from p0 to p1 with pointed ends, pulled back by `inset` at both ends. */
export function pointedBar(p0: Vec, p1: Vec, halfWidth: number, inset: number): Vec[] {
	const length = Math.hypot(p1[0] - p0[0], p1[1] - p0[1]);
	const ux = (p1[0] - p0[0]) / length;
	const uy = (p1[1] - p0[1]) / length;
	const nx = -uy;
	const ny = ux;
	const at = (s: number, n: number): Vec => [p0[0] + ux * s + nx * n, p0[1] + uy * s + ny * n];
	return [
		at(inset, 0),
		at(inset + halfWidth, halfWidth),
		at(length - inset - halfWidth, halfWidth),
		at(length - inset, 0),
		at(length - inset - halfWidth, -halfWidth),
		at(inset + halfWidth, -halfWidth)
	];
}

export function shear(points: readonly Vec[], options: { slant_deg: number; baseline: number }): Vec[] {
	const k = Math.tan((options.slant_deg * Math.PI) / 180);
	return points.map(([x, y]) => [x - k * (y - options.baseline), y]);
}

export function sevenSegmentDigit(params: SevenSegmentParams): Record<SevenSegmentName, Contour> {
	const { x_mm: x0, y_mm: y0, height_mm: h, width_mm: w, stroke_mm: t, gap_mm: gap } = params;
	const half = t / 2;
	const left = x0 + half;
	const right = x0 + w - half;
	const top = y0 + half;
	const middle = y0 + h / 2;
	const bottom = y0 + h - half;
	const inset = gap / Math.SQRT2;
	const centreLines: Record<SevenSegmentName, [Vec, Vec]> = {
		a: [[left, top], [right, top]],
		b: [[right, top], [right, middle]],
		c: [[right, middle], [right, bottom]],
		d: [[right, bottom], [left, bottom]],
		e: [[left, bottom], [left, middle]],
		f: [[left, middle], [left, top]],
		g: [[left, middle], [right, middle]]
	};
	const result = {} as Record<SevenSegmentName, Contour>;
	for (const name of SEVEN_SEGMENT_NAMES) {
		const [p0, p1] = centreLines[name];
		const bar = shear(pointedBar(p0, p1, half, inset), { slant_deg: params.slant_deg, baseline: y0 + h });
		result[name] = bar.map(([x, y]) => ({ x, y }));
	}
	return result;
}

/** Segments lit for each character a 7-segment digit can show. */
export const SEVEN_SEGMENT_CHARSET: Readonly<Record<string, string>> = {
	'0': 'abcdef', '1': 'bc', '2': 'abdeg', '3': 'abcdg', '4': 'bcfg', '5': 'acdfg',
	'6': 'acdefg', '7': 'abc', '8': 'abcdefg', '9': 'abcdfg', '-': 'g', ' ': ''
};
