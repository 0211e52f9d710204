import { describe, expect, it } from 'vitest';
import { ShapeTool, shapeForDrag } from '$lib/editor/tools/shape-tool';
import { CurveTool } from '$lib/editor/tools/curve-tool';
import { shapeTightBounds } from '$lib/core/geometry/tight-bounds';
import { shapeArea } from '$lib/core/geometry/polygon';
import { harness } from './fixtures';

const last = (h: ReturnType<typeof harness>) => h.session.design.electrodes.at(-1)!;

describe('Box, Rounded, Oval and Polygon tools', () => {
	it('draw one snapped rectangle per drag and select it', () => {
		const h = harness();
		const tool = new ShapeTool('box');
		const p = h.pointer(tool);
		p.drag([30.1, 30.2], [35.9, 33.1]);
		expect(h.session.design.electrodes).toHaveLength(4);
		const e = last(h);
		expect(e.outline).toEqual([
			{ x: 30, y: 30 },
			{ x: 36, y: 30 },
			{ x: 36, y: 33 },
			{ x: 30, y: 33 }
		]);
		expect(e.common).toBeNull();
		expect([...h.editor.selection]).toEqual([e.id]);
		expect(h.editor.overlay.draft).toBeNull();
		h.session.history.undo();
		expect(h.session.design.electrodes).toHaveLength(3);
	});

	it('shows a draft while dragging and drops it on Escape', () => {
		const h = harness();
		const tool = new ShapeTool('oval');
		const p = h.pointer(tool);
		p.down(30, 30);
		p.move(34, 32);
		expect(h.editor.overlay.draft?.closed).toBe(true);
		expect(tool.state).toBe('drawing');
		tool.cancel(h.ctx);
		p.up(34, 32);
		expect(h.session.design.electrodes).toHaveLength(3);
		expect(h.editor.overlay.draft).toBeNull();
	});

	it('a click without a drag draws nothing and returns to idle', () => {
		const h = harness();
		const tool = new ShapeTool('box');
		h.pointer(tool).click(30, 30);
		expect(h.session.design.electrodes).toHaveLength(3);
		expect(tool.state).toBe('idle');
	});

	it('shift makes squares and circles; alt draws from the centre', () => {
		const sq = shapeForDrag({
			kind: 'box',
			a: { x: 0, y: 0 },
			b: { x: 4, y: 1 },
			shift: true,
			alt: false,
			cornerRadius_mm: 0,
			polygonSides: 6
		})!;
		const b = shapeTightBounds({ outline: sq, holes: [] });
		expect(b.maxX - b.minX).toBeCloseTo(4, 12);
		expect(b.maxY - b.minY).toBeCloseTo(4, 12);
		const centred = shapeForDrag({
			kind: 'oval',
			a: { x: 10, y: 10 },
			b: { x: 12, y: 11 },
			shift: false,
			alt: true,
			cornerRadius_mm: 0,
			polygonSides: 6
		})!;
		const c = shapeTightBounds({ outline: centred, holes: [] });
		expect(c.minX).toBeCloseTo(8, 9);
		expect(c.maxY).toBeCloseTo(11, 9);
	});

	it('draws regular polygons with the chosen number of sides', () => {
		const h = harness(undefined, { polygonSides: 5 });
		h.pointer(new ShapeTool('polygon')).drag([40, 40], [40, 37]);
		expect(last(h).outline).toHaveLength(5);
	});

	it('rounded boxes use the corner radius', () => {
		const h = harness(undefined, { cornerRadius_mm: 1 });
		h.pointer(new ShapeTool('rounded')).drag([30, 30], [36, 34]);
		const e = last(h);
		expect(shapeTightBounds(e)).toEqual({ minX: 30, minY: 30, maxX: 36, maxY: 34 });
		// A 6 × 4 mm box with four quarter-circle corners of r = 1 mm: A = w·h − (4 − π)·r²
		// = 24 − 0.858407 = 23.141593 mm² (the Bezier quarter circle is within 0.03 % of a true arc).
		expect(Math.abs(shapeArea(e, { tolerance_um: 0.01 }) - 23.141593)).toBeLessThan(1e-3);
	});
});

describe('Curve tool', () => {
	it('places corners and smooth points and closes on the first point', () => {
		const h = harness(undefined, { snapToGrid: false, snapToShapes: false });
		const tool = new CurveTool();
		const p = h.pointer(tool);
		p.click(30, 30);
		expect(tool.state).toBe('placing');
		p.click(36, 30);
		p.down(36, 35);
		p.move(37, 36);
		p.move(38, 37);
		p.up(38, 37);
		expect(tool.points).toHaveLength(3);
		expect(tool.points[2].out).toEqual([2, 2]);
		expect(tool.points[2].in).toEqual([-2, -2]);
		p.move(30.2, 30.1);
		// The rubber band follows the pointer to the next point, before the click places it.
		expect(h.editor.overlay.draft?.rubber).toEqual({ x: 30.2, y: 30.1 });
		expect(h.editor.overlay.draft?.closed).toBe(false);
		p.click(30.1, 30.1);
		expect(tool.state).toBe('idle');
		const e = last(h);
		expect(e.outline).toHaveLength(3);
		expect(e.outline[2].out).toEqual([2, 2]);
		expect([...h.editor.selection]).toEqual([e.id]);
	});

	it('Enter finishes, Backspace removes the last point, Escape drops the draft', () => {
		const h = harness(undefined, { snapToGrid: false, snapToShapes: false });
		const tool = new CurveTool();
		const p = h.pointer(tool);
		const key = (k: string) => tool.key(h.ctx, { key: k, shift: false, alt: false, mod: false });
		p.click(30, 30);
		p.click(34, 30);
		p.click(34, 34);
		p.click(30, 34);
		expect(key('Backspace')).toBe(true);
		expect(tool.points).toHaveLength(3);
		expect(key('Enter')).toBe(true);
		expect(last(h).outline).toHaveLength(3);
		p.click(50, 50);
		tool.cancel(h.ctx);
		expect(tool.state).toBe('idle');
		expect(h.session.design.electrodes).toHaveLength(4);
		expect(key('Enter')).toBe(false);
	});

	it('refuses to close with fewer than three points', () => {
		const h = harness();
		const tool = new CurveTool();
		const p = h.pointer(tool);
		p.click(30, 30);
		p.click(32, 30);
		tool.key(h.ctx, { key: 'Enter', shift: false, alt: false, mod: false });
		expect(h.session.design.electrodes).toHaveLength(3);
	});
});
