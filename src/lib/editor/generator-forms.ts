/**
 * Forms for generator parameters: which fields a new text, bar graph or icon asks for, with
 * plain labels, units and defaults; a form for editing any stored generator's parameters built
 * from the parameters themselves; and reading typed text back into parameters, refusing bad
 * input field by field. The generators' own schemas still have the last word.
 */
import type { GeneratorParams, GeneratorParamValue } from '$lib/core/glyphs/glyph-types';
import { parseMeasure } from './parse-measure';
import { labelOfKey, wordedReason } from './field-problem';

export type FieldSpec =
	| {
			key: string;
			label: string;
			kind: 'number';
			unit: 'mm' | '°' | '';
			integer?: boolean;
			min?: number;
			max?: number;
	  }
	| { key: string; label: string; kind: 'text' }
	| {
			key: string;
			label: string;
			kind: 'choice';
			options: readonly { value: string; label: string }[];
	  }
	| { key: string; label: string; kind: 'flag' };

const choice = (key: string, label: string, options: [string, string][]): FieldSpec => ({
	key,
	label,
	kind: 'choice',
	options: options.map(([value, l]) => ({ value, label: l }))
});
const mm = (key: string, label: string, min = 0): FieldSpec => ({
	key,
	label,
	kind: 'number',
	unit: 'mm',
	min
});

const KNOWN: Record<string, FieldSpec> = {
	text: { key: 'text', label: 'Text', kind: 'text' },
	x_mm: { key: 'x_mm', label: 'Left (x)', kind: 'number', unit: 'mm' },
	y_mm: { key: 'y_mm', label: 'Top (y)', kind: 'number', unit: 'mm' },
	height_mm: mm('height_mm', 'Height'),
	width_mm: mm('width_mm', 'Width'),
	stroke_mm: mm('stroke_mm', 'Stroke'),
	gap_mm: mm('gap_mm', 'Gap'),
	pitch_mm: mm('pitch_mm', 'Pitch'),
	size_mm: mm('size_mm', 'Size'),
	spacing_mm: mm('spacing_mm', 'Spacing'),
	radius_mm: mm('radius_mm', 'Corner radius'),
	point_mm: mm('point_mm', 'Point depth'),
	slant_deg: { key: 'slant_deg', label: 'Slant', kind: 'number', unit: '°', min: -25, max: 25 },
	count: { key: 'count', label: 'Bars', kind: 'number', unit: '', integer: true, min: 1, max: 200 },
	style: choice('style', 'Corners', [
		['pointed', 'pointed'],
		['chamfered', 'cut'],
		['square', 'square'],
		['round', 'round']
	]),
	segments: choice('segments', 'Segments', [
		['auto', 'fewest that fit'],
		['7', '7'],
		['14', '14'],
		['16', '16']
	]),
	mode: choice('mode', 'Build', [
		['readout', 'every segment (changing value)'],
		['legend', 'lit segments only (fixed text)']
	]),
	direction: choice('direction', 'Grows', [
		['right', 'to the right'],
		['left', 'to the left'],
		['up', 'upwards'],
		['down', 'downwards']
	]),
	shape: choice('shape', 'Bar shape', [
		['rectangle', 'box'],
		['rounded', 'rounded box'],
		['chevron', 'arrow'],
		['steps', 'rising steps']
	]),
	decimalPoint: { key: 'decimalPoint', label: 'Decimal point', kind: 'flag' }
};

export const TEXT_FIELDS: readonly FieldSpec[] = [
	'text',
	'height_mm',
	'width_mm',
	'stroke_mm',
	'gap_mm',
	'slant_deg',
	'style',
	'segments',
	'mode',
	'x_mm',
	'y_mm'
].map((k) => KNOWN[k]);
export const TEXT_DEFAULTS: GeneratorParams = {
	text: '-12.5°',
	height_mm: 8,
	width_mm: 4.5,
	stroke_mm: 1,
	gap_mm: 0.12,
	slant_deg: 6,
	style: 'pointed',
	segments: 'auto',
	mode: 'readout'
};

export const BAR_FIELDS: readonly FieldSpec[] = [
	'count',
	'width_mm',
	'height_mm',
	'spacing_mm',
	'direction',
	'shape',
	'x_mm',
	'y_mm'
].map((k) => KNOWN[k]);
export const BAR_DEFAULTS: GeneratorParams = {
	count: 8,
	width_mm: 2,
	height_mm: 4,
	spacing_mm: 0.4,
	direction: 'right',
	shape: 'rectangle'
};

/** Fields for editing stored parameters: known keys get their spec, others a plain field by type. */
export function fieldsForParams(params: GeneratorParams): FieldSpec[] {
	return Object.entries(params)
		.filter(([key]) => key !== 'icon')
		.map(([key, value]): FieldSpec => {
			if (KNOWN[key]) return KNOWN[key];
			const { label, unit } = labelOfKey(key);
			if (typeof value === 'boolean') return { key, label, kind: 'flag' };
			if (typeof value === 'number')
				return { key, label, kind: 'number', unit: unit as 'mm' | '°' | '' };
			return { key, label, kind: 'text' };
		});
}

/** Form text for parameters (numbers printed without float noise). */
export function formValues(params: GeneratorParams): Record<string, string> {
	const out: Record<string, string> = {};
	for (const [k, v] of Object.entries(params))
		out[k] = typeof v === 'number' ? String(Number(v.toFixed(6))) : String(v);
	return out;
}

export type FormResult =
	{ ok: true; params: GeneratorParams } | { ok: false; errors: Record<string, string> };

/** Reads typed values; empty optional number fields (pitch, radius, point depth) are left out. */
export function readForm(
	fields: readonly FieldSpec[],
	values: Readonly<Record<string, string>>
): FormResult {
	const params: Record<string, GeneratorParamValue> = {};
	const errors: Record<string, string> = {};
	const optional = new Set(['pitch_mm', 'radius_mm', 'point_mm']);
	for (const f of fields) {
		const raw = values[f.key] ?? '';
		if (f.kind === 'flag') params[f.key] = raw === 'true';
		else if (f.kind === 'text') {
			if (raw.trim() === '') errors[f.key] = 'enter some text';
			else params[f.key] = raw;
		} else if (f.kind === 'choice') {
			if (!f.options.some((o) => o.value === raw)) errors[f.key] = 'choose one';
			else params[f.key] = raw;
		} else {
			if (raw.trim() === '' && optional.has(f.key)) continue;
			const r = parseMeasure(raw, { unit: f.unit || undefined, min: f.min, max: f.max });
			if (!r.ok) errors[f.key] = wordedReason(r.reason, f.unit);
			else if (f.integer && !Number.isInteger(r.value)) errors[f.key] = 'enter a whole number';
			else params[f.key] = r.value;
		}
	}
	return Object.keys(errors).length ? { ok: false, errors } : { ok: true, params };
}
