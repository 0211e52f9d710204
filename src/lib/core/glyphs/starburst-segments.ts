/**
 * Parametric 14- and 16-segment characters. Naming (lower case, clockwise): outer ring a (16: a1
 * left, a2 right), b upper right, c lower right, d (16: d1 right, d2 left), e lower left,
 * f upper left; middle bar g1 left, g2 right; around the centre, clockwise from upper left:
 * h upper-left diagonal, i upper vertical, j upper-right diagonal, k lower-right diagonal,
 * l lower vertical, m lower-left diagonal.
 *
 *  ─a1── ──a2─        In the 14-segment form a and d are single bars and the verticals i and l
 * │╲    │    ╱│       stop a gap short of them (stems). Bars meet as in the 7-segment digit;
 * f h   i   j b       diagonals sit in the four cells between the bars (diagonal-cells.ts),
 * │  ╲  │  ╱  │       clear of every bar by at least the gap.
 *  ─g1── ──g2─
 * │  ╱  │  ╲  │
 * e m   l   k c
 * │╱    │    ╲│
 *  ─d2── ──d1─
 */
import type { Contour } from '../design/schema';
import { diagonalContour, type DiagonalDef } from './diagonal-cells';
import { GlyphError, type ElectrodeDraft, type GeneratedGroup } from './glyph-types';
import { segmentFrame } from './segment-frame';
import { layoutBars, type BarDef } from './segment-layout';
import {
	segmentCharacterSchema,
	type SegmentCharacterInput,
	type SegmentCharacterParams
} from './segment-params';
import { decimalPointAfter } from './seven-segment';

export type StarburstCount = 14 | 16;

const COMMON_BARS: readonly BarDef[] = [
	{ key: 'b', from: 'RT', to: 'RM' },
	{ key: 'c', from: 'RM', to: 'RB' },
	{ key: 'e', from: 'LM', to: 'LB' },
	{ key: 'f', from: 'LT', to: 'LM' },
	{ key: 'g1', from: 'LM', to: 'CM' },
	{ key: 'g2', from: 'CM', to: 'RM' }
];

const BARS: Record<StarburstCount, readonly BarDef[]> = {
	14: [
		{ key: 'a', from: 'LT', to: 'RT' },
		...COMMON_BARS,
		{ key: 'd', from: 'LB', to: 'RB' },
		{ key: 'i', from: 'CT', to: 'CM', stemFrom: 'a' },
		{ key: 'l', from: 'CM', to: 'CB', stemTo: 'd' }
	],
	16: [
		{ key: 'a1', from: 'LT', to: 'CT' },
		{ key: 'a2', from: 'CT', to: 'RT' },
		...COMMON_BARS,
		{ key: 'd1', from: 'CB', to: 'RB' },
		{ key: 'd2', from: 'LB', to: 'CB' },
		{ key: 'i', from: 'CT', to: 'CM' },
		{ key: 'l', from: 'CM', to: 'CB' }
	]
};

const DIAGONALS: readonly DiagonalDef[] = [
	{ key: 'h', columns: ['L', 'C'], rows: ['T', 'M'], slope: 'falling' },
	{ key: 'j', columns: ['C', 'R'], rows: ['T', 'M'], slope: 'rising' },
	{ key: 'k', columns: ['C', 'R'], rows: ['M', 'B'], slope: 'falling' },
	{ key: 'm', columns: ['L', 'C'], rows: ['M', 'B'], slope: 'rising' }
];

export const STARBURST_SEGMENT_NAMES: Record<StarburstCount, readonly string[]> = {
	14: ['a', 'b', 'c', 'd', 'e', 'f', 'g1', 'g2', 'h', 'i', 'j', 'k', 'l', 'm'],
	16: ['a1', 'a2', 'b', 'c', 'd1', 'd2', 'e', 'f', 'g1', 'g2', 'h', 'i', 'j', 'k', 'l', 'm']
};

export function checkStarburstProportions(p: SegmentCharacterParams): void {
	if (p.width_mm < 5 * p.stroke_mm + 4 * p.gap_mm)
		throw new GlyphError(
			'the character is too narrow: width must be at least 5 strokes plus 4 gaps'
		);
	if (p.height_mm < 7 * p.stroke_mm + 4 * p.gap_mm)
		throw new GlyphError(
			'the character is too short: height must be at least 7 strokes plus 4 gaps'
		);
}

export function starburstOutlines(
	params: SegmentCharacterParams,
	count: StarburstCount
): Record<string, Contour> {
	checkStarburstProportions(params);
	const frame = segmentFrame(params);
	const outlines = layoutBars(frame, BARS[count]);
	for (const d of DIAGONALS) outlines[d.key] = diagonalContour(frame, d);
	return Object.fromEntries(STARBURST_SEGMENT_NAMES[count].map((k) => [k, outlines[k]]));
}

export function generateStarburst(
	input: SegmentCharacterInput,
	options: { count: StarburstCount; namePrefix?: string }
): GeneratedGroup {
	const params = segmentCharacterSchema.parse(input);
	const outlines = starburstOutlines(params, options.count);
	const prefix = options.namePrefix ?? '';
	const parts: ElectrodeDraft[] = STARBURST_SEGMENT_NAMES[options.count].map((key) => ({
		key,
		name: `${prefix}${key.toUpperCase()}`,
		kind: 'segment',
		outline: outlines[key],
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
	const kind = options.count === 14 ? 'fourteen-segment' : 'sixteen-segment';
	return { kind, params, name: `${options.count}-segment character`, idPrefix: 'char', parts };
}
