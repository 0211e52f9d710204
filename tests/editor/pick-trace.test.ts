/**
 * Traces in the pick tool, while the glass drawing's traces are on show: a click on a trace picks
 * it whole (the properties panel then shows it), dragging it moves every point as one undo step,
 * Delete removes it (undoable); an electrode on top wins the click, and hidden traces are ignored.
 */
import { describe, expect, it } from 'vitest';
import { PickTool } from '$lib/editor/tools/pick-tool';
import type { Trace } from '$lib/core/design/glass-art-schema';
import type { Design } from '$lib/core/design/schema';
import { activeTraces, allTraceNodeKeys } from '$lib/editor/trace-nodes';
import { harness } from './fixtures';
import { del, lead, pointsOf, shown, withTrace } from './trace-fixture';

describe('traces in the pick tool', () => {
	it('a click on a trace picks the whole trace and drops the electrode selection', () => {
		const h = harness(withTrace(), shown);
		h.editor.selection = new Set(['a']);
		const p = h.pointer(new PickTool());
		p.click(35, 40.03);
		expect(h.editor.selection.size).toBe(0);
		expect([...h.editor.nodeSelection]).toEqual(allTraceNodeKeys(lead));
		expect(activeTraces(h.session.design, h.editor.nodeSelection).map((t) => t.id)).toEqual([
			lead.id
		]);
		// empty glass clears it; an electrode click replaces it
		p.click(50, 50);
		expect(h.editor.nodeSelection.size).toBe(0);
		p.click(35, 40);
		const [id] = h.ctx.design.electrodes.map((e) => e.id);
		const electrode = h.ctx.design.electrodes[0].outline[0];
		p.click(electrode.x + 0.5, electrode.y + 0.5);
		expect([...h.editor.selection]).toEqual([id]);
		expect(h.editor.nodeSelection.size).toBe(0);
	});

	it('dragging a picked trace moves all its points as one undo step', () => {
		const h = harness(withTrace(), shown);
		h.pointer(new PickTool()).drag([35, 40], [37, 41]);
		expect(pointsOf(h.session.design)).toEqual([
			[32, 31],
			[32, 41],
			[42, 41]
		]);
		expect(h.session.history.undoLabel).toBe('Move trace');
		h.session.history.undo();
		expect(pointsOf(h.session.design)).toEqual(pointsOf(withTrace()));
	});

	it('several picked traces drag together; a plain click keeps only the one clicked', () => {
		const other: Trace = {
			...lead,
			id: 'ts-seg2-1',
			net: 'seg2',
			points: [
				{ x: 50, y: 30 },
				{ x: 50, y: 40 }
			]
		};
		const base = withTrace();
		const h = harness({ ...base, glassArt: { ...base.glassArt, traces: [lead, other] } }, shown);
		const p = h.pointer(new PickTool());
		p.click(30, 35);
		p.click(50, 35, { shift: true });
		expect(h.editor.nodeSelection.size).toBe(5);
		p.drag([50, 35], [51, 35]);
		const xs = (d: Design) => d.glassArt.traces.map((t) => t.points.map((q) => q.x));
		expect(xs(h.session.design)).toEqual([
			[31, 31, 41],
			[51, 51]
		]);
		expect(h.session.history.undoLabel).toBe('Move trace');
		p.click(51, 35);
		expect([...h.editor.nodeSelection]).toEqual(allTraceNodeKeys(other));
		// a selection box on empty glass drops the picked trace
		p.drag([60, 60], [70, 70]);
		expect(h.editor.nodeSelection.size).toBe(0);
	});

	it('Delete removes the picked trace, and undo brings it back', () => {
		const h = harness(withTrace(), shown);
		const tool = new PickTool();
		h.pointer(tool).click(30, 35);
		expect(tool.key(h.ctx, del)).toBe(true);
		expect(h.session.design.glassArt.traces).toEqual([]);
		expect(h.editor.nodeSelection.size).toBe(0);
		h.session.history.undo();
		expect(h.session.design.glassArt.traces).toEqual([lead]);
		// with nothing picked, Delete is left to the electrode actions
		expect(tool.key(h.ctx, del)).toBe(false);
	});

	it('leaves traces alone while they are hidden', () => {
		const h = harness(withTrace());
		const p = h.pointer(new PickTool());
		p.click(30, 35);
		expect(h.editor.nodeSelection.size).toBe(0);
		p.drag([30, 35], [32, 36]);
		expect(pointsOf(h.session.design)).toEqual(pointsOf(withTrace()));
	});
});
