/*
 * CIEDE2000 against the 34 pairs of Sharma, Wu & Dalal, Color Res. Appl. 30(1):21-30 (2005),
 * Table 1 (kL = kC = kH = 1), through our implementation and through culori (the bridge).
 * Published ΔE00 have 4 decimals, so the tolerance is half a unit in the 4th decimal.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deltaE2000ByCulori } from '../../src/lib/core/color/culori-bridge';
import { deltaE2000, deltaE2000WithFactors } from '../../src/lib/core/color/delta-e-2000';
import type { Lab } from '../../src/lib/core/color/types';
import { expectWithinReference } from './reference-check';

// [L1, a1, b1, L2, a2, b2, ΔE00], pairs 1-34 in the order of Table 1.
const SHARMA_TABLE_1: readonly (readonly number[])[] = [
	[50.0, 2.6772, -79.7751, 50.0, 0.0, -82.7485, 2.0425],
	[50.0, 3.1571, -77.2803, 50.0, 0.0, -82.7485, 2.8615],
	[50.0, 2.8361, -74.02, 50.0, 0.0, -82.7485, 3.4412],
	[50.0, -1.3802, -84.2814, 50.0, 0.0, -82.7485, 1.0],
	[50.0, -1.1848, -84.8006, 50.0, 0.0, -82.7485, 1.0],
	[50.0, -0.9009, -85.5211, 50.0, 0.0, -82.7485, 1.0],
	[50.0, 0.0, 0.0, 50.0, -1.0, 2.0, 2.3669],
	[50.0, -1.0, 2.0, 50.0, 0.0, 0.0, 2.3669],
	[50.0, 2.49, -0.001, 50.0, -2.49, 0.0009, 7.1792],
	[50.0, 2.49, -0.001, 50.0, -2.49, 0.001, 7.1792],
	[50.0, 2.49, -0.001, 50.0, -2.49, 0.0011, 7.2195],
	[50.0, 2.49, -0.001, 50.0, -2.49, 0.0012, 7.2195],
	[50.0, -0.001, 2.49, 50.0, 0.0009, -2.49, 4.8045],
	[50.0, -0.001, 2.49, 50.0, 0.001, -2.49, 4.8045],
	[50.0, -0.001, 2.49, 50.0, 0.0011, -2.49, 4.7461],
	[50.0, 2.5, 0.0, 50.0, 0.0, -2.5, 4.3065],
	[50.0, 2.5, 0.0, 73.0, 25.0, -18.0, 27.1492],
	[50.0, 2.5, 0.0, 61.0, -5.0, 29.0, 22.8977],
	[50.0, 2.5, 0.0, 56.0, -27.0, -3.0, 31.903],
	[50.0, 2.5, 0.0, 58.0, 24.0, 15.0, 19.4535],
	[50.0, 2.5, 0.0, 50.0, 3.1736, 0.5854, 1.0],
	[50.0, 2.5, 0.0, 50.0, 3.2972, 0.0, 1.0],
	[50.0, 2.5, 0.0, 50.0, 1.8634, 0.5757, 1.0],
	[50.0, 2.5, 0.0, 50.0, 3.2592, 0.335, 1.0],
	[60.2574, -34.0099, 36.2677, 60.4626, -34.1751, 39.4387, 1.2644],
	[63.0109, -31.0961, -5.8663, 62.8187, -29.7946, -4.0864, 1.263],
	[61.2901, 3.7196, -5.3901, 61.4292, 2.248, -4.962, 1.8731],
	[35.0831, -44.1164, 3.7933, 35.0232, -40.0716, 1.5901, 1.8645],
	[22.7233, 20.0904, -46.694, 23.0331, 14.973, -42.5619, 2.0373],
	[36.4612, 47.858, 18.3852, 36.2715, 50.5065, 21.2231, 1.4146],
	[90.8027, -2.0831, 1.441, 91.1528, -1.6435, 0.0447, 1.4441],
	[90.9257, -0.5406, -0.9208, 88.6381, -0.8985, -0.7239, 1.5381],
	[6.7747, -0.2908, -2.4247, 5.8714, -0.0985, -2.2286, 0.6377],
	[2.0776, 0.0795, -1.135, 0.9033, -0.0636, -0.5514, 0.9082]
];

const PAIRS = SHARMA_TABLE_1.map(([L1, a1, b1, L2, a2, b2, dE], i) => ({
	label: `pair ${i + 1}`,
	reference: { L: L1, a: a1, b: b1 } as Lab,
	sample: { L: L2, a: a2, b: b2 } as Lab,
	published: dE
}));

const SOURCE = 'Sharma, Wu & Dalal 2005, Table 1';
const lab = fc.record({
	L: fc.double({ min: 0, max: 100, noNaN: true }),
	a: fc.double({ min: -128, max: 128, noNaN: true }),
	b: fc.double({ min: -128, max: 128, noNaN: true })
});

describe('CIEDE2000', () => {
	it('has 34 reference pairs', () => {
		expect(PAIRS).toHaveLength(34);
	});

	it('our implementation reproduces all 34 published pairs', () => {
		expectWithinReference({
			quantity: 'ΔE00 (deltaE2000)',
			unit: 'ΔE00',
			tolerance: 5e-5,
			source: SOURCE,
			rows: PAIRS.map((p) => ({ ...p, computed: deltaE2000(p.reference, p.sample) }))
		});
	});

	it('culori (through the bridge) reproduces all 34 published pairs', () => {
		expectWithinReference({
			quantity: 'ΔE00 (culori)',
			unit: 'ΔE00',
			tolerance: 5e-5,
			source: SOURCE,
			rows: PAIRS.map((p) => ({ ...p, computed: deltaE2000ByCulori(p.reference, p.sample) }))
		});
	});

	it('is symmetric on every pair, including across the 180° hue seam', () => {
		for (const p of PAIRS) {
			const forward = deltaE2000(p.reference, p.sample);
			const backward = deltaE2000(p.sample, p.reference);
			expect(Math.abs(forward - backward), p.label).toBeLessThan(1e-12);
		}
	});

	it('agrees with culori on random colour pairs (property)', () => {
		fc.assert(
			fc.property(lab, lab, (reference, sample) => {
				const ours = deltaE2000(reference, sample);
				return Math.abs(ours - deltaE2000ByCulori(reference, sample)) <= 1e-9 * Math.max(1, ours);
			}),
			{ numRuns: 2000 }
		);
	});

	it('is zero for identical colours and symmetric for random pairs (property)', () => {
		fc.assert(
			fc.property(lab, lab, (reference, sample) => {
				return (
					deltaE2000(reference, reference) < 1e-12 &&
					Math.abs(deltaE2000(reference, sample) - deltaE2000(sample, reference)) < 1e-9
				);
			})
		);
	});

	it('kL = 2 halves a pure lightness difference', () => {
		const light = { L: 80, a: 0, b: 0 };
		const dark = { L: 50, a: 0, b: 0 };
		const halved = deltaE2000WithFactors({ kL: 2, kC: 1, kH: 1 })(light, dark);
		expect(Math.abs(halved - deltaE2000(light, dark) / 2)).toBeLessThan(1e-12);
	});
});
