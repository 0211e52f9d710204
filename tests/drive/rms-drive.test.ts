import { describe, expect, it } from 'vitest';
import {
	altPleshkoLimit,
	maxCommonsForSteepness,
	optimalBiasDivisor,
	rmsVoltages
} from '../../src/lib/core/drive/rms-drive';
import { expectWithin } from '../helpers/tolerance';

describe('Alt–Pleshko bound', () => {
	it('matches sqrt((√N+1)/(√N−1)) tabulated for N = 2…240', () => {
		// Source: Alt & Pleshko, IEEE Trans. Electron Devices ED-21(2):146–155 (1974): the maximum
		// selection ratio of RMS multiplexing; values below are that formula evaluated to 4 decimals.
		const table: [number, number, number][] = [
			[2, 2.4142, 2.414],
			[3, 1.9319, 2.732],
			[4, 1.7321, 3.0],
			[6, 1.5427, 3.449],
			[8, 1.447, 3.828],
			[16, 1.291, 5.0],
			[32, 1.1956, 6.657],
			[64, 1.1339, 9.0],
			[100, 1.1055, 11.0],
			[240, 1.0668, 16.492]
		];
		expectWithin(
			table.map(([n, r]) => ({ label: `N=${n}`, expected: r, actual: altPleshkoLimit(n) })),
			{
				tolerance: 1e-4,
				unit: '(ratio)',
				source: 'Alt & Pleshko 1974'
			}
		);
		expectWithin(
			table.map(([n, , b]) => ({ label: `N=${n}`, expected: b, actual: optimalBiasDivisor(n) })),
			{
				tolerance: 1e-3,
				unit: '(divisor)',
				source: 'Alt & Pleshko 1974, optimal bias √N+1'
			}
		);
	});

	it('is reached by the optimal bias and never exceeded by any other', () => {
		for (const n of [2, 3, 4, 8, 16, 64]) {
			const best = rmsVoltages({
				commons: n,
				biasDivisor: optimalBiasDivisor(n),
				amplitude_V: 1
			}).selectionRatio;
			expect(best).toBeCloseTo(altPleshkoLimit(n), 12);
			for (let a = 2; a <= 20; a += 0.25) {
				expect(
					rmsVoltages({ commons: n, biasDivisor: a, amplitude_V: 1 }).selectionRatio
				).toBeLessThanOrEqual(best + 1e-12);
			}
		}
	});
});

