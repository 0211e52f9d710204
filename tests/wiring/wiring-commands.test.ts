import { describe, expect, it } from 'vitest';
import { setPinout } from '../../src/lib/core/commands/set-pinout';
import { setElectrodeProperties } from '../../src/lib/core/commands/set-electrode-properties';
import { assignElectrodes } from '../../src/lib/core/commands/assign-electrodes';
import { autoAssign } from '../../src/lib/core/commands/auto-assign';
import { applyPatch } from '../../src/lib/core/commands/patch';
import { invertPatch } from '../../src/lib/core/commands/patch-algebra';
import { crossingMatrix } from '../../src/lib/core/wiring/crossing-matrix';
import { demoDesign } from '../../src/lib/core/design/demo';

describe('wiring edits', () => {
	it('sets the pin-out and refuses a bad pitch naming the field', () => {
		const demo = demoDesign();
		const patch = setPinout(demo, { edge: 'top', pitch_mm: 0.7 });
		expect(applyPatch(demo, patch).pinout).toEqual({ ...demo.pinout, edge: 'top', pitch_mm: 0.7 });
		expect(applyPatch(applyPatch(demo, patch), invertPatch(patch))).toEqual(demo);
		expect(() => setPinout(demo, { pitch_mm: 0 })).toThrow(/pinout\.pitch_mm/);
	});

	it('locks an electrode so automatic wiring keeps it', () => {
		const demo = demoDesign();
		const locked = applyPatch(demo, setElectrodeProperties(demo, { ids: ['rain'], locked: true }));
		expect(locked.electrodes.find((e) => e.id === 'rain')!.locked).toBe(true);
		const rain = locked.electrodes.find((e) => e.id === 'rain')!;
		const wired = applyPatch(locked, autoAssign(locked, { commons: 2 }));
		expect(wired.electrodes.find((e) => e.id === 'rain')).toBe(rain);
	});

	it('moving an electrode onto an occupied crossing doubles that cell, and undo clears it', () => {
		const demo = demoDesign();
		const target = demo.electrodes.find((e) => e.id === 'd1b')!;
		const patch = assignElectrodes(demo, {
			ids: ['d1a'],
			common: target.common,
			line: target.line
		});
		const moved = applyPatch(demo, patch);
		const matrix = crossingMatrix(moved);
		expect([...matrix.conflicting].sort()).toEqual(['d1a', 'd1b']);
		const row = moved.commons.findIndex((c) => c.id === target.common);
		const column = moved.segmentLines.findIndex((l) => l.id === target.line);
		expect(matrix.cells[row][column].electrodes).toEqual(['d1a', 'd1b']);
		expect(crossingMatrix(applyPatch(moved, invertPatch(patch))).conflicting.size).toBe(0);
	});
});
