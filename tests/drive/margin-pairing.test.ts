import { describe, expect, it } from 'vitest';
import { operatingWindow } from '../../src/lib/core/drive/operating-window';
import { expectWithin } from '../helpers/tolerance';

// 1/4 duty, 1/3 bias at 3 V: V_on = √3 V and V_off = 1 V (Alt & Pleshko, IEEE Trans. Electron
// Devices ED-21, 1974, RMS levels of line-at-a-time addressing; the same pair is printed in LCD
// driver data sheets for 1/4 duty, 1/3 bias). The thresholds below are chosen so that the
// smallest margin in volts (off pixels at 0 °C) and the smallest in percent (on pixels at 40 °C)
// lie at different places.
const result = operatingWindow({
	commons: 4,
	biasDivisor: 3,
	amplitude_V: 3,
	thresholds: [
		{ temperature_C: 0, v10_V: 1.1, v90_V: 1.5 },
		{ temperature_C: 40, v10_V: 1.3, v90_V: 1.612 }
	]
});

describe('smallest drive margin', () => {
	it('reports volts and percent of the same limit at the same temperature', () => {
		const onMargin_V = Math.sqrt(3) - 1.612;
		expectWithin(
			[
				{ label: 'margin (V)', expected: onMargin_V, actual: result.margin_V },
				{ label: 'margin (%)', expected: (100 * onMargin_V) / 1.612, actual: result.margin_percent }
			],
			{ tolerance: 1e-9, unit: 'V or %', source: 'Alt & Pleshko 1974, RMS levels' }
		);
		expect(result.tightest).toEqual({ temperature_C: 40, limit: 'on' });
		expect(result.ok).toBe(true);
	});
});
