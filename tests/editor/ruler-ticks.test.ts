import { describe, expect, it } from 'vitest';
import { formatRulerValue, gridLines, niceStep_mm, rulerTicks } from '$lib/editor/ruler-ticks';

describe('ruler ticks', () => {
	it('picks 1-2-5 steps at least the requested distance apart', () => {
		expect(niceStep_mm(10, 64)).toBe(10);
		expect(niceStep_mm(40, 64)).toBe(2);
		expect(niceStep_mm(100, 64)).toBe(1);
		expect(niceStep_mm(1000, 64)).toBeCloseTo(0.1, 12);
		expect(niceStep_mm(3, 64)).toBe(50);
	});

	it('labels whole major steps and keeps minor ticks readable', () => {
		const { major_mm, ticks } = rulerTicks({ scale_px_per_mm: 10, offset_px: 5, length_px: 400 });
		expect(major_mm).toBe(10);
		const labelled = ticks.filter((t) => t.level === 0).map((t) => t.value_mm);
		expect(labelled).toEqual([0, 10, 20, 30, 40]);
		const minors = ticks.filter((t) => t.level === 2);
		expect(minors.length).toBeGreaterThan(0);
		const gaps = ticks.slice(1).map((t, i) => t.pos_px - ticks[i].pos_px);
		expect(Math.min(...gaps)).toBeGreaterThanOrEqual(5 - 1e-9);
		expect(ticks.find((t) => t.value_mm === 5)?.level).toBe(1);
	});

	it('covers negative coordinates and returns nothing for a broken axis', () => {
		const { ticks } = rulerTicks({ scale_px_per_mm: 10, offset_px: 200, length_px: 400 });
		expect(ticks.some((t) => t.value_mm < 0 && t.level === 0)).toBe(true);
		expect(rulerTicks({ scale_px_per_mm: NaN, offset_px: 0, length_px: 100 }).ticks).toEqual([]);
		expect(rulerTicks({ scale_px_per_mm: 0, offset_px: 0, length_px: 100 }).ticks).toEqual([]);
	});

	it('prints values without float noise', () => {
		expect(formatRulerValue(0.30000000000000004, 0.1)).toBe('0.3');
		expect(formatRulerValue(-0.0000001, 1)).toBe('0');
		expect(formatRulerValue(20, 10)).toBe('20');
	});
});

describe('grid lines', () => {
	it('uses the pitch when lines are far enough apart', () => {
		const g = gridLines({ pitch_mm: 1, scale_px_per_mm: 10, from_mm: 0, to_mm: 20 });
		expect(g.step_mm).toBe(1);
		expect(g.lines).toHaveLength(21);
		expect(g.lines.filter((l) => l.major).map((l) => l.at_mm)).toEqual([0, 10, 20]);
	});

	it('thins the grid when zoomed out', () => {
		const g = gridLines({ pitch_mm: 0.5, scale_px_per_mm: 4, from_mm: 0, to_mm: 40 });
		expect(g.step_mm * 4).toBeGreaterThanOrEqual(8);
		expect(g.step_mm).toBe(2.5);
	});

	it('refuses nonsense input', () => {
		expect(gridLines({ pitch_mm: 0, scale_px_per_mm: 4, from_mm: 0, to_mm: 40 }).lines).toEqual([]);
		expect(gridLines({ pitch_mm: 1, scale_px_per_mm: 4, from_mm: NaN, to_mm: 40 }).lines).toEqual(
			[]
		);
	});
});
