/**
 * Parametric 7-segment digits. Segment letters follow the usual convention: a top, b upper right,
 * c lower right, d bottom, e lower left, f upper left, g middle; an optional decimal point `dp`
 * sits right of the baseline corner.
 *
 * Geometry (see segment-frame.ts and segment-ends.ts): the box before slant is width × height with
 * its top-left at (x_mm, y_mm); bars are stroke_mm wide perpendicular to themselves also when
 * slanted; neighbouring segments are exactly gap_mm apart; the slant is a shear about the baseline
 * that leans the digit to the right for positive angles.
 */
import type { Contour } from '../design/schema';
import { GlyphError, type ElectrodeDraft, type GeneratedGroup } from './glyph-types';
import { dotContour, markSpacing } from './marks';
import { segmentFrame } from './segment-frame';
import { layoutBars, type BarDef } from './segment-layout';
import {
	segmentCharacterSchema,
	type SegmentCharacterInput,
	type SegmentCharacterParams
} from './segment-params';

export type SevenSegmentName = 'a' | 'b' | 'c' | 'd' | 'e' | 'f' | 'g';
export const SEVEN_SEGMENT_NAMES: readonly SevenSegmentName[] = ['a', 'b', 'c', 'd', 'e', 'f', 'g'];

const SEVEN_SEGMENT_BARS: readonly BarDef[] = [
	{ key: 'a', from: 'LT', to: 'RT' },
	{ key: 'b', from: 'RT', to: 'RM' },
	{ key: 'c', from: 'RM', to: 'RB' },
	{ key: 'd', from: 'LB', to: 'RB' },
	{ key: 'e', from: 'LM', to: 'LB' },
	{ key: 'f', from: 'LT', to: 'LM' },
	{ key: 'g', from: 'LM', to: 'RM' }
];

/** Proportions below which bars would vanish or collide. */
export function checkSevenSegmentProportions(p: SegmentCharacterParams): void {
	if (p.width_mm < 3 * p.stroke_mm + 2 * p.gap_mm)
		throw new GlyphError('the digit is too narrow: width must be at least 3 strokes plus 2 gaps', {
			param: 'width_mm',
			reason: 'too narrow: at least 3 strokes plus 2 gaps'
		});
	if (p.height_mm < 5 * p.stroke_mm + 4 * p.gap_mm)
		throw new GlyphError('the digit is too short: height must be at least 5 strokes plus 4 gaps', {
			param: 'height_mm',
			reason: 'too short: at least 5 strokes plus 4 gaps'
		});
}

export function sevenSegmentOutlines(
	params: SegmentCharacterParams
): Record<SevenSegmentName, Contour> {
	checkSevenSegmentProportions(params);
	return layoutBars(segmentFrame(params), SEVEN_SEGMENT_BARS) as Record<SevenSegmentName, Contour>;
}

/** The decimal point right of a character's baseline corner (unslanted box, then sheared). */
export function decimalPointAfter(params: SegmentCharacterParams): Contour {
	const size = params.stroke_mm;
	const baseline = params.y_mm + params.height_mm;
	return dotContour({
		x_mm: params.x_mm + params.width_mm + markSpacing(params),
		y_mm: baseline - size,
		size_mm: size,
		style: params.style,
		baseline,
		slant_deg: params.slant_deg
	});
}

/** Outlines keyed by segment letter (kept for scripts that place digits by hand). */
export function sevenSegmentDigit(
	params: SegmentCharacterInput
): Record<SevenSegmentName, Contour> {
	return sevenSegmentOutlines(segmentCharacterSchema.parse(params));
}

export function generateSevenSegment(
	input: SegmentCharacterInput,
	options: { namePrefix?: string } = {}
): GeneratedGroup {
	const params = segmentCharacterSchema.parse(input);
	const outlines = sevenSegmentOutlines(params);
	const prefix = options.namePrefix ?? '';
	const parts: ElectrodeDraft[] = SEVEN_SEGMENT_NAMES.map((s) => ({
		key: s,
		name: `${prefix}${s.toUpperCase()}`,
		kind: 'segment',
		outline: outlines[s],
		holes: []
	}));
	if (params.decimalPoint)
		parts.push({
			key: 'dp',
			name: `${prefix}DP`,
			kind: 'segment',
			outline: decimalPointAfter(params),
			holes: []
		});
	return { kind: 'seven-segment', params, name: '7-segment digit', idPrefix: 'digit', parts };
}

/** Segments lit for each character a 7-segment digit can show (case matters where both exist). */
// prettier-ignore
export const SEVEN_SEGMENT_CHARSET: Readonly<Record<string, string>> = {
	'0': 'abcdef', '1': 'bc', '2': 'abdeg', '3': 'abcdg', '4': 'bcfg', '5': 'acdfg',
	'6': 'acdefg', '7': 'abc', '8': 'abcdefg', '9': 'abcdfg', '-': 'g', ' ': '', _: 'd', '=': 'dg',
	A: 'abcefg', b: 'cdefg', C: 'adef', c: 'deg', d: 'bcdeg', E: 'adefg', F: 'aefg', G: 'acdef',
	H: 'bcefg', h: 'cefg', I: 'ef', J: 'bcde', L: 'def', n: 'ceg', o: 'cdeg', P: 'abefg', q: 'abcfg',
	r: 'eg', S: 'acdfg', t: 'defg', U: 'bcdef', u: 'cde', y: 'bcdfg'
};
