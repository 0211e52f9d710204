/**
 * The operating window against hand computations from the RMS relations of multiplexed drive
 * (Alt & Pleshko, IEEE Trans. Electron Devices ED-21(2):146–155, 1974):
 *   V_on = (V/a)·√((N − 1 + a²)/N),  V_off = (V/a)·√((N − 1 + (a − 2)²)/N),
 * with the switching voltages shifted linearly with temperature, V(T) = V(T_ref) + c·(T − T_ref).
 * Each temperature allows V in [V90/k_on, V10/k_off]; the window is their intersection. Every
 * figure below was worked out by hand (a calculator, not this code) and is written out with its
 * arithmetic, so a wrong operand anywhere in the window code changes a number here.
 */
import { describe, expect, it } from 'vitest';
import { operatingWindow } from '../../src/lib/core/drive/operating-window';
import { thresholdsOverRange } from '../../src/lib/core/drive/threshold-at-temperature';
import { expectWithin } from '../helpers/tolerance';

const SOURCE = 'Alt & Pleshko 1974 RMS relations, hand computation';

describe('operating window, hand-computed', () => {
	it('1/4 duty, 1/3 bias, 3.3 V, −10…60 °C: the cold end binds the on side', () => {
		// k_on = (1/3)·√((3 + 9)/4) = √3/3 = 0.577350269; k_off = (1/3)·√((3 + 1)/4) = 1/3.
		// V_on = 3.3·0.577350269 = 1.905255888 V; V_off = 1.1 V.
		// Thresholds (1.3/1.7 V at 25 °C, −3 mV/K): −10 °C 1.405/1.805; 25 °C 1.3/1.7; 60 °C 1.195/1.595.
		const result = operatingWindow({
			commons: 4,
			biasDivisor: 3,
			amplitude_V: 3.3,
			thresholds: thresholdsOverRange(
				{ source: 'manual', v10_V: 1.3, v90_V: 1.7, reference_C: 25, tempCoeff_mV_per_K: -3 },
				{ min_C: -10, max_C: 60 }
			)
		});
		const [cold, room, hot] = result.perTemperature;
		expect(result.perTemperature.map((c) => c.temperature_C)).toEqual([-10, 25, 60]);
		expectWithin(
			[
				// on margin = V_on − V90; off margin = V10 − V_off
				{ label: '−10 °C on margin', expected: 1.905255888 - 1.805, actual: cold.onMargin_V },
				{ label: '−10 °C off margin', expected: 1.405 - 1.1, actual: cold.offMargin_V },
				{ label: '25 °C on margin', expected: 1.905255888 - 1.7, actual: room.onMargin_V },
				{ label: '25 °C off margin', expected: 1.3 - 1.1, actual: room.offMargin_V },
				{ label: '60 °C on margin', expected: 1.905255888 - 1.595, actual: hot.onMargin_V },
				{ label: '60 °C off margin', expected: 1.195 - 1.1, actual: hot.offMargin_V },
				// window: max of V90/k_on = 1.805/0.577350269 = 3.126351708;
				//         min of V10/k_off = 3·1.195 = 3.585
				{ label: 'window low', expected: 3.126351708, actual: result.window!.min_V },
				{ label: 'window high', expected: 3.585, actual: result.window!.max_V },
				// best = √(3.126351708·3.585) = 3.347830771
				{ label: 'best amplitude', expected: 3.347830771, actual: result.best_V! },
				// the tightest margin is the smallest percentage (below), and its volts come from the
				// same limit: the −10 °C on side, 1.905255888 − 1.805 = 0.100255888 V
				{ label: 'margin', expected: 0.100255888, actual: result.margin_V }
			],
			{ tolerance: 1e-8, unit: 'V', source: SOURCE }
		);
		// Percentages: on side over V90, off side over V10. −10 °C on: 100·0.100255888/1.805 =
		// 5.554343 %; 60 °C off: 100·0.095/1.195 = 7.949791 %; the smallest is 5.554343 %.
		expectWithin([{ label: 'margin %', expected: 5.554343, actual: result.margin_percent }], {
			tolerance: 1e-5,
			unit: '%',
			source: SOURCE
		});
		expect(result.ok).toBe(true);
	});

	it('1/3 duty, non-integer bias 1/2.5, 4 V, 0…70 °C: the hot end ghosts', () => {
		// k_on = 0.4·√((2 + 6.25)/3) = 0.4·√2.75 = 0.663324958; k_off = 0.4·√((2 + 0.25)/3) =
		// 0.4·√0.75 = 0.346410162. V_on = 2.653299832 V; V_off = 1.385640646 V.
		// Thresholds (1.5/2.0 V at 20 °C, −6 mV/K): 0 °C 1.62/2.12; 20 °C 1.5/2.0; 70 °C 1.2/1.7.
		const result = operatingWindow({
			commons: 3,
			biasDivisor: 2.5,
			amplitude_V: 4,
			thresholds: thresholdsOverRange(
				{ source: 'manual', v10_V: 1.5, v90_V: 2.0, reference_C: 20, tempCoeff_mV_per_K: -6 },
				{ min_C: 0, max_C: 70 }
			)
		});
		const [cold, room, hot] = result.perTemperature;
		expectWithin(
			[
				{ label: '0 °C on margin', expected: 2.653299832 - 2.12, actual: cold.onMargin_V },
				{ label: '0 °C off margin', expected: 1.62 - 1.385640646, actual: cold.offMargin_V },
				{ label: '20 °C on margin', expected: 2.653299832 - 2.0, actual: room.onMargin_V },
				{ label: '20 °C off margin', expected: 1.5 - 1.385640646, actual: room.offMargin_V },
				{ label: '70 °C on margin', expected: 2.653299832 - 1.7, actual: hot.onMargin_V },
				{ label: '70 °C off margin', expected: 1.2 - 1.385640646, actual: hot.offMargin_V },
				// window: 2.12/0.663324958 = 3.196020253 … 1.2/0.346410162 = 3.464101615
				{ label: 'window low', expected: 3.196020253, actual: result.window!.min_V },
				{ label: 'window high', expected: 3.464101615, actual: result.window!.max_V },
				// best = √(3.196020253·3.464101615) = 3.327362156
				{ label: 'best amplitude', expected: 3.327362156, actual: result.best_V! },
				{ label: 'margin', expected: 1.2 - 1.385640646, actual: result.margin_V },
				// per-temperature windows: 70 °C alone allows 1.7/0.663324958 = 2.562846429 …
				// 3.464101615 V; 0 °C alone 3.196020253 … 1.62/0.346410162 = 4.676537180 V
				{ label: '70 °C window low', expected: 2.562846429, actual: hot.window!.min_V },
				{ label: '0 °C window high', expected: 4.67653718, actual: cold.window!.max_V }
			],
			{ tolerance: 1e-8, unit: 'V', source: SOURCE }
		);
		// The off side at 70 °C binds: 100·(−0.185640646)/1.2 = −15.470054 % (over V10, not V90,
		// which would give −10.92 %).
		expectWithin([{ label: 'margin %', expected: -15.470054, actual: result.margin_percent }], {
			tolerance: 1e-5,
			unit: '%',
			source: SOURCE
		});
		expect(result.ok).toBe(false);
	});
});