describe('published duty/bias selection ratios', () => {
	it('agrees with the selection ratios of the usual duty/bias pairs', () => {
		// Common practice (the pairs LCD drivers offer, with their ratios as the trade quotes them):
		// 1/4 duty 1/3 bias → √3; 1/3 duty 1/2 bias → √3; 1/2 duty 1/2 or 1/3 bias → √5;
		// 1/4 duty 1/2 bias → 1.528; 1/6 duty 1/3 bias V_on 0.509, V_off 0.333 of V_LCD.
		const ratio = (n: number, a: number) =>
			rmsVoltages({ commons: n, biasDivisor: a, amplitude_V: 1 }).selectionRatio;
		expectWithin(
			[
				{ label: '1/4 duty, 1/3 bias', expected: Math.sqrt(3), actual: ratio(4, 3) },
				{ label: '1/3 duty, 1/2 bias', expected: Math.sqrt(3), actual: ratio(3, 2) },
				{ label: '1/2 duty, 1/2 bias', expected: Math.sqrt(5), actual: ratio(2, 2) },
				{ label: '1/2 duty, 1/3 bias', expected: Math.sqrt(5), actual: ratio(2, 3) },
				{ label: '1/4 duty, 1/2 bias', expected: 1.5275, actual: ratio(4, 2) }
			],
			{ tolerance: 1e-4, unit: '(ratio)', source: 'common practice: usual duty/bias pairs' }
		);
		const six = rmsVoltages({ commons: 6, biasDivisor: 3, amplitude_V: 1 });
		expectWithin(
			[
				{ label: '1/6 duty 1/3 bias V_on', expected: 0.509, actual: six.on_V },
				{ label: '1/6 duty 1/3 bias V_off', expected: 0.333, actual: six.off_V }
			],
			{ tolerance: 5e-4, unit: '× V_LCD', source: 'common practice: 1/6 duty levels to 3 decimals' }
		);
	});

	it('levels at biases where (a − 2)² differs from a − 2, computed by hand', () => {
		// Alt & Pleshko (1974) relations, V_on = (V/a)·√((N − 1 + a²)/N), V_off =
		// (V/a)·√((N − 1 + (a − 2)²)/N), evaluated with a calculator:
		// N 8, a 4: V_on = ¼·√(23/8) = 0.423896, V_off = ¼·√(11/8) = 0.293151;
		// N 16, a 5: V_on = ⅕·√(40/16) = 0.316228, V_off = ⅕·√(24/16) = 0.244949;
		// N 3, a 2.5: V_on = 0.4·√(8.25/3) = 0.663325, V_off = 0.4·√(2.25/3) = 0.346410.
		const level = (n: number, a: number) =>
			rmsVoltages({ commons: n, biasDivisor: a, amplitude_V: 1 });
		expectWithin(
			[
				{ label: '1/8 duty 1/4 bias V_on', expected: 0.423896, actual: level(8, 4).on_V },
				{ label: '1/8 duty 1/4 bias V_off', expected: 0.293151, actual: level(8, 4).off_V },
				{ label: '1/16 duty 1/5 bias V_on', expected: 0.316228, actual: level(16, 5).on_V },
				{ label: '1/16 duty 1/5 bias V_off', expected: 0.244949, actual: level(16, 5).off_V },
				{ label: '1/3 duty 1/2.5 bias V_on', expected: 0.663325, actual: level(3, 2.5).on_V },
				{ label: '1/3 duty 1/2.5 bias V_off', expected: 0.34641, actual: level(3, 2.5).off_V }
			],
			{ tolerance: 1e-6, unit: '× V_LCD', source: 'Alt & Pleshko 1974, hand computation' }
		);
	});

	it('agrees with the equivalent form V = V_LCD·sqrt((a²±2a+n)/(n(1+a)²)) with a = divisor − 1', () => {
		// The same levels written with a = B − 1, as driver documentation commonly states them
		// (common practice); algebraically identical to the Alt & Pleshko form.
		for (const n of [2, 3, 4, 5, 8, 16, 33, 64]) {
			for (const divisor of [2, 2.5, 3, 4, 5, 7.3, 9]) {
				const a = divisor - 1;
				const { on_V, off_V } = rmsVoltages({ commons: n, biasDivisor: divisor, amplitude_V: 2.7 });
				expect(on_V).toBeCloseTo(2.7 * Math.sqrt((a * a + 2 * a + n) / (n * (1 + a) ** 2)), 10);
				expect(off_V).toBeCloseTo(2.7 * Math.sqrt((a * a - 2 * a + n) / (n * (1 + a) ** 2)), 10);
			}
		}
	});

	it('treats one common as static drive', () => {
		const s = rmsVoltages({ commons: 1, biasDivisor: 3, amplitude_V: 5 });
		expect(s).toEqual({ on_V: 5, off_V: 0, selectionRatio: Infinity });
		expect(altPleshkoLimit(1)).toBe(Infinity);
	});

	it('gives the multiplexability limit N_max = ((γ²+1)/(γ²−1))²', () => {
		// Derived from the Alt–Pleshko bound (R_max(N) ≥ γ); floor of the tabulated N_max.
		expect(maxCommonsForSteepness(1.1)).toBe(110);
		expect(maxCommonsForSteepness(1.3)).toBe(15);
		expect(maxCommonsForSteepness(1.5)).toBe(6);
		expect(maxCommonsForSteepness(2.0)).toBe(2);
	});
});
