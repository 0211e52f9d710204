/**
 * The firmware header decoded back: compiled and run with the system C compiler when there is one
 * (else read back by a parser), it lights "12:34" on the demo. The expected segments are the usual
 * 7-segment patterns (common practice): 1 = b c; 2 = a b g e d; 3 = a b g c d; 4 = f g b c; and the
 * two colon dots.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';
import { applyPatch } from '../../src/lib/core/commands/patch';
import { autoAssign } from '../../src/lib/core/commands/auto-assign';
import { clearWiring } from '../../src/lib/core/commands/clear-wiring';
import { segmentHeader } from '../../src/lib/core/wiring/segment-header';
import { segmentMapCsv } from '../../src/lib/core/wiring/segment-map-csv';
import { parseCsv } from './csv-parse';

const PATTERNS: Record<string, string> = { '1': 'bc', '2': 'abged', '3': 'abgcd', '4': 'fgbc' };
const expectedLit = (text: string) =>
	new Set([
		...[...text].flatMap((ch, d) => [...PATTERNS[ch]].map((s) => `d${d + 1}${s}`)),
		'colU',
		'colL'
	]);

/** Electrode ids at the lit (com, seg) crossings. */
function electrodesAt(design: Design, crossings: [number, number][]): Set<string> {
	return new Set(
		crossings.map(([com, seg]) => {
			const hits = design.electrodes.filter(
				(e) => e.common === design.commons[com].id && e.line === design.segmentLines[seg].id
			);
			expect(hits).toHaveLength(1);
			return hits[0].id;
		})
	);
}

const PROGRAM = `#include <stdio.h>
#include <string.h>
#include "segmap.h"
static uint8_t ram[LCD_COMMONS][LCD_LINES];
static void light(lcd_bit_t b) { if (b.com != LCD_UNWIRED) ram[b.com][b.seg] = 1; }
int main(void) {
	const char *text = "1234";
	for (int d = 0; d < 4; d++) {
		const char *at = strchr(lcd_font_chars, text[d]);
		uint8_t mask = lcd_font_segments[at - lcd_font_chars];
		for (int i = 0; i < 8; i++) if ((mask >> i) & 1) light(lcd_digit_bits[d][i]);
	}
	light(lcd_electrode_bits[LCD_E_COL_UPPER]);
	light(lcd_electrode_bits[LCD_E_COL_LOWER]);
	for (int c = 0; c < LCD_COMMONS; c++)
		for (int s = 0; s < LCD_LINES; s++) if (ram[c][s]) printf("%d %d\\n", c, s);
	return 0;
}
`;

function compiler(): string | null {
	for (const cc of ['cc', 'gcc', 'clang'])
		if (spawnSync(cc, ['--version'], { stdio: 'ignore' }).status === 0) return cc;
	return null;
}

function litByCompiledHeader(header: string, cc: string): [number, number][] {
	const dir = mkdtempSync(join(tmpdir(), 'segmap-'));
	writeFileSync(join(dir, 'segmap.h'), header);
	writeFileSync(join(dir, 'main.c'), PROGRAM);
	const exe = join(dir, 'light');
	execFileSync(cc, [
		'-std=c99',
		'-Wall',
		'-Wextra',
		'-pedantic',
		'-Werror',
		'-o',
		exe,
		join(dir, 'main.c')
	]);
	return execFileSync(exe, { encoding: 'utf8' })
		.trim()
		.split('\n')
		.map((l) => l.split(' ').map(Number) as [number, number]);
}

/** Reads the header's tables as text, independent of a compiler. */
function litByParsedHeader(header: string): [number, number][] {
	const pair = /\{ (\d+|LCD_UNWIRED), (\d+|LCD_UNWIRED) \}/g;
	const table = (name: string) =>
		header.slice(header.indexOf(name), header.indexOf('};', header.indexOf(name)));
	const digitRows = table('lcd_digit_bits')
		.split('\n')
		.slice(1)
		.map((row) => [...row.matchAll(pair)].map((m) => [m[1], m[2]]));
	const chars = /lcd_font_chars\[[^\]]*\] = "([^"]*)"/.exec(header)![1];
	const masks = table('lcd_font_segments[')
		.split('{')[1]
		.split(',')
		.map((v) => parseInt(v, 16));
	const lit: [number, number][] = [];
	[...'1234'].forEach((ch, d) => {
		const mask = masks[chars.indexOf(ch)];
		digitRows[d].forEach(([c, s], i) => {
			if ((mask >> i) & 1 && c !== 'LCD_UNWIRED') lit.push([Number(c), Number(s)]);
		});
	});
	const electrodeRows = table('lcd_electrode_bits').split('\n').slice(1);
	for (const name of ['COL_UPPER', 'COL_LOWER']) {
		const index = Number(new RegExp(`#define LCD_E_${name} (\\d+)`).exec(header)![1]);
		const m = /\{ (\d+), (\d+) \}/.exec(electrodeRows[index])!;
		lit.push([Number(m[1]), Number(m[2])]);
	}
	return lit;
}

