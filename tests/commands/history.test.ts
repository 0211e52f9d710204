import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { beginGesture } from '../../src/lib/core/commands/gesture';
import { History } from '../../src/lib/core/commands/history';
import { moveElectrodes } from '../../src/lib/core/commands/move-electrodes';
import { deleteElectrodes } from '../../src/lib/core/commands/delete-electrodes';
import { parseDesignValue } from '../../src/lib/core/design/parse-design';
import { demoDesign } from '../../src/lib/core/design/demo';
import { byId, testDesign } from './fixtures';
import { patchForStep, stepArb } from './random-commands';

describe('History', () => {
	it('undoes and redoes steps, with labels, and a new step clears redo', () => {
		const start = testDesign();
		const h = new History(start);
		expect(h.canUndo).toBe(false);
		h.apply(moveElectrodes(h.design, { ids: ['e1'], dx_mm: 1, dy_mm: 0 }), 'Move');
		h.apply(deleteElectrodes(h.design, { ids: ['e3'] }), 'Delete');
		const end = h.design;
		expect(h.undoLabel).toBe('Delete');
		expect(h.undo()).toBe(true);
		expect(h.redoLabel).toBe('Delete');
		expect(h.undo()).toBe(true);
		expect(h.undo()).toBe(false);
		expect(h.design).toStrictEqual(start);
		h.redo();
		h.redo();
		expect(h.design).toStrictEqual(end);
		h.undo();
		h.apply(moveElectrodes(h.design, { ids: ['e2'], dx_mm: 0, dy_mm: 1 }));
		expect(h.canRedo).toBe(false);
	});

	it('does not record edits that change nothing', () => {
		const h = new History(testDesign());
		expect(h.apply(moveElectrodes(h.design, { ids: ['e1'], dx_mm: 0, dy_mm: 0 }))).toBe(false);
		expect(h.canUndo).toBe(false);
	});

	it('squashes a drag into one undo step and bails a cancelled one back exactly', () => {
		const start = testDesign();
		const h = new History(start);
		const drag = beginGesture(h, 'Drag');
		for (let k = 0; k < 20; k++)
			drag.update(moveElectrodes(h.design, { ids: ['e1', 'e2'], dx_mm: 0.1, dy_mm: 0.05 }));
		drag.commit();
		const moved = h.design;
		expect(byId(moved, 'e1').outline[0].x).toBeCloseTo(2, 12);
		h.undo();
		expect(h.design).toStrictEqual(start);
		expect(h.canUndo).toBe(false);
		h.redo();
		expect(h.design).toStrictEqual(moved);

		const cancelled = beginGesture(h, 'Drag');
		cancelled.update(moveElectrodes(h.design, { ids: ['e3'], dx_mm: 5, dy_mm: 5 }));
		cancelled.update(deleteElectrodes(h.design, { ids: ['e4'] }));
		cancelled.cancel();
		expect(h.design).toStrictEqual(moved);
		expect(() => cancelled.commit()).toThrow(/ended/);
	});

	it('replaces a gesture preview with patches computed against the start', () => {
		const h = new History(testDesign());
		const drag = beginGesture(h, 'Drag');
		for (const dx of [1, 2, 3])
			drag.replace(moveElectrodes(drag.start, { ids: ['e5'], dx_mm: dx, dy_mm: 0 }));
		drag.commit();
		expect(byId(h.design, 'e5').outline[0].x).toBe(19);
		h.undo();
		expect(byId(h.design, 'e5').outline[0].x).toBe(16);
	});

	it('refuses a mark that undo has passed, and notifies listeners', () => {
		const h = new History(testDesign());
		const seen: number[] = [];
		const stop = h.subscribe((d) => seen.push(d.electrodes.length));
		h.apply(deleteElectrodes(h.design, { ids: ['e1'] }));
		const mark = h.mark();
		h.undo();
		expect(() => h.bailToMark(mark)).toThrow(/no longer/);
		stop();
		h.redo();
		expect(seen).toEqual([4, 5]);
	});

	it('random command sequences undo back to the original exactly and redo to the final design', () => {
		fc.assert(
			fc.property(
				fc.array(stepArb, { minLength: 1, maxLength: 14 }),
				fc.boolean(),
				(steps, demo) => {
					const start = demo ? demoDesign() : testDesign();
					const h = new History(start);
					let applied = 0;
					for (const step of steps) {
						const patch = patchForStep(h.design, step);
						if (patch && h.apply(patch, `step ${step.kind}`)) applied++;
					}
					const final = h.design;
					const checked = parseDesignValue(JSON.parse(JSON.stringify(final)));
					expect(checked.ok ? [] : checked.issues).toEqual([]);
					for (let k = 0; k < applied; k++) expect(h.undo()).toBe(true);
					expect(h.canUndo).toBe(false);
					expect(h.design).toStrictEqual(start);
					for (let k = 0; k < applied; k++) expect(h.redo()).toBe(true);
					expect(h.design).toStrictEqual(final);
				}
			),
			{ numRuns: 150 }
		);
	});

	it('bailing to a mark after random commands restores the marked design exactly', () => {
		fc.assert(
			fc.property(
				fc.array(stepArb, { maxLength: 4 }),
				fc.array(stepArb, { minLength: 1, maxLength: 8 }),
				(before, during) => {
					const h = new History(testDesign());
					for (const step of before) {
						const patch = patchForStep(h.design, step);
						if (patch) h.apply(patch);
					}
					const marked = h.design;
					const mark = h.mark();
					for (const step of during) {
						const patch = patchForStep(h.design, step);
						if (patch) h.apply(patch);
					}
					h.bailToMark(mark);
					expect(h.design).toStrictEqual(marked);
					const squashMark = h.mark();
					let changed = false;
					for (const step of during) {
						const patch = patchForStep(h.design, step);
						if (patch && h.apply(patch)) changed = true;
					}
					const after = h.design;
					h.squashToMark(squashMark);
					expect(h.design).toStrictEqual(after);
					if (changed && h.mark().depth > squashMark.depth) {
						h.undo();
						expect(h.design).toStrictEqual(marked);
					}
				}
			),
			{ numRuns: 100 }
		);
	});
});

describe('history listeners', () => {
	it('see the stacks already updated when they are called', () => {
		const design = demoDesign();
		const history = new History(design);
		const seen: [boolean, boolean][] = [];
		history.subscribe(() => seen.push([history.canUndo, history.canRedo]));
		history.apply(moveElectrodes(design, { ids: [design.electrodes[0].id], dx_mm: 1, dy_mm: 0 }));
		history.undo();
		history.redo();
		expect(seen).toEqual([
			[true, false],
			[false, true],
			[true, false]
		]);
	});
});
