import { describe, expect, it } from 'vitest';
import { shapeTightBounds } from '../../src/lib/core/geometry/tight-bounds';
import { GlyphError } from '../../src/lib/core/glyphs/glyph-types';
import { layoutText } from '../../src/lib/core/glyphs/text-layout';
import { closestPair, TOLERANCE_mm } from './measure';

const font = { height_mm: 10, width_mm: 6, stroke_mm: 1, gap_mm: 0.12 };
const keys = (text: string, extra = {}) =>
	layoutText({ ...font, text, ...extra }).parts.map((p) => p.key);

describe('text placer', () => {
	it('lays out -12.5° as a minus sign, three 7-segment digits, a decimal point and a degree ring', () => {
		const g = layoutText({ ...font, text: '-12.5°', slant_deg: 8 });
		expect(g.kind).toBe('text');
		const k = g.parts.map((p) => p.key);
		expect(k.filter((x) => x.endsWith('.minus'))).toEqual(['c0.minus']);
		expect(k.filter((x) => /^c[1-3]\.[a-g]$/.test(x))).toHaveLength(21);
		expect(k.filter((x) => x.endsWith('.dp'))).toEqual(['c2.dp']);
		expect(k.filter((x) => x.endsWith('.degree'))).toEqual(['c3.degree']);
		expect(g.parts.find((p) => p.key === 'c3.degree')!.holes).toHaveLength(1);
		expect(g.parts).toHaveLength(24);
		const closest = closestPair(g.parts);
		expect(closest.gap, closest.pair).toBeGreaterThanOrEqual(0.12 - TOLERANCE_mm);
	});

	it('attaches colons to the character before and makes room for them', () => {
		const g = layoutText({ ...font, text: '12:34', pitch_mm: 7 });
		expect(g.parts.filter((p) => p.key.startsWith('c1.colon')).map((p) => p.name)).toEqual([
			'COL2 upper',
			'COL2 lower'
		]);
		const left = (key: string) => shapeTightBounds(g.parts.find((p) => p.key === key)!).minX;
		expect(left('c1.f')).toBeCloseTo(left('c0.f') + 7, 9);
		expect(left('c2.f')).toBeGreaterThan(left('c1.colon1') + 1);
		expect(closestPair(g.parts).gap).toBeGreaterThanOrEqual(0.12 - TOLERANCE_mm);
		expect(g.params.pitch_mm).toBe(7);
	});

	it('chooses 7 segments for digits and 14 when letters need it, or the forced style', () => {
		expect(keys('12').filter((k) => k.startsWith('c0.'))).toEqual([
			'c0.a',
			'c0.b',
			'c0.c',
			'c0.d',
			'c0.e',
			'c0.f',
			'c0.g'
		]);
		const wide = { width_mm: 7 };
		expect(keys('MENU', wide).filter((k) => k.startsWith('c0.'))).toHaveLength(14);
		expect(keys('AB', { ...wide, segments: '16' }).filter((k) => k.startsWith('c0.'))).toHaveLength(
			16
		);
		expect(() => keys('HOME', { segments: '7' })).toThrow(
			"a 7-segment character cannot show 'M' (position 3)"
		);
		expect(() => keys('1ä')).toThrow("no segment style can show 'ä' (position 2)");
		expect(() => keys('.5')).toThrow(GlyphError);
	});

	it('in legend mode builds only the lit segments', () => {
		const seven = layoutText({ ...font, text: 'SET', mode: 'legend' });
		expect(seven.parts.filter((p) => p.key.startsWith('c2.')).map((p) => p.key)).toEqual([
			'c2.d',
			'c2.e',
			'c2.f',
			'c2.g'
		]);
		const g = layoutText({ ...font, text: 'SET', mode: 'legend', width_mm: 7, segments: '14' });
		expect(g.parts.filter((p) => p.key.startsWith('c2.')).map((p) => p.key)).toEqual([
			'c2.a',
			'c2.i',
			'c2.l'
		]);
		expect(layoutText({ ...font, text: '-1', mode: 'legend' }).parts.map((p) => p.key)).toEqual([
			'c0.g',
			'c1.b',
			'c1.c'
		]);
		expect(() => layoutText({ ...font, text: '   ', mode: 'legend' })).toThrow(/nothing to draw/);
	});
});
