/* Named illuminants: accepted names, identity per name, published units, error message. */
import { describe, expect, it } from 'vitest';
import { illuminantByName } from '../../src/lib/core/color/illuminant-by-name';
import { spectrumValueAt } from '../../src/lib/core/color/spectrum';

describe('illuminantByName', () => {
	it('accepts A, D50, D65, D75, D93, E, F2, F11 (any case)', () => {
		for (const name of ['A', 'D50', 'D65', 'D75', 'D93', 'E', 'F2', 'F11'])
			expect(illuminantByName(name).name).toBe(name);
		expect(illuminantByName(' d65 ').name).toBe('D65');
		expect(illuminantByName('f11').name).toBe('F11');
	});

	it('returns the same object for the same name (shared weight caches)', () => {
		expect(illuminantByName('D65')).toBe(illuminantByName('d65'));
	});

	it('carries tables in published CIE units: F2 is 1.18 at 380 nm and 24.88 at 545 nm (CIE 15:2004)', () => {
		const f2 = illuminantByName('F2').spectrum;
		expect(Math.abs(spectrumValueAt(f2, { wavelength_nm: 380 }) - 1.18)).toBeLessThan(1e-12);
		expect(Math.abs(spectrumValueAt(f2, { wavelength_nm: 545 }) - 24.88)).toBeLessThan(1e-12);
		const e = illuminantByName('E').spectrum;
		expect(Math.abs(spectrumValueAt(e, { wavelength_nm: 555 }) - 100)).toBeLessThan(1e-12);
	});

	it('names A and the D series 100 at 560 nm', () => {
		for (const name of ['A', 'D50', 'D65', 'D75']) {
			const s = illuminantByName(name).spectrum;
			expect(Math.abs(spectrumValueAt(s, { wavelength_nm: 560 }) - 100), name).toBeLessThan(1e-9);
		}
	});

	it('explains unknown names and lists the valid ones', () => {
		expect(() => illuminantByName('F7')).toThrow(
			'Unknown illuminant "F7". Valid names: A, D50, D65, E, F2, F11, or D40…D249'
		);
		expect(() => illuminantByName('D30')).toThrow(/Unknown illuminant "D30"/);
		expect(() => illuminantByName('D300')).toThrow(/Unknown illuminant "D300"/);
		expect(() => illuminantByName('')).toThrow(/e\.g\. D75/);
	});
});
