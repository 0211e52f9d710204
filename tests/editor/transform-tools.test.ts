import { describe, expect, it } from 'vitest';
import { TurnTool, angleBetween } from '$lib/editor/tools/turn-tool';
import { SizeTool } from '$lib/editor/tools/size-tool';
import { PointsTool } from '$lib/editor/tools/points-tool';
import { shapeTightBounds } from '$lib/core/geometry/tight-bounds';
import { turnHandlePoint, sizeHandlePoint, scaleForHandle } from '$lib/editor/handles';
import { electrode, harness, square } from './fixtures';
import { testDesign } from './fixtures';

describe('Turn tool', () => {
	it('measures signed angles clockwise on screen', () => {
		expect(angleBetween({ x: 0, y: 0 }, { x: 1, y: 0 }, { x: 0, y: 1 })).toBeCloseTo(90, 12);
		expect(angleBetween({ x: 0, y: 0 }, { x: 1, y: 0 }, { x: 0, y: -1 })).toBeCloseTo(-90, 12);
	});

	it('turns the selection about its centre in 15° steps with shift, as one undo step', () => {
		const design = {
			...testDesign(),
			electrodes: [
				{
					...square('a', 10, 10),
					outline: [
						{ x: 10, y: 10 },
						{ x: 14, y: 10 },
						{ x: 14, y: 11 },
						{ x: 10, y: 11 }
					]
				}
			]
		};
		const h = harness(design);
		h.editor.selection = new Set(['a']);
		const b = h.ctx.selectionBounds()!;
		const knob = turnHandlePoint(b, h.ctx.scale_px_per_mm);
		// From the knob above the centre (12, 10.5) to the right of it: a quarter turn clockwise.
		h.pointer(new TurnTool()).drag([knob.x, knob.y], [16, 10.6], { shift: true });
		const after = shapeTightBounds(electrode(h.session.design, 'a'));
		expect(after.maxX - after.minX).toBeCloseTo(1, 9);
		expect(after.maxY - after.minY).toBeCloseTo(4, 9);
		expect((after.minX + after.maxX) / 2).toBeCloseTo(12, 9);
		h.session.history.undo();
		expect(h.session.history.canUndo).toBe(false);
	});

	it('pressing on an unselected electrode selects it instead of turning', () => {
		const h = harness();
		h.editor.selection = new Set(['a']);
		const tool = new TurnTool();
		h.pointer(tool).drag([21, 11], [25, 15]);
		expect([...h.editor.selection]).toEqual(['b']);
		expect(h.session.history.canUndo).toBe(false);
	});
});

describe('Size tool', () => {
	it('stretches from a corner handle with the opposite corner fixed', () => {
		const h = harness();
		h.editor.selection = new Set(['a']);
		const se = sizeHandlePoint(h.ctx.selectionBounds()!, 'se');
		h.pointer(new SizeTool()).drag([se.x, se.y], [se.x + 2, se.y + 1]);
		const b = shapeTightBounds(electrode(h.session.design, 'a'));
		expect(b).toEqual({ minX: 10, minY: 10, maxX: 14, maxY: 13 });
	});

	it('keeps proportions with shift and never collapses to zero', () => {
		const r = scaleForHandle({
			bounds: { minX: 0, minY: 0, maxX: 2, maxY: 1 },
			handle: 'se',
			to: { x: 4, y: 1.2 },
			uniform: true
		});
		expect(r.sx).toBeCloseTo(2, 12);
		expect(r.sy).toBeCloseTo(2, 12);
		const flat = scaleForHandle({
			bounds: { minX: 0, minY: 0, maxX: 2, maxY: 1 },
			handle: 'e',
			to: { x: 0, y: 0 },
			uniform: false
		});
		expect(flat.sx).not.toBe(0);
		expect(flat.sy).toBe(1);
	});
});

describe('Nodes tool', () => {
	it('drags one point of the selected electrode and leaves the rest', () => {
		const h = harness();
		h.editor.selection = new Set(['a']);
		const p = h.pointer(new PointsTool());
		p.drag([12, 12], [13, 13.5]);
		const outline = electrode(h.session.design, 'a').outline;
		expect(outline[2]).toEqual({ x: 13, y: 13.5 });
		expect(outline[0]).toEqual({ x: 10, y: 10 });
		expect(h.editor.nodeSelection.size).toBe(1);
	});

	it('deletes selected points with Delete and adds one on an edge with a double click', () => {
		const h = harness();
		h.editor.selection = new Set(['a']);
		const tool = new PointsTool();
		const p = h.pointer(tool);
		p.down(11, 10, { clicks: 2 });
		p.up(11, 10);
		expect(electrode(h.session.design, 'a').outline).toHaveLength(5);
		const added = electrode(h.session.design, 'a').outline[1];
		expect(added.x).toBeCloseTo(11, 9);
		expect(added.y).toBeCloseTo(10, 9);
		p.click(12, 12);
		expect(tool.key(h.ctx, { key: 'Delete', shift: false, alt: false, mod: false })).toBe(true);
		expect(electrode(h.session.design, 'a').outline).toHaveLength(4);
		expect(h.editor.nodeSelection.size).toBe(0);
	});

	it('box-selects points and moves them together; Escape bails', () => {
		const h = harness();
		h.editor.selection = new Set(['a']);
		const tool = new PointsTool();
		const p = h.pointer(tool);
		p.drag([9, 9], [12.5, 10.5]);
		expect(h.editor.nodeSelection.size).toBe(2);
		const before = h.session.design;
		p.down(10, 10);
		p.move(10, 11);
		p.move(10, 12);
		tool.cancel(h.ctx);
		expect(h.session.design.electrodes[0]).toBe(before.electrodes[0]);
		p.drag([10, 10], [10, 11]);
		const outline = electrode(h.session.design, 'a').outline;
		expect(outline[0].y).toBeCloseTo(11, 9);
		expect(outline[1].y).toBeCloseTo(11, 9);
		expect(outline[2].y).toBe(12);
	});

	it('clicking an unselected electrode selects it for editing', () => {
		const h = harness();
		h.pointer(new PointsTool()).click(21, 11);
		expect([...h.editor.selection]).toEqual(['b']);
	});
});
