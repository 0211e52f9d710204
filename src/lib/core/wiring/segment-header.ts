/**
 * The firmware segment map as a C header a firmware engineer can paste in (C99, <stdint.h>):
 *  - `LCD_COMMONS`, `LCD_LINES`: the display's size;
 *  - `lcd_bit_t {com, seg}`: one crossing, 0-based (COM1 = 0, SEG1 = 0), `LCD_UNWIRED` when none;
 *  - `LCD_E_<NAME>` indices and `lcd_electrode_bits[]`: every electrode's crossing;
 *  - `lcd_digit_bits[digit][8]`: the 7-segment groups, segments in the order a b c d e f g dp;
 *  - `lcd_font_chars` / `lcd_font_segments`: 0–9, A–F and the minus sign, bit 0 = a … bit 6 = g.
 * Lighting a character: for each set bit i of its font entry, set RAM[com][seg] of
 * `lcd_digit_bits[digit][i]`. Identifiers are plain upper-case words made from electrode names.
 */
import type { Design } from '../design/schema';
import { segmentsFor } from '../glyphs/segment-charsets';
import { segmentMap, type SegmentBit } from './segment-map';

export const FONT_CHARS = '0123456789ABCDEF-';
const DIGIT_ORDER = ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'dp'] as const;

function identifiers(names: readonly string[]): string[] {
	const used = new Set<string>();
	return names.map((name) => {
		const stem =
			name
				.toUpperCase()
				.replace(/[^A-Z0-9]+/g, '_')
				.replace(/^_+|_+$/g, '')
				.slice(0, 40) || 'X';
		let id = stem;
		for (let n = 2; used.has(id); n++) id = `${stem}_${n}`;
		used.add(id);
		return id;
	});
}

/** Text safe inside a C block comment. */
const commentText = (text: string) => text.replace(/\*\//g, '* /').replace(/[\r\n]+/g, ' ');

const bitText = (bit: SegmentBit | undefined) =>
	bit && bit.common !== null && bit.line !== null
		? `{ ${bit.common}, ${bit.line} }`
		: '{ LCD_UNWIRED, LCD_UNWIRED }';

export function fontMask(char: string): number {
	const segs = segmentsFor(char, 7) ?? [];
	return segs.reduce((mask, s) => mask | (1 << DIGIT_ORDER.indexOf(s as 'a')), 0);
}

export function segmentHeader(design: Design): string {
	const maps = segmentMap(design);
	const all = maps.flatMap((m) => m.bits);
	const ids = identifiers(all.map((b) => b.name));
	const digits = maps.filter((m) => m.kind === 'seven-segment');
	const out: string[] = [
		`/* Segment map of "${commentText(design.name)}": ${design.commons.length} commons, ${design.segmentLines.length} segment lines.`,
		' * Crossings are 0-based: com 0 is COM1, seg 0 is SEG1. Generated from the design file;',
		' * change the design, not this header. */',
		'#ifndef LCD_SEGMENT_MAP_H',
		'#define LCD_SEGMENT_MAP_H',
		'',
		'#include <stdint.h>',
		'',
		`#define LCD_COMMONS ${design.commons.length}`,
		`#define LCD_LINES ${design.segmentLines.length}`,
		'#define LCD_UNWIRED 0xFFFFu',
		'',
		'typedef struct {',
		'\tuint16_t com;',
		'\tuint16_t seg;',
		'} lcd_bit_t;',
		'',
		`#define LCD_ELECTRODES ${all.length}`
	];
	all.forEach((bit, i) => out.push(`#define LCD_E_${ids[i]} ${i} /* ${commentText(bit.name)} */`));
	out.push('', 'static const lcd_bit_t lcd_electrode_bits[LCD_ELECTRODES] = {');
	all.forEach((bit, i) =>
		out.push(`\t${bitText(bit)}${i < all.length - 1 ? ',' : ''} /* ${commentText(bit.name)} */`)
	);
	out.push('};', '', `#define LCD_DIGITS ${digits.length}`);
	if (digits.length > 0) {
		out.push('/* 7-segment groups, segments a b c d e f g dp. */');
		out.push('static const lcd_bit_t lcd_digit_bits[LCD_DIGITS][8] = {');
		digits.forEach((digit, d) => {
			const row = DIGIT_ORDER.map((key) => bitText(digit.bits.find((b) => b.segment === key)));
			out.push(
				`\t{ ${row.join(', ')} }${d < digits.length - 1 ? ',' : ''} /* ${commentText(digit.name)} */`
			);
		});
		out.push('};');
	}
	const masks = [...FONT_CHARS].map(fontMask);
	out.push(
		'',
		'/* Characters a 7-segment group shows: bit 0 = a ... bit 6 = g. */',
		`#define LCD_FONT_SIZE ${FONT_CHARS.length}`,
		`static const char lcd_font_chars[LCD_FONT_SIZE + 1] = "${FONT_CHARS}";`,
		'static const uint8_t lcd_font_segments[LCD_FONT_SIZE] = {',
		'\t' + masks.map((m) => `0x${m.toString(16).toUpperCase().padStart(2, '0')}`).join(', '),
		'};',
		'',
		'#endif /* LCD_SEGMENT_MAP_H */',
		''
	);
	return out.join('\n');
}
