/**
 * The text placer: a string such as `-12.5°` or `12:34` becomes a row of segmented characters at a
 * fixed pitch. '.', ':' and '°' are not characters of their own: each becomes small electrodes
 * (a decimal point, two colon dots, a degree ring) attached to the character before it and placed
 * in the space after it (the pitch grows when they need more room).
 *
 * mode 'readout' (default) builds every segment of each character position, for a display that
 * will show changing values; '-' is then a stand-alone minus sign and ' ' an empty position.
 * mode 'legend' builds only the segments each character lights, for fixed text on the glass.
 * segments 'auto' picks 7 segments when every character can be shown so, else 14, else 16; a
 * character the chosen style cannot show is an error that names it and its position.
 *
 * Part keys: `c<i>.<segment>`, `c<i>.dp`, `c<i>.colon1`, `c<i>.colon2`, `c<i>.degree`,
 * `c<i>.minus` with i the 0-based character position.
 */
import { z } from 'zod';
import type { Contour } from '../design/schema';
import { GlyphError, type ElectrodeDraft, type GeneratedGroup } from './glyph-types';
import { degreeRing, dotContour, markSpacing } from './marks';
import { minusContour } from './mark-generators';
import { segmentsFor, type SegmentCount } from './segment-charsets';
import { segmentCharacterFields, type SegmentCharacterParams } from './segment-params';
import { sevenSegmentOutlines } from './seven-segment';
import { starburstOutlines } from './starburst-segments';

const { decimalPoint: _unused, ...characterFields } = segmentCharacterFields;

export const textSchema = z.object({
	...characterFields,
	text: z.string().min(1, 'expected some text').max(64, 'expected at most 64 characters'),
	pitch_mm: z
		.number()
		.refine((v) => Number.isFinite(v) && v > 0, 'expected a pitch above 0')
		.optional(),
	segments: z.enum(['auto', '7', '14', '16']).default('auto'),
	mode: z.enum(['readout', 'legend']).default('readout')
});
export type TextParams = z.output<typeof textSchema>;

const MARKS = new Set(['.', ':', '°']);

interface Cell {
	char: string;
	position: number;
	marks: string[];
}

function tokenize(text: string): Cell[] {
	const cells: Cell[] = [];
	[...text].forEach((char, position) => {
		if (!MARKS.has(char)) return void cells.push({ char, position, marks: [] });
		const last = cells[cells.length - 1];
		if (!last)
			throw new GlyphError(`'${char}' at position ${position + 1} needs a character before it`, {
				param: 'text'
			});
		last.marks.push(char);
	});
	return cells;
}

const isPlain = (cell: Cell, mode: TextParams['mode']) =>
	mode === 'readout' && (cell.char === '-' || cell.char === ' ');

function chooseCount(cells: readonly Cell[], params: TextParams): SegmentCount {
	const shown = cells.filter((c) => !isPlain(c, params.mode));
	const failing = (count: SegmentCount) => shown.find((c) => segmentsFor(c.char, count) === null);
	if (params.segments !== 'auto') {
		const count = Number(params.segments) as SegmentCount;
		const bad = failing(count);
		if (bad)
			throw new GlyphError(
				`a ${count}-segment character cannot show '${bad.char}' (position ${bad.position + 1})`,
				{ param: 'text' }
			);
		return count;
	}
	for (const count of [7, 14, 16] as const) if (!failing(count)) return count;
	const bad = failing(16)!;
	throw new GlyphError(`no segment style can show '${bad.char}' (position ${bad.position + 1})`, {
		param: 'text'
	});
}

const outlinesFor = (
	params: SegmentCharacterParams,
	count: SegmentCount
): Record<string, Contour> =>
	count === 7 ? sevenSegmentOutlines(params) : starburstOutlines(params, count);

export function layoutText(input: z.input<typeof textSchema>): GeneratedGroup {
	const parsed = textSchema.parse(input);
	const spacing = markSpacing(parsed);
	const pitch = parsed.pitch_mm ?? parsed.width_mm + 2 * spacing + parsed.stroke_mm;
	const params: TextParams = { ...parsed, pitch_mm: pitch };
	const cells = tokenize(params.text);
	const count = chooseCount(cells, params);
	const parts: ElectrodeDraft[] = [];
	const add = (key: string, name: string, outline: Contour, holes: Contour[] = []) =>
		parts.push({ key, name, kind: 'segment', outline, holes });
	const baseline = params.y_mm + params.height_mm;
	let x = params.x_mm;
	cells.forEach((cell, i) => {
		const n = i + 1;
		const charParams: SegmentCharacterParams = { ...params, x_mm: x, decimalPoint: false };
		if (cell.char === '-' && params.mode === 'readout') {
			add(`c${i}.minus`, `MINUS${n}`, minusContour({ ...charParams }));
		} else if (!isPlain(cell, params.mode)) {
			const outlines = outlinesFor(charParams, count);
			const lit = params.mode === 'legend' ? new Set(segmentsFor(cell.char, count)) : null;
			for (const [seg, outline] of Object.entries(outlines)) {
				if (!lit || lit.has(seg)) add(`c${i}.${seg}`, `${n}${seg.toUpperCase()}`, outline);
			}
		}
		let markX = x + params.width_mm + spacing;
		for (const mark of cell.marks) {
			const frame = { baseline, slant_deg: params.slant_deg, style: params.style };
			const size = params.stroke_mm;
			if (mark === '.') {
				add(
					`c${i}.dp`,
					`DP${n}`,
					dotContour({ ...frame, x_mm: markX, y_mm: baseline - size, size_mm: size })
				);
				markX += size + spacing;
			} else if (mark === ':') {
				for (const [k, f] of [
					[1, 0.3],
					[2, 0.7]
				] as const) {
					const y = params.y_mm + f * params.height_mm - size / 2;
					add(
						`c${i}.colon${k}`,
						`COL${n} ${k === 1 ? 'upper' : 'lower'}`,
						dotContour({ ...frame, x_mm: markX, y_mm: y, size_mm: size })
					);
				}
				markX += size + spacing;
			} else {
				const ring = Math.max(2.5 * params.stroke_mm, 0.25 * params.height_mm);
				const r = degreeRing({
					...frame,
					x_mm: markX,
					y_mm: params.y_mm,
					size_mm: ring,
					stroke_mm: params.stroke_mm
				});
				add(`c${i}.degree`, `DEG${n}`, r.outline, r.holes);
				markX += ring + spacing;
			}
		}
		x = Math.max(x + pitch, markX);
	});
	if (parts.length === 0) throw new GlyphError('the text has nothing to draw', { param: 'text' });
	return { kind: 'text', params, name: `Text "${params.text}"`, idPrefix: 'text', parts };
}
