/* CIELAB L* checks and the Lab ↔ XYZ round trip. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { labToXyz, xyzToLab } from '../../src/lib/core/color/cielab';
import { expectWithinReference } from './reference-check';

const WHITE = { X: 95.047, Y: 100, Z: 108.883 };
const lightnessOf = (Y: number) =>
	xyzToLab({ X: (Y / 100) * WHITE.X, Y, Z: (Y / 100) * WHITE.Z }, WHITE).L;

describe('CIELAB', () => {
	it('L* of neutral greys matches the CIE 15 formula values', () => {
		// Tolerance: half a unit in the 3rd decimal of L*.
		expectWithinReference({
			quantity: 'L*',
			unit: 'L* units',
			tolerance: 5e-4,
			source: 'CIE 15:2004 L* formula evaluated by hand (Y = 18 % gives L* 49.496, the mid grey)',
			rows: [
				{ label: 'Y = 18 %', computed: lightnessOf(18), published: 49.496 },
				{ label: 'Y = 25 %', computed: lightnessOf(25), published: 57.075 },
				{ label: 'Y = 5 %', computed: lightnessOf(5), published: 26.735 },
				{ label: 'Y = 1 %', computed: lightnessOf(1), published: 8.991 },
				{ label: 'Y = 100 %', computed: lightnessOf(100), published: 100 },
				// Linear branch below (6/29)³: L* = (29/3)³·Y/Yn = 903.2963 · 0.005 = 4.5165
				{ label: 'Y = 0.5 %', computed: lightnessOf(0.5), published: 4.5165 }
			]
		});
	});

	it('Y = 18.42 % is mid-grey, L* = 50.00', () => {
		expect(Math.abs(lightnessOf(18.42) - 50)).toBeLessThan(5e-3);
	});

	it('is continuous where f(t) switches branch, t = (6/29)³', () => {
		const t = (6 / 29) ** 3;
		expect(
			Math.abs(lightnessOf(100 * t * (1 - 1e-12)) - lightnessOf(100 * t * (1 + 1e-12)))
		).toBeLessThan(1e-9);
	});

	it('neutral colours have a* = b* = 0', () => {
		const lab = xyzToLab({ X: WHITE.X * 0.3, Y: 30, Z: WHITE.Z * 0.3 }, WHITE);
		expect(Math.hypot(lab.a, lab.b)).toBeLessThan(1e-9);
	});

	it('labToXyz inverts xyzToLab (property)', () => {
		const tristimulus = fc.double({ min: 0, max: 150, noNaN: true });
		fc.assert(
			fc.property(tristimulus, tristimulus, tristimulus, (X, Y, Z) => {
				const back = labToXyz(xyzToLab({ X, Y, Z }, WHITE), WHITE);
				return Math.max(Math.abs(back.X - X), Math.abs(back.Y - Y), Math.abs(back.Z - Z)) < 1e-9;
			})
		);
	});
});
