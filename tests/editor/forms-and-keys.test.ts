import { describe, expect, it } from 'vitest';
import { formatMeasure, parseMeasure } from '$lib/editor/parse-measure';
import {
	BAR_FIELDS,
	TEXT_DEFAULTS,
	TEXT_FIELDS,
	fieldsForParams,
	formValues,
	readForm
} from '$lib/editor/generator-forms';
import { chordOf, describeChord, normaliseChord } from '$lib/editor/keymap';
import { ACTIONS, actionForChord, isEnabled } from '$lib/editor/actions';
import { TOOLS } from '$lib/editor/tools/tool-ids';
import { runGenerator } from '$lib/core/glyphs/generator-registry';

const key = (
	k: string,
	mods: Partial<{ ctrl: boolean; shift: boolean; alt: boolean; meta: boolean }> = {}
) => ({
	key: k,
	ctrlKey: !!mods.ctrl,
	metaKey: !!mods.meta,
	altKey: !!mods.alt,
	shiftKey: !!mods.shift
});

describe('measurement entry', () => {
	it('reads numbers with a decimal comma or the field’s unit', () => {
		expect(parseMeasure('12.5')).toEqual({ ok: true, value: 12.5 });
		expect(parseMeasure(' 3,25 ', { unit: 'mm' })).toEqual({ ok: true, value: 3.25 });
		expect(parseMeasure('4 mm', { unit: 'mm' })).toEqual({ ok: true, value: 4 });
		expect(parseMeasure('-15°', { unit: '°' })).toEqual({ ok: true, value: -15 });
		expect(parseMeasure('.5')).toEqual({ ok: true, value: 0.5 });
	});

	it('says why it refuses', () => {
		expect(parseMeasure('')).toEqual({ ok: false, reason: 'enter a number' });
		expect(parseMeasure('abc')).toEqual({ ok: false, reason: '"abc" is not a number' });
		expect(parseMeasure('1e999')).toEqual({ ok: false, reason: 'the number is too large' });
		expect(parseMeasure('NaN')).toMatchObject({ ok: false });
		expect(parseMeasure('0', { positive: true })).toEqual({ ok: false, reason: 'must be above 0' });
		expect(parseMeasure('30', { max: 25 })).toEqual({ ok: false, reason: 'at most 25' });
		expect(parseMeasure('5 °', { unit: 'mm' })).toMatchObject({ ok: false });
	});

	it('prints without float noise, NaN or negative zero', () => {
		expect(formatMeasure(0.1 + 0.2)).toBe('0.3');
		expect(formatMeasure(-0.0000001)).toBe('0');
		expect(formatMeasure(NaN)).toBe('—');
		expect(formatMeasure(12)).toBe('12');
	});
});

describe('generator forms', () => {
	it('the default text form produces a valid readout', () => {
		const read = readForm(TEXT_FIELDS, formValues({ ...TEXT_DEFAULTS, x_mm: 5, y_mm: 6 }));
		expect(read.ok).toBe(true);
		if (!read.ok) return;
		const generated = runGenerator('text', read.params);
		expect(generated.parts.length).toBeGreaterThan(10);
	});

	it('marks bad fields and leaves out empty optional ones', () => {
		const values = {
			...formValues({
				count: 8,
				width_mm: 2,
				height_mm: 4,
				spacing_mm: 0.4,
				direction: 'right',
				shape: 'rectangle',
				x_mm: 0,
				y_mm: 0
			})
		};
		values.count = '2.5';
		values.width_mm = 'wide';
		const read = readForm(BAR_FIELDS, values);
		expect(read).toEqual({
			ok: false,
			errors: { count: 'enter a whole number', width_mm: '"wide" is not a number' }
		});
		const optional = readForm(fieldsForParams({ pitch_mm: 3 }), { pitch_mm: '' });
		expect(optional).toEqual({ ok: true, params: {} });
	});

	it('builds an edit form from stored parameters, keeping the icon id out of it', () => {
		const fields = fieldsForParams({ icon: 'droplet', size_mm: 6, x_mm: 1, y_mm: 2, extra: true });
		expect(fields.map((f) => f.key)).toEqual(['size_mm', 'x_mm', 'y_mm', 'extra']);
		expect(fields[3].kind).toBe('flag');
	});
});

describe('keyboard chords', () => {
	it('normalise events and written chords alike', () => {
		expect(chordOf(key('Z', { ctrl: true, shift: true }))).toBe('mod+shift+z');
		expect(chordOf(key('z', { meta: true }))).toBe('mod+z');
		expect(chordOf(key('?', { shift: true }))).toBe('?');
		expect(chordOf(key('+', { shift: true }))).toBe('plus');
		expect(chordOf(key('ArrowLeft', { alt: true }))).toBe('alt+arrowleft');
		expect(normaliseChord('Shift+Mod+Z')).toBe('mod+shift+z');
		expect(describeChord('mod+shift+z')).toBe('Ctrl+Shift+Z');
		expect(describeChord('mod+z', true)).toBe('⌘Z');
	});

	it('every chord belongs to exactly one action; tools take the digits in rail order', () => {
		const seen = new Map<string, string>();
		for (const a of ACTIONS)
			for (const c of a.chords) {
				expect(seen.get(c), `${c} is used by ${seen.get(c)} and ${a.id}`).toBeUndefined();
				seen.set(c, a.id);
			}
		const keyed = TOOLS.filter((t) => t.key);
		expect(keyed.map((t) => t.key)).toEqual(['1', '2', '3', '4', '5', '6', '7', '8', '9']);
		for (const t of keyed) expect(actionForChord(t.key)?.id).toBe(`tool-${t.id}`);
		// Panning has no tool key: Space or the middle button.
		expect(TOOLS.find((t) => t.id === 'pan')!.key).toBe('');
		// No single letter picks a tool.
		for (const letter of 'abcdefghijklmnopqrstuvwxyz')
			expect(actionForChord(letter)?.id ?? '').not.toMatch(/^tool-/);
		expect(actionForChord(chordOf(key('Home', {})))?.id).toBe('fit-all');
		expect(actionForChord(chordOf(key('Home', { shift: true })))?.id).toBe('true-size');
		expect(actionForChord(chordOf(key('y', { ctrl: true })))?.id).toBe('redo');
		expect(actionForChord(chordOf(key('z', { ctrl: true, shift: true })))?.id).toBe('redo');
	});

	it('enables actions by selection size and history', () => {
		const env = { selection: new Set(['a']), canUndo: false, canRedo: true };
		const byId = (id: string) => ACTIONS.find((a) => a.id === id)!;
		expect(isEnabled(byId('undo'), env)).toBe(false);
		expect(isEnabled(byId('redo'), env)).toBe(true);
		expect(isEnabled(byId('delete'), env)).toBe(true);
		expect(isEnabled(byId('group'), env)).toBe(false);
		expect(isEnabled(byId('distribute-h'), { ...env, selection: new Set(['a', 'b', 'c']) })).toBe(
			true
		);
	});
});
