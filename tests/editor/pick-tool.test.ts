import { describe, expect, it } from 'vitest';
import { PickTool } from '$lib/editor/tools/pick-tool';
import { electrode, harness } from './fixtures';

describe('Pick tool', () => {
	it('selects on click, adds with shift, toggles off with shift, clears on empty glass', () => {
		const h = harness();
		const tool = new PickTool();
		const p = h.pointer(tool);
		p.click(11, 11);
		expect([...h.editor.selection]).toEqual(['a']);
		p.click(21, 11, { shift: true });
		expect([...h.editor.selection].sort()).toEqual(['a', 'b']);
		p.click(21, 11, { shift: true });
		expect([...h.editor.selection]).toEqual(['a']);
		p.click(40, 40);
		expect(h.editor.selection.size).toBe(0);
		expect(tool.state).toBe('idle');
	});

	it('moves the selection by a drag as one undo step, snapping the grabbed corner to the grid', () => {
		const h = harness();
		const tool = new PickTool();
		const p = h.pointer(tool);
		// Grab a's top-left vertex and drag by (3.13, 1.96): the vertex lands on the 0.5 mm grid.
		p.drag([10.02, 10.02], [13.15, 11.98]);
		const moved = electrode(h.session.design, 'a').outline[0];
		expect(moved.x).toBeCloseTo(13, 9);
		expect(moved.y).toBeCloseTo(12, 9);
		expect(h.session.history.canUndo).toBe(true);
		h.session.history.undo();
		expect(h.session.history.canUndo).toBe(false);
		expect(electrode(h.session.design, 'a').outline[0]).toEqual({ x: 10, y: 10 });
	});

	it('drags a multi-selection together', () => {
		const h = harness();
		h.editor.selection = new Set(['a', 'b']);
		const p = h.pointer(new PickTool());
		p.drag([11, 11], [11, 16]);
		expect(electrode(h.session.design, 'a').outline[0].y).toBeCloseTo(15, 9);
		expect(electrode(h.session.design, 'b').outline[0].y).toBeCloseTo(15, 9);
		expect(electrode(h.session.design, 'c').outline[0].y).toBe(20);
	});

	it('Escape in the middle of a drag restores the design exactly', () => {
		const h = harness();
		const before = h.session.design;
		const tool = new PickTool();
		const p = h.pointer(tool);
		p.down(11, 11);
		p.move(14, 15);
		p.move(16, 17);
		expect(h.session.design).not.toBe(before);
		tool.cancel(h.ctx);
		expect(h.session.design.electrodes).toEqual(before.electrodes);
		expect(h.session.design.electrodes[0]).toBe(before.electrodes[0]);
		expect(h.session.history.canUndo).toBe(false);
		expect(tool.state).toBe('idle');
		p.up(16, 17);
		expect(h.session.history.canUndo).toBe(false);
	});

	it('a small wobble under the drag threshold is a click, not a move', () => {
		const h = harness();
		const p = h.pointer(new PickTool());
		p.drag([11, 11], [11.1, 11.1], {}, 2);
		expect(h.session.history.canUndo).toBe(false);
		expect([...h.editor.selection]).toEqual(['a']);
	});

	it('box-selects: left to right takes what is inside, right to left what it touches', () => {
		const h = harness();
		const p = h.pointer(new PickTool());
		p.drag([9, 9], [21, 23]);
		expect([...h.editor.selection].sort()).toEqual(['a', 'c']);
		p.drag([21, 9], [9, 11]);
		expect([...h.editor.selection].sort()).toEqual(['a', 'b']);
		expect(h.editor.overlay.marquee).toBeNull();
	});

	it('shows a snap marker while moving and a readout', () => {
		const h = harness();
		const tool = new PickTool();
		const p = h.pointer(tool);
		p.down(11, 11);
		p.move(14.3, 11);
		// Square a's corner (10, 10) moved by 3.3 mm lands at 13.3; the 0.5 mm grid takes it to 13.5.
		expect(h.editor.overlay.snap).toEqual({ kind: 'grid', point: { x: 13.5, y: 10 } });
		expect(h.editor.overlay.readout?.text).toMatch(/^Δ /);
		p.up(14.3, 11);
		expect(h.editor.overlay.readout).toBeNull();
	});

	it('snaps a moved vertex onto another electrode’s vertex', () => {
		const h = harness(undefined, { snapToGrid: false });
		const p = h.pointer(new PickTool());
		// Drag a's top-right corner (12, 10) close to b's top-left corner (20, 10).
		p.drag([11.99, 10.01], [19.7, 10.3]);
		const moved = electrode(h.session.design, 'a').outline[1];
		expect(moved.x).toBeCloseTo(20, 9);
		expect(moved.y).toBeCloseTo(10, 9);
	});

	it('keeps 15° directions with shift', () => {
		const h = harness(undefined, { snapToGrid: false, snapToShapes: false });
		const p = h.pointer(new PickTool());
		p.drag([11, 11], [15, 11.4], { shift: true });
		const moved = electrode(h.session.design, 'a').outline[0];
		expect(moved.y).toBeCloseTo(10, 9);
		expect(moved.x).toBeGreaterThan(13.5);
	});
});
