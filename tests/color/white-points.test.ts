/*
 * White points (perfect reflecting diffuser) of the named illuminants, integrated on the
 * optics grid (380–780 nm, 5 nm) with the embedded CIE tables.
 */
import { describe, it } from 'vitest';
import { xyzToXy } from '../../src/lib/core/color/chromaticity';
import { illuminantByName } from '../../src/lib/core/color/illuminant-by-name';
import type { ObserverName } from '../../src/lib/core/color/observers';
import { illuminantWhitePoint } from '../../src/lib/core/color/spectrum-to-xyz';
import { expectWithinReference, type ReferenceRow } from './reference-check';

function xyRows(
	observer: ObserverName,
	published: Record<string, [number, number]>
): ReferenceRow[] {
	return Object.entries(published).flatMap(([name, [x, y]]) => {
		const white = illuminantWhitePoint({ illuminant: illuminantByName(name), observer });
		const xy = xyzToXy(white);
		return [
			{ label: `${name} x`, computed: xy.x, published: x },
			{ label: `${name} y`, computed: xy.y, published: y }
		];
	});
}

describe('white points, CIE 1931 2° observer', () => {
	it('A, D50, D65 within 5e-5 in xy', () => {
		// Tighter than the 5e-4 used for F2/F11: these are computed from their definitions
		// and the published values come from the same CIE tables.
		expectWithinReference({
			quantity: 'white point xy (2°) A, D50, D65',
			unit: 'xy',
			tolerance: 5e-5,
			source: 'CIE 15:2018, via published tabulations',
			rows: xyRows('CIE1931-2deg', {
				A: [0.44757, 0.40745],
				D50: [0.34567, 0.3585],
				D65: [0.31271, 0.32902]
			})
		});
	});

	it('F2, F11 within 5e-4 in xy', () => {
		// The 5-decimal values circulating for F2/F11 differ by ≈ 2e-4 from 5 nm integration
		// of the CIE tables; CIE 15:2004 lists 4 decimals, (0.3721, 0.3751) and (0.3805, 0.3769),
		// which this integration reproduces to 1e-4.
		expectWithinReference({
			quantity: 'white point xy (2°) F2, F11',
			unit: 'xy',
			tolerance: 5e-4,
			source: 'CIE 15:2018, via published tabulations',
			rows: xyRows('CIE1931-2deg', { F2: [0.37208, 0.37529], F11: [0.38052, 0.37713] })
		});
	});

	it('XYZ (Y = 100) of A, D50, D65 to half a unit in the published 2nd decimal', () => {
		const rows: ReferenceRow[] = [];
		const published: Record<string, [number, number]> = {
			A: [109.85, 35.58],
			D50: [96.42, 82.51],
			D65: [95.04, 108.88]
		};
		for (const [name, [X, Z]] of Object.entries(published)) {
			const white = illuminantWhitePoint({ illuminant: illuminantByName(name) });
			rows.push({ label: `${name} X`, computed: white.X, published: X });
			rows.push({ label: `${name} Y`, computed: white.Y, published: 100 });
			rows.push({ label: `${name} Z`, computed: white.Z, published: Z });
		}
		expectWithinReference({
			quantity: 'white point XYZ (2°)',
			unit: '(tristimulus, Y = 100)',
			tolerance: 5e-3,
			source: 'CIE 15:2018, via published tabulations',
			rows
		});
	});

	it('equal-energy E sits at x = y = 1/3', () => {
		// Tolerance 1e-5: the 5 nm sums of x̄, ȳ, z̄ are equal only to about 1e-5.
		expectWithinReference({
			quantity: 'white point xy (2°) E',
			unit: 'xy',
			tolerance: 1e-5,
			source: 'CIE 15 (x̄, ȳ, z̄ have equal integrals)',
			rows: xyRows('CIE1931-2deg', { E: [1 / 3, 1 / 3] })
		});
	});
});

describe('white points, CIE 1964 10° observer', () => {
	it('A, D50, D65 within 5e-5 in xy', () => {
		expectWithinReference({
			quantity: 'white point xy (10°) A, D50, D65',
			unit: 'xy',
			tolerance: 5e-5,
			source: 'CIE 15:2004 10° white points, as widely reproduced in colour software',
			rows: xyRows('CIE1964-10deg', {
				A: [0.45117, 0.40594],
				D50: [0.34773, 0.35952],
				D65: [0.31382, 0.331]
			})
		});
	});
});
