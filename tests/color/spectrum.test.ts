/* Wavelength grids and linear resampling of spectra. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	gridWavelengths_nm,
	resampleSpectrum,
	spectrumFromFunction,
	spectrumValueAt,
	VISIBLE_5NM_GRID,
	wavelengthGrid
} from '../../src/lib/core/color/spectrum';

const table = { start_nm: 400, step_nm: 10, values: Float64Array.from([1, 3, 2, 6]) };

describe('wavelength grids', () => {
	it('the optics grid has 81 wavelengths from 380 to 780 nm', () => {
		expect(VISIBLE_5NM_GRID.count).toBe(81);
		const wavelengths = gridWavelengths_nm(VISIBLE_5NM_GRID);
		expect(wavelengths[0]).toBe(380);
		expect(wavelengths[80]).toBe(780);
	});

	it('refuses ranges that are not whole steps, and bad steps', () => {
		expect(() => wavelengthGrid({ start_nm: 380, end_nm: 782, step_nm: 5 })).toThrow(
			/whole number/
		);
		expect(() => wavelengthGrid({ start_nm: 380, end_nm: 780, step_nm: 0 })).toThrow(/Invalid/);
		expect(() => wavelengthGrid({ start_nm: 780, end_nm: 380, step_nm: 5 })).toThrow(/Invalid/);
	});
});

describe('spectrum sampling', () => {
	it('returns table values on grid points and interpolates linearly between', () => {
		expect(spectrumValueAt(table, { wavelength_nm: 410 })).toBeCloseTo(3, 12);
		expect(spectrumValueAt(table, { wavelength_nm: 415 })).toBeCloseTo(2.5, 12);
		expect(spectrumValueAt(table, { wavelength_nm: 427.5 })).toBeCloseTo(5, 12);
	});

	it('extends by the nearest value, by zero, or refuses, as asked', () => {
		expect(spectrumValueAt(table, { wavelength_nm: 380 })).toBeCloseTo(1, 12);
		expect(spectrumValueAt(table, { wavelength_nm: 500, outside: 'nearest' })).toBeCloseTo(6, 12);
		expect(spectrumValueAt(table, { wavelength_nm: 500, outside: 'zero' })).toBe(0);
		expect(() => spectrumValueAt(table, { wavelength_nm: 500, outside: 'throw' })).toThrow(
			/400–430 nm/
		);
	});

	it('resampling onto its own grid is the identity', () => {
		const same = resampleSpectrum(table, { grid: { start_nm: 400, step_nm: 10, count: 4 } });
		same.values.forEach((v, i) => expect(Math.abs(v - table.values[i])).toBeLessThan(1e-15));
	});

	it('resampling reproduces linear functions exactly on any grid inside the range (property)', () => {
		const source = spectrumFromFunction(VISIBLE_5NM_GRID, (nm) => 0.3 + 0.001 * nm);
		fc.assert(
			fc.property(
				fc.double({ min: 380, max: 700, noNaN: true }),
				fc.double({ min: 0.1, max: 10, noNaN: true }),
				fc.integer({ min: 1, max: 8 }),
				(start_nm, step_nm, count) => {
					const grid = {
						start_nm,
						step_nm,
						count: Math.min(count, Math.floor((780 - start_nm) / step_nm) + 1)
					};
					const out = resampleSpectrum(source, { grid, outside: 'throw' });
					return out.values.every(
						(v, i) => Math.abs(v - (0.3 + 0.001 * (start_nm + i * step_nm))) < 1e-12
					);
				}
			)
		);
	});
});
