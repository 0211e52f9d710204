/* Illuminant A from the CIE formula against published values and the CIE 1 nm table. */
import { describe, expect, it } from 'vitest';
import { CIE_A_TABLE } from '../../src/lib/core/color/data/standard-illuminant-tables';
import { illuminantA, illuminantARelativePower } from '../../src/lib/core/color/illuminant-a';
import { expectWithinReference } from './reference-check';

describe('CIE illuminant A formula', () => {
	it('reproduces the published S_A values to half a unit in the 5th decimal', () => {
		expectWithinReference({
			quantity: 'S_A(λ)',
			unit: '(relative power, 100 at 560 nm)',
			tolerance: 5e-6,
			source: 'CIE 15 formula; published tabulations of CIE 15 values',
			rows: [
				{ label: '560 nm', computed: illuminantARelativePower(560), published: 100 },
				{ label: '400 nm', computed: illuminantARelativePower(400), published: 14.70804 },
				{ label: '580 nm', computed: illuminantARelativePower(580), published: 114.43634 }
			]
		});
	});

	it('matches the CIE 1 nm table (6 significant figures) over 300–830 nm', () => {
		// Tolerance: half a unit in the 6th significant figure, relative, for the largest mantissa.
		const spectrum = illuminantA().spectrum;
		const rows = CIE_A_TABLE.values.map((v, i) => ({
			label: `${300 + i} nm`,
			computed: spectrum.values[i] / (v * CIE_A_TABLE.toPublishedUnits),
			published: 1
		}));
		expectWithinReference({
			quantity: 'S_A formula / CIE table',
			unit: '(ratio)',
			tolerance: 5e-6,
			source: 'CIE S 014-2:2006 table via Debian colord-data (embedded)',
			rows
		});
	});

	it('has a correlated colour temperature of 2856 K on the current scale (2848 K · 1.4388/1.435)', () => {
		expect(Math.abs((illuminantA().cct_K ?? NaN) - 2856)).toBeLessThan(0.5);
	});

	it('rejects non-positive wavelengths', () => {
		expect(() => illuminantARelativePower(0)).toThrow(/positive/);
	});
});
