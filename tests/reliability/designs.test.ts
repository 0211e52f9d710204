/** New designs from templates and download names that follow the design's name. */
import { describe, expect, it } from 'vitest';
import { designFromTemplate, fileNameForDesign } from '../../src/lib/core/design/design-templates';
import { parseDesignValue } from '../../src/lib/core/design/parse-design';
import { parseFieldNumber } from '../../src/lib/editor/parse-field-number';

describe('design templates', () => {
	it('gives a blank glass and the worked example, both valid documents', () => {
		const blank = designFromTemplate('blank', 'Thermostat front');
		expect(blank.name).toBe('Thermostat front');
		expect(blank.electrodes).toHaveLength(0);
		expect(parseDesignValue(JSON.parse(JSON.stringify(blank))).ok).toBe(true);
		const demo = designFromTemplate('demo', 'Copy of example');
		expect(demo.electrodes.length).toBeGreaterThan(0);
		expect(parseDesignValue(JSON.parse(JSON.stringify(demo))).ok).toBe(true);
	});
});

describe('download file names', () => {
	it('follow the design name and drop characters no file system accepts', () => {
		expect(fileNameForDesign('Meter glass rev B')).toBe('Meter glass rev B.sunglyph.json');
		expect(fileNameForDesign('a/b\\c:d*e?"f<g>|h')).toBe('a b c d e f g h.sunglyph.json');
		expect(fileNameForDesign('\u001b[31m..hidden')).toBe('[31m..hidden.sunglyph.json');
		expect(fileNameForDesign('...')).toBe('design.sunglyph.json');
		expect(fileNameForDesign('x'.repeat(500)).length).toBeLessThan(100);
	});
});

describe('number fields read only whole committed text', () => {
	it('refuses what would be a prefix of the intended value', () => {
		// "1e9" commons: the whole value is out of range; its prefix "1" never counts.
		expect(parseFieldNumber('1e9', { min: 1, max: 256, integer: true }).ok).toBe(false);
		expect(parseFieldNumber('2.5', { min: 1, max: 256, integer: true })).toEqual({
			ok: false,
			reason: 'enter a whole number'
		});
		expect(parseFieldNumber('0x10', { min: 1, max: 256, integer: true }).ok).toBe(false);
		expect(parseFieldNumber('16', { min: 1, max: 256, integer: true })).toEqual({
			ok: true,
			value: 16
		});
		expect(parseFieldNumber('4.7', { min: 0.1, max: 60 })).toEqual({ ok: true, value: 4.7 });
	});
});
