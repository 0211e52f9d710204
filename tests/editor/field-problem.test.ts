import { describe, expect, it } from 'vitest';
import { runGenerator } from '../../src/lib/core/glyphs/generator-registry';
import {
	fieldMessage,
	generatorProblem,
	labelOfKey,
	wordedReason
} from '../../src/lib/editor/field-problem';
import { TEXT_DEFAULTS, TEXT_FIELDS, readForm } from '../../src/lib/editor/generator-forms';

const refusal = (params: Record<string, unknown>) => {
	try {
		runGenerator('text', params);
	} catch (error) {
		return error;
	}
	throw new Error('the generator accepted the parameters');
};

describe('dialog problems in the user’s words', () => {
	it('puts a generator’s refusal on the field it concerns, by its label and unit', () => {
		const problem = generatorProblem(refusal({ ...TEXT_DEFAULTS, gap_mm: 0 }), TEXT_FIELDS);
		expect(problem.errors).toEqual({ gap_mm: 'enter a number above 0 mm' });
		expect(problem.problem).toBe('Gap: enter a number above 0 mm');
		expect(problem.problem).not.toMatch(/gap_mm|text:/);
	});

	it('marks the width when the digit is too narrow for its strokes', () => {
		const problem = generatorProblem(
			refusal({ ...TEXT_DEFAULTS, text: '88', segments: '7', width_mm: 2, stroke_mm: 1 }),
			TEXT_FIELDS
		);
		expect(Object.keys(problem.errors)).toEqual(['width_mm']);
		expect(problem.problem).toMatch(/^Width: too narrow/);
	});

	it('words parser limits with the unit, and reads typed text field by field', () => {
		expect(wordedReason('at least 0', 'mm')).toBe('enter at least 0 mm');
		expect(wordedReason('at most 25', '°')).toBe('enter at most 25°');
		expect(wordedReason('must be above 0', 'mm')).toBe('enter a number above 0 mm');
		expect(fieldMessage({ key: 'x', label: 'Step across', unit: 'mm' }, 'enter a number')).toBe(
			'Step across: enter a number'
		);
		const read = readForm(TEXT_FIELDS, {
			...Object.fromEntries(Object.entries(TEXT_DEFAULTS).map(([k, v]) => [k, String(v)])),
			height_mm: '-2',
			x_mm: '0',
			y_mm: '0'
		});
		expect(read.ok).toBe(false);
		if (!read.ok) expect(read.errors).toEqual({ height_mm: 'enter at least 0 mm' });
	});

	it('labels parameters that have no descriptor from their names, never as the name itself', () => {
		expect(labelOfKey('cornerRadius_mm')).toEqual({
			key: 'cornerRadius_mm',
			label: 'Corner radius',
			unit: 'mm'
		});
		expect(labelOfKey('tilt_deg').label).toBe('Tilt');
	});
});
