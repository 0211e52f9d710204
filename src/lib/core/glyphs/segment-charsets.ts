/**
 * Which segments each character lights, for 7, 14 and 16 segments (segment names as in
 * seven-segment.ts and starburst-segments.ts). The 16-segment table is the 14-segment one with a
 * split into a1 a2 and d into d1 d2. Letters on 14/16 segments are upper case; lower case maps to
 * them. The 7-segment table has the letters a 7-segment digit can suggest, case-sensitive where
 * both forms exist (b and B differ only by lookup fallback).
 */
import { SEVEN_SEGMENT_CHARSET } from './seven-segment';

export type SegmentCount = 7 | 14 | 16;

// prettier-ignore
const FOURTEEN: Readonly<Record<string, string>> = {
	'0': 'a b c d e f j m', '1': 'b c j', '2': 'a b d e g1 g2', '3': 'a b c d g2', '4': 'b c f g1 g2',
	'5': 'a c d f g1 g2', '6': 'a c d e f g1 g2', '7': 'a b c', '8': 'a b c d e f g1 g2', '9': 'a b c d f g1 g2',
	A: 'a b c e f g1 g2', B: 'a b c d g2 i l', C: 'a d e f', D: 'a b c d i l', E: 'a d e f g1 g2', F: 'a e f g1',
	G: 'a c d e f g2', H: 'b c e f g1 g2', I: 'a d i l', J: 'b c d e', K: 'e f g1 j k', L: 'd e f', M: 'b c e f h j',
	N: 'b c e f h k', O: 'a b c d e f', P: 'a b e f g1 g2', Q: 'a b c d e f k', R: 'a b e f g1 g2 k', S: 'a c d f g1 g2',
	T: 'a i l', U: 'b c d e f', V: 'e f j m', W: 'b c e f k m', X: 'h j k m', Y: 'h j l', Z: 'a d j m',
	' ': '', '-': 'g1 g2', '+': 'g1 g2 i l', '*': 'g1 g2 h i j k l m', '/': 'j m', '\\': 'h k', '<': 'j k', '>': 'h m',
	'(': 'j k', ')': 'h m', '=': 'd g1 g2', _: 'd', '|': 'i l', "'": 'j', '"': 'f i', $: 'a c d f g1 g2 i l', '#': 'b c d g1 g2 i l',
	'?': 'a b g2 l', '!': 'b c', '%': 'c f g1 g2 j m', '&': 'a d e g1 h j k', '@': 'a b d e f g2 i'
};

const split16 = (segments: string) =>
	segments
		.split(' ')
		.flatMap((s) => (s === 'a' ? ['a1', 'a2'] : s === 'd' ? ['d1', 'd2'] : s === '' ? [] : [s]));

const FOURTEEN_SPLIT = Object.fromEntries(
	Object.entries(FOURTEEN).map(([ch, segs]) => [ch, segs === '' ? [] : segs.split(' ')])
);
const SIXTEEN = Object.fromEntries(
	Object.entries(FOURTEEN).map(([ch, segs]) => [ch, split16(segs)])
);

/** Segments lit for `char`, or null when this segment count cannot show it. */
export function segmentsFor(char: string, count: SegmentCount): readonly string[] | null {
	if (count === 7) {
		const segs =
			SEVEN_SEGMENT_CHARSET[char] ??
			SEVEN_SEGMENT_CHARSET[char.toLowerCase()] ??
			SEVEN_SEGMENT_CHARSET[char.toUpperCase()];
		return segs === undefined ? null : [...segs];
	}
	const table = count === 14 ? FOURTEEN_SPLIT : SIXTEEN;
	return table[char.toUpperCase()] ?? null;
}

export const canShow = (char: string, count: SegmentCount): boolean =>
	segmentsFor(char, count) !== null;
