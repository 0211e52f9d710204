/**
 * A small stroke font for unit labels (kWh, m³, °C, %). Letters are drawn with strokes of one
 * width on a grid where the cap height is 10 units (baseline y = 10, top y = 0): straight strokes
 * with flat ends, circular arcs, full rings, and round joins (a disc where strokes meet). Each
 * letter is united into outlines; a letter that stays in several islands gives several parts.
 */
import type { Shape } from '../../geometry/shape';
import { transformShape, translation, composeAffine, scalingAbout } from '../../geometry/affine';
import type { ElectrodeDraft } from '../glyph-types';
import { circle, part, ring, shape, strokeArc, strokeLine, unite, pt } from './icon-drawing';

type Stroke =
	| { line: [number, number, number, number] }
	| { arc: { cx: number; cy: number; r: number; from_deg: number; sweep_deg: number } }
	| { ring: { cx: number; cy: number; r: number } }
	| { join: [number, number] };

export interface StrokeLetter {
	readonly width: number;
	readonly strokes: readonly Stroke[];
}

export const STROKE_LETTERS: Readonly<Record<string, StrokeLetter>> = {
	k: {
		width: 5.6,
		strokes: [
			{ line: [0.8, 0, 0.8, 10] },
			{ line: [0.8, 7, 5.2, 3] },
			{ line: [2.6, 5.4, 5.4, 10] }
		]
	},
	W: {
		width: 9.4,
		strokes: [
			{ line: [0.8, 0, 2.7, 10] },
			{ line: [2.7, 10, 4.7, 2.6] },
			{ line: [4.7, 2.6, 6.7, 10] },
			{ line: [6.7, 10, 8.6, 0] },
			{ join: [2.7, 10] },
			{ join: [4.7, 2.6] },
			{ join: [6.7, 10] }
		]
	},
	h: {
		width: 5.6,
		strokes: [
			{ line: [0.8, 0, 0.8, 10] },
			{ arc: { cx: 2.85, cy: 5.2, r: 2.05, from_deg: 180, sweep_deg: 180 } },
			{ line: [4.9, 5.2, 4.9, 10] }
		]
	},
	m: {
		width: 8.2,
		strokes: [
			{ line: [0.8, 3, 0.8, 10] },
			{ arc: { cx: 2.45, cy: 4.9, r: 1.65, from_deg: 180, sweep_deg: 180 } },
			{ line: [4.1, 4.9, 4.1, 10] },
			{ arc: { cx: 5.75, cy: 4.9, r: 1.65, from_deg: 180, sweep_deg: 180 } },
			{ line: [7.4, 4.9, 7.4, 10] }
		]
	},
	'³': {
		width: 3.4,
		strokes: [
			{ arc: { cx: 1.6, cy: 1.25, r: 1.25, from_deg: 210, sweep_deg: 240 } },
			{ arc: { cx: 1.6, cy: 3.75, r: 1.25, from_deg: 270, sweep_deg: 240 } },
			{ join: [1.6, 2.5] }
		]
	},
	'°': { width: 3.6, strokes: [{ ring: { cx: 1.8, cy: 1.8, r: 1.3 } }] },
	C: { width: 7.6, strokes: [{ arc: { cx: 4.6, cy: 5, r: 4.2, from_deg: 320, sweep_deg: -280 } }] },
	'%': {
		width: 8.4,
		strokes: [
			{ ring: { cx: 2.8, cy: 2.9, r: 1.5 } },
			{ ring: { cx: 5.6, cy: 7.1, r: 1.5 } },
			{ line: [7.4, 0, 1, 10] }
		]
	}
};

function letterShapes(letter: StrokeLetter, stroke: number): Shape[] {
	const pieces: Shape[] = letter.strokes.map((s) => {
		if ('line' in s)
			return shape(strokeLine(pt(s.line[0], s.line[1]), pt(s.line[2], s.line[3]), stroke));
		if ('arc' in s)
			return shape(
				strokeArc({
					c: pt(s.arc.cx, s.arc.cy),
					r: s.arc.r,
					from_deg: s.arc.from_deg,
					sweep_deg: s.arc.sweep_deg,
					width: stroke
				})
			);
		if ('ring' in s)
			return ring(pt(s.ring.cx, s.ring.cy), s.ring.r + stroke / 2, s.ring.r - stroke / 2);
		return shape(circle(pt(s.join[0], s.join[1]), stroke / 2));
	});
	return unite(...pieces);
}

/**
 * Lays out a label on the icon grid: letters with `spacing` between them, scaled to fit
 * `maxWidth` × `maxHeight` units (cap height 10 before scaling) and centred in the 24-unit box.
 */
export function strokeLabel(options: {
	text: string;
	stroke: number;
	spacing: number;
	name: string;
}): ElectrodeDraft[] {
	const letters = [...options.text].map((ch) => {
		const letter = STROKE_LETTERS[ch];
		if (!letter) throw new Error(`the stroke font has no '${ch}'`);
		return letter;
	});
	const width =
		letters.reduce((sum, l) => sum + l.width, 0) + options.spacing * (letters.length - 1);
	const k = Math.min(22 / width, 1.3);
	const parts: ElectrodeDraft[] = [];
	let x = 0;
	letters.forEach((letter, i) => {
		const m = composeAffine(
			translation(x, 0),
			composeAffine(
				scalingAbout({ sx: k, sy: k, centre: pt(0, 0) }),
				translation((24 - width * k) / 2, 12 - 5 * k)
			)
		);
		const islands = letterShapes(letter, options.stroke).map((s) => transformShape(m, s));
		islands.forEach((s, j) => {
			const key = `letter${i + 1}${islands.length > 1 ? `.${j + 1}` : ''}`;
			parts.push(part(key, `${options.name} ${[...options.text][i]}`, s));
		});
		x += letter.width + options.spacing;
	});
	return parts;
}
