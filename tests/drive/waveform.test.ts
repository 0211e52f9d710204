import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { multiplexWaveform, pixelVoltageStats } from '../../src/lib/core/drive/waveform';
import { rmsVoltages } from '../../src/lib/core/drive/rms-drive';

describe('multiplex waveform model', () => {
	it('has the closed-form RMS and zero DC for every pixel, any pattern, both inversions', () => {
		fc.assert(
			fc.property(
				fc.integer({ min: 1, max: 16 }),
				fc.double({ min: 2, max: 10, noNaN: true }),
				fc.double({ min: 0.5, max: 30, noNaN: true }),
				fc.constantFrom<'line' | 'frame'>('line', 'frame'),
				fc.array(fc.boolean(), { minLength: 16, maxLength: 16 }),
				(commons, biasDivisor, amplitude_V, inversion, pattern) => {
					const wave = multiplexWaveform({ commons, biasDivisor, amplitude_V, inversion });
					const on = pattern.slice(0, commons);
					const segment = wave.segmentLevels_V(on);
					const closed = rmsVoltages({ commons, biasDivisor, amplitude_V });
					for (let c = 0; c < commons; c++) {
						const { rms_V, dc_V } = pixelVoltageStats(wave.commonLevels_V[c], segment);
						expect(rms_V).toBeCloseTo(on[c] ? closed.on_V : closed.off_V, 9);
						expect(Math.abs(dc_V)).toBeLessThan(1e-12 * amplitude_V + 1e-15);
					}
				}
			)
		);
	});

	it('only uses the bias ladder levels 0, V/a, 2V/a, …, V for integer bias', () => {
		const wave = multiplexWaveform({
			commons: 4,
			biasDivisor: 3,
			amplitude_V: 3,
			inversion: 'line'
		});
		const levels = new Set<number>();
		wave.commonLevels_V.forEach((l) => l.forEach((v) => levels.add(Math.round(v * 1e9) / 1e9)));
		wave
			.segmentLevels_V([true, false, true, false])
			.forEach((v) => levels.add(Math.round(v * 1e9) / 1e9));
		expect([...levels].sort()).toEqual([0, 1, 2, 3]);
	});
});