const wiredAt = (commons: number) => {
	const cleared = applyPatch(demoDesign(), clearWiring(demoDesign()));
	return applyPatch(cleared, autoAssign(cleared, { commons }));
};

describe('firmware header', () => {
	const designs: [string, Design][] = [
		['demo as drawn', demoDesign()],
		['demo auto-wired at 3 commons', wiredAt(3)],
		['demo auto-wired at 4 commons', wiredAt(4)]
	];

	it.each(designs)('lights "12:34" on the %s when read back by a parser', (_, design) => {
		const lit = litByParsedHeader(segmentHeader(design));
		expect(electrodesAt(design, lit)).toEqual(expectedLit('1234'));
	});

	const cc = compiler();
	it.skipIf(!cc).each(designs)('lights "12:34" on the %s when compiled and run', (_, design) => {
		const lit = litByCompiledHeader(segmentHeader(design), cc!);
		expect(electrodesAt(design, lit)).toEqual(expectedLit('1234'));
	});

	it('encodes 0–9, A–F and minus as the usual 7-segment patterns', () => {
		// Common practice, bit 0 = a … bit 6 = g: 0 → 0x3F, 1 → 0x06, … F → 0x71, minus → 0x40.
		const expected =
			'0x3F, 0x06, 0x5B, 0x4F, 0x66, 0x6D, 0x7D, 0x07, 0x7F, 0x6F, 0x77, 0x7C, 0x39, 0x5E, 0x79, 0x71, 0x40';
		expect(segmentHeader(demoDesign())).toContain(expected);
	});
});

describe('segment map CSV', () => {
	it('gives each digit segment its COM/SEG bit, consistent with the design', () => {
		const design = wiredAt(4);
		const rows = parseCsv(segmentMapCsv(design));
		expect(rows[0]).toEqual([
			'group',
			'segment',
			'electrode_id',
			'electrode',
			'common',
			'line',
			'com_index',
			'seg_index'
		]);
		const body = rows.slice(1);
		expect(body).toHaveLength(design.electrodes.length);
		const d2g = body.find((r) => r[2] === 'd2g')!;
		expect(d2g.slice(0, 2)).toEqual(['Digit 2', 'g']);
		const e = design.electrodes.find((x) => x.id === 'd2g')!;
		expect(design.commons[Number(d2g[6])].id).toBe(e.common);
		expect(design.segmentLines[Number(d2g[7])].id).toBe(e.line);
		expect(d2g[4]).toBe(`COM${Number(d2g[6]) + 1}`);
	});
});

describe('header identifiers', () => {
	const odd = (): Design => {
		const demo = demoDesign();
		return {
			...demo,
			electrodes: demo.electrodes.map((e, i) =>
				i === 0 ? { ...e, name: 'Batt 1 */ x' } : i === 1 ? { ...e, name: 'Batt-1 */' } : e
			)
		};
	};

	it('are unique C identifiers, and odd names cannot end a comment early', () => {
		const header = segmentHeader(odd());
		const names = [...header.matchAll(/#define (LCD_E_\w+) \d+/g)].map((m) => m[1]);
		expect(new Set(names).size).toBe(names.length);
		expect(names).toContain('LCD_E_BATT_1_X');
		expect(names).toContain('LCD_E_BATT_1');
		for (const n of names) expect(n).toMatch(/^[A-Z_][A-Z0-9_]*$/);
	});

	const cc = compiler();
	it.skipIf(!cc)('compile cleanly with odd electrode names', () => {
		const lit = litByCompiledHeader(segmentHeader(odd()), cc!);
		expect(lit.length).toBeGreaterThan(0);
	});
});
