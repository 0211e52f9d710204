/**
 * The picture a load figure is computed for, as each electrode's probability of being on.
 *
 * 'all-on' and 'all-off' are the extremes. 'reading' is a typical changing reading: every
 * electrode is on with the probability that a segment of a 7-segment digit is lit, averaged over
 * the digits 0–9 (49 lit of 70, from the segment table in glyphs/seven-segment.ts), independently
 * of the others. The load's expectation over that random picture is exact (waveform-energy.ts).
 */
import { SEVEN_SEGMENT_CHARSET } from '../glyphs/seven-segment';
import type { LoadPattern } from './load-settings';

const DIGITS = ['0', '1', '2', '3', '4', '5', '6', '7', '8', '9'];

/** Mean fraction of a 7-segment digit's seven segments lit over the digits 0–9. */
export function meanLitFractionOfDigits(): number {
	const lit = DIGITS.reduce((sum, d) => sum + SEVEN_SEGMENT_CHARSET[d].length, 0);
	return lit / (7 * DIGITS.length);
}

export function onProbabilityOf(pattern: LoadPattern): number {
	if (pattern === 'all-on') return 1;
	if (pattern === 'all-off') return 0;
	return meanLitFractionOfDigits();
}

export const PATTERN_LABELS: Readonly<Record<LoadPattern, string>> = {
	'all-on': 'all on',
	'all-off': 'all off',
	reading: 'typical reading'
};
