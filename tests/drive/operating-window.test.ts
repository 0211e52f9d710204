import { describe, expect, it } from 'vitest';
import { analyzeDrive } from '../../src/lib/core/drive/analyze-drive';
import type { DriveSettings, Thresholds } from '../../src/lib/core/design/schema';

const drive = (over: Partial<DriveSettings> = {}): DriveSettings => ({
	commons: 4,
	biasDivisor: 3,
	amplitude_V: 3.3,
	frameRate_Hz: 64,
	inversion: 'line',
	temperature: { min_C: -10, max_C: 60 },
	...over
});
const cell = (over: Partial<Thresholds> = {}): Thresholds => ({
	source: 'manual',
	v10_V: 1.3,
	v90_V: 1.7,
	reference_C: 25,
	tempCoeff_mV_per_K: -3,
	...over
});

describe('operating window', () => {
	it('finds the amplitudes where V_on ≥ V90 and V_off ≤ V10 at every temperature', () => {
		const r = analyzeDrive({ drive: drive(), thresholds: cell() });
		// At −10 °C: V90 = 1.805 V → V ≥ 1.805/(1/√3)… with k_on = 0.57735; at 60 °C: V10 = 1.195 → V ≤ 3·1.195.
		expect(r.window.window!.min_V).toBeCloseTo(1.805 / Math.sqrt(1 / 3), 9);
		expect(r.window.window!.max_V).toBeCloseTo(3 * 1.195, 9);
		// By hand: √(3.126351708 · 3.585) = 3.347830771 V.
		expect(r.window.best_V!).toBeCloseTo(3.347830771, 8);
		expect(r.severity).toBe('pass');
		// Tightest margin relative to its threshold: on pixels at −10 °C, V_on = 3.3/√3 V against
		// V90 = 1.805 V (5.5 %); off pixels at 60 °C have 0.095 V of V10 = 1.195 V (7.9 %).
		expect(r.window.margin_V).toBeCloseTo(3.3 / Math.sqrt(3) - 1.805, 9);
		expect(r.window.margin_percent).toBeCloseTo((100 * (3.3 / Math.sqrt(3) - 1.805)) / 1.805, 9);
		expect(r.window.tightest).toEqual({ temperature_C: -10, limit: 'on' });
	});

	it('says when no amplitude can work at a temperature (steepness beyond the selection ratio)', () => {
		const r = analyzeDrive({
			drive: drive({ temperature: { min_C: -20, max_C: -20 } }),
			thresholds: cell({ v90_V: 2.4 })
		});
		expect(r.severity).toBe('fail');
		expect(r.findings[0].message).toMatch(/No amplitude works at -20 °C/);
		expect(r.findings[0].message).toMatch(/ghost/);
	});

	it('says when temperature drift closes the window, and suggests compensation', () => {
		const r = analyzeDrive({
			drive: drive({ temperature: { min_C: -30, max_C: 85 } }),
			thresholds: cell({ tempCoeff_mV_per_K: -8 })
		});
		expect(r.window.window).toBeNull();
		expect(r.findings.map((f) => f.code)).toContain('drive.no-common-amplitude');
		expect(r.findings.map((f) => f.fix).join(' ')).toMatch(/temperature compensation/);
	});

	it('names the side that fails when the set amplitude is outside the window', () => {
		const low = analyzeDrive({ drive: drive({ amplitude_V: 2.9 }), thresholds: cell() });
		expect(low.findings.some((f) => f.severity === 'fail' && /too low/.test(f.message))).toBe(true);
		const high = analyzeDrive({ drive: drive({ amplitude_V: 3.9 }), thresholds: cell() });
		expect(high.findings.some((f) => f.severity === 'fail' && /ghost/.test(f.message))).toBe(true);
	});

	it('warns about a bias far from the optimum and a flickering frame rate', () => {
		const r = analyzeDrive({
			drive: drive({ commons: 8, biasDivisor: 2, frameRate_Hz: 20 }),
			thresholds: cell()
		});
		const text = r.findings.map((f) => f.message).join(' ');
		expect(text).toMatch(/1\/3\.83/);
		expect(text).toMatch(/flicker/);
	});

	it('static drive has no upper amplitude limit', () => {
		const r = analyzeDrive({ drive: drive({ commons: 1 }), thresholds: cell() });
		expect(r.window.window!.max_V).toBe(Infinity);
		expect(r.selectionRatio).toBeNull();
		expect(r.severity).toBe('pass');
	});
});
