import { describe, expect, it } from 'vitest';
import { expectWithin } from '../helpers/tolerance';
import { analyzeLoad } from '../../src/lib/core/load/analyze-load';
import { currentSweep } from '../../src/lib/core/load/load-sweeps';
import { demoDesign } from '../../src/lib/core/design/demo';
import { parseDesignValue } from '../../src/lib/core/design/parse-design';
import { isKnownFindingCode } from '../../src/lib/core/findings/codes';
import type { Design } from '../../src/lib/core/design/schema';

const withLoad = (load: Record<string, unknown>): Design => {
	const parsed = parseDesignValue({ ...demoDesign(), load });
	if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
	return parsed.design;
};

describe('load report of a design', () => {
	it('adds up: lines and commons carry every driven electrode once', () => {
		const report = analyzeLoad(demoDesign());
		const sum = (rows: { current_uA: number; on_pF: number }[], k: 'current_uA' | 'on_pF') =>
			rows.reduce((s, r) => s + r[k], 0);
		const driven = report.electrodes.filter((e) => e.driven);
		expect(sum(report.lines, 'current_uA')).toBeCloseTo(report.display_uA, 9);
		expect(sum(report.commons, 'current_uA')).toBeCloseTo(report.display_uA, 9);
		expect(sum(report.lines, 'on_pF')).toBeCloseTo(sum(driven, 'on_pF'), 6);
		for (const f of report.findings) expect(isKnownFindingCode(f.code), f.code).toBe(true);
	});

	it('falls in the glass makers’ typical current per display area', () => {
		// Common practice (glass-maker application notes): a segment display draws about 1.2–2 µA per
		// cm² of lit area at room temperature. Plausibility range only: both bounds are widened ×2.
		const report = analyzeLoad(demoDesign(), { pattern: 'all-on' });
		const area_cm2 = report.electrodes.reduce((s, e) => s + e.area_mm2, 0) / 100;
		const perArea = report.display_uA / area_cm2;
		expect(perArea).toBeGreaterThan(0.6);
		expect(perArea).toBeLessThan(4);
	});

	it('orders the patterns: all off < reading < all on', () => {
		const d = demoDesign();
		const [off, reading, on] = (['all-off', 'reading', 'all-on'] as const).map(
			(pattern) => analyzeLoad(d, { pattern }).display_uA
		);
		expect(off).toBeLessThan(reading);
		expect(reading).toBeLessThan(on);
	});

	it('rates battery life as capacity over total current, by hand', () => {
		const design = withLoad({ battery_mAh: 220, quiescent_uA: 1.5 });
		const report = analyzeLoad(design);
		const expected_h = (220 * 1000) / (report.display_uA + 1.5);
		expect(report.total_uA).toBeCloseTo(report.display_uA + 1.5, 12);
		expect(report.battery?.life_h).toBeCloseTo(expected_h, 6);
		expect(report.battery?.worstLife_h).toBeLessThanOrEqual(report.battery!.life_h);
	});

	it('fails a current over budget and passes one under it', () => {
		const base = analyzeLoad(demoDesign());
		const tight = analyzeLoad(withLoad({ budget_uA: base.worst.total_uA * 0.9 }));
		expect(tight.findings.map((f) => f.code)).toContain('load.current-over-budget');
		expect(tight.severity).toBe('fail');
		const loose = analyzeLoad(withLoad({ budget_uA: base.worst.total_uA * 1.1 }));
		expect(loose.findings.map((f) => f.code)).toEqual(['load.ok']);
	});

	it('computes trace resistance as R_s·L/W and judges τ = RC against the settling window', () => {
		const d = demoDesign();
		// Demo drive: 4 commons at 64 Hz, line inversion: window = 1/(4·64)/2 s = 1953.125 µs.
		const make = (sheet: number) =>
			analyzeLoad(
				withLoad({
					sheetResistance_ohm_per_sq: sheet,
					traces: [{ electrode: d.electrodes[0].id, length_mm: 20, width_mm: 0.05 }]
				})
			);
		const ok = make(100);
		// 100 Ω/□ × 20 mm / 0.05 mm = 40 000 Ω (400 squares).
		expect(ok.traces[0].resistance_ohm).toBeCloseTo(40000, 9);
		expect(ok.settlingWindow_us).toBeCloseTo(1953.125, 9);
		expect(ok.severity).toBe('pass');
		// Sheet resistance chosen so that τ lands at 15 % and at 40 % of the window.
		const onMax_pF = ok.traces[0].tau_us / 40000 / 1e-6; // τ/R in pF
		const sheetFor = (ratio: number) => (ratio * 1953.125e-6) / (onMax_pF * 1e-12) / 400;
		const marginal = make(sheetFor(0.15));
		expect(marginal.findings.map((f) => f.code)).toContain('load.rc-marginal');
		const slow = make(sheetFor(0.4));
		expect(slow.findings.map((f) => f.code)).toContain('load.rc-too-slow');
		expect(slow.findings.find((f) => f.code === 'load.rc-too-slow')?.electrodes).toEqual([
			d.electrodes[0].id
		]);
		for (const f of [...marginal.findings, ...slow.findings]) {
			expect(isKnownFindingCode(f.code), f.code).toBe(true);
			expect(f.fix).not.toBe('');
		}
	});

	it('names a trace to an unknown electrode by its path', () => {
		const report = analyzeLoad(
			withLoad({ traces: [{ electrode: 'nope', length_mm: 5, width_mm: 0.1 }] })
		);
		const f = report.findings.find((x) => x.code === 'load.trace-unknown-electrode');
		expect(f?.message).toContain('load.traces[0].electrode');
	});

	it('says there is nothing to rate when no electrode is assigned', () => {
		const d = demoDesign();
		const report = analyzeLoad({
			...d,
			electrodes: d.electrodes.map((e) => ({ ...e, common: null, line: null }))
		});
		expect(report.display_uA).toBe(0);
		expect(report.findings.map((f) => f.code)).toEqual(['load.nothing-driven']);
	});

	it('turns an unknown fluid into a finding, not a crash', () => {
		const d = demoDesign();
		const report = analyzeLoad({
			...d,
			cell: { ...d.cell, material: { preset: 'no-such-fluid' } }
		});
		expect(report.severity).toBe('fail');
		expect(report.findings[0].code).toBe('load.model-failed');
		expect(Number.isFinite(report.total_uA)).toBe(true);
	});

	it('rejects bad load inputs with the JSON path', () => {
		const parsed = parseDesignValue({ ...demoDesign(), load: { battery_mAh: -1 } });
		expect(parsed.ok).toBe(false);
		if (!parsed.ok) expect(parsed.issues[0].path).toBe('load.battery_mAh');
	});

	it('scales current in proportion to frame rate, plus the quiescent current', () => {
		const design = withLoad({ quiescent_uA: 2 });
		const points = currentSweep({ design, temperatures_C: [25], frameRates_Hz: [32, 64, 128] });
		const reading = points.filter((p) => p.pattern === 'reading').map((p) => p.total_uA - 2);
		expectWithin(
			[
				{ label: '128 Hz / 64 Hz', expected: 2, actual: reading[2] / reading[1] },
				{ label: '32 Hz / 64 Hz', expected: 0.5, actual: reading[0] / reading[1] }
			],
			{ tolerance: 1e-12, unit: '', source: 'P = E_cycle·f, E_cycle independent of f' }
		);
	});
});

describe('load settings in the edit history', () => {
	it('undoing the first load edit restores a design without a load section', async () => {
		const { diffDesigns } = await import('../../src/lib/core/commands/diff-design');
		const { applyPatch } = await import('../../src/lib/core/commands/patch');
		const { invertPatch } = await import('../../src/lib/core/commands/patch-algebra');
		const before = demoDesign();
		expect('load' in before).toBe(false);
		const after = withLoad({ battery_mAh: 220 });
		const patch = diffDesigns(before, after);
		expect(Object.keys(patch.fields ?? {})).toEqual(['load']);
		const undone = applyPatch(after, invertPatch(patch));
		expect(undone).toStrictEqual(before);
		expect('load' in undone).toBe(false);
	});
});
