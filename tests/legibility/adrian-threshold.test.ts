import { describe, expect, it } from 'vitest';
import { expectWithin } from '../helpers/tolerance';
import {
	adrianAgeFactor,
	adrianRiccoWeber,
	adrianThreshold_cdm2,
	adrianTimeFactor
} from '../../src/lib/core/legibility/adrian-threshold';

const SOURCE =
	'Adrian, Lighting Res. Technol. 21(4):181–188 (1989), check table of physics notes §8';

/*
 * Check table (k = 1, age 23, AF(23) = (23−19)²/2160 + 0.99 = 0.997407, t ≥ 2 s, positive
 * contrast), ΔL_th in cd/m². Hand computation of the rows (four decimals shown):
 * L_b = 1:    √Φ = log10(4.1925·1) + 0.1684·1 = 0.62247 + 0.1684 = 0.79087; √L = 0.05946
 *             α = 4′:  (0.79087/4 + 0.05946)² = (0.19772 + 0.05946)² = 0.066141; × 0.997407 = 0.065969
 *             α = 60′: (0.013181 + 0.05946)² = 0.0052767; × 0.997407 = 0.0052631
 * L_b = 10:   √Φ = log10(4.1925·10^0.1556) + 0.1684·10^0.5867 = 0.77807 + 0.65020 = 1.42827;
 *             √L = 0.05946·10^0.466 = 0.17387
 *             α = 10′: (0.142827 + 0.17387)² = 0.100297; × 0.997407 = 0.10004
 * L_b = 100:  √Φ = log10(4.1925) + 0.3112 + 0.1684·100^0.5867 = 0.93367 + 2.51040 = 3.44407;
 *             √L = 0.05946·100^0.466 = 0.50842
 *             α = 20′: (0.172203 + 0.50842)² = 0.46325; × 0.997407 = 0.46205
 * L_b = 1000: √Φ = 0.62247 + 0.4668 + 0.1684·1000^0.5867 = 1.08927 + 9.69264 = 10.78191;
 *             √L = 0.05946·1000^0.466 = 1.48671
 *             α = 4′: (2.69548 + 1.48671)² = 17.4907; × 0.997407 = 17.445
 * The remaining cells follow the same arithmetic; all sixteen agree with the table.
 */
const TABLE: [number, number, number][] = [
	[1, 4, 0.06597],
	[1, 10, 0.01915],
	[1, 20, 0.009776],
	[1, 60, 0.005263],
	[10, 4, 0.2812],
	[10, 10, 0.1],
	[10, 20, 0.06001],
	[10, 60, 0.03897],
	[100, 4, 1.871],
	[100, 10, 0.7254],
	[100, 20, 0.4621],
	[100, 60, 0.3193],
	[1000, 4, 17.45],
	[1000, 10, 6.562],
	[1000, 20, 4.093],
	[1000, 60, 2.77]
];

describe('Adrian (1989) luminance-difference threshold', () => {
	it('reproduces the 16-cell check table to 1e-3 relative', () => {
		expectWithin(
			TABLE.map(([lb, alpha, expected]) => ({
				label: `L_b ${lb} cd/m², α ${alpha}′`,
				expected: 1,
				actual:
					adrianThreshold_cdm2({ size_arcmin: alpha, background_cdm2: lb, age_years: 23 }) /
					expected
			})),
			// the table prints 4 significant figures: 1e-3 relative covers its rounding
			{ tolerance: 1e-3, unit: 'relative', source: SOURCE }
		);
	});

	it('has the age factors and the short-exposure factor of the check values', () => {
		// AF(30) = 11²/2160 + 0.99 = 1.046019; AF(50) = 31²/2160 + 0.99 = 1.434907
		// F_time at L_b 10, α 10′, t 0.2 s: x = 1.523, a_α = 0.184099; y = 7, a_L = 0.145614;
		// a = √(a_α² + a_L²)/2.1 = 0.111774; (a + t)/t = 1.55887
		expectWithin(
			[
				{ label: 'AF(23)', expected: 0.99741, actual: adrianAgeFactor(23) },
				{ label: 'AF(30)', expected: 1.04602, actual: adrianAgeFactor(30) },
				{ label: 'AF(50)', expected: 1.43491, actual: adrianAgeFactor(50) },
				{
					label: 'F_time(10 cd/m², 10′, 0.2 s)',
					expected: 1.5589,
					actual: adrianTimeFactor({ size_arcmin: 10, background_cdm2: 10, time_s: 0.2 })
				}
			],
			{ tolerance: 1e-4, unit: '(factor)', source: SOURCE }
		);
		expect(adrianTimeFactor({ size_arcmin: 10, background_cdm2: 10, time_s: 2 })).toBe(1);
	});

	it('joins its three luminance ranges without a jump and rejects what it cannot judge', () => {
		for (const edge of [0.6, 0.00418]) {
			const below = adrianRiccoWeber(edge * (1 - 1e-9));
			const above = adrianRiccoWeber(edge * (1 + 1e-9));
			expect(Math.abs(below.sqrtPhi / above.sqrtPhi - 1)).toBeLessThan(0.05);
			expect(Math.abs(below.sqrtL / above.sqrtL - 1)).toBeLessThan(0.05);
		}
		expect(() => adrianAgeFactor(15)).toThrow(/23–75 years/);
		expect(() => adrianRiccoWeber(0)).toThrow(/> 0 cd/);
		// the threshold grows with the field factor k in proportion
		const one = adrianThreshold_cdm2({ size_arcmin: 8, background_cdm2: 50, age_years: 40 });
		const ten = adrianThreshold_cdm2({
			size_arcmin: 8,
			background_cdm2: 50,
			age_years: 40,
			fieldFactor: 10
		});
		expect(ten / one).toBeCloseTo(10, 12);
	});
});
