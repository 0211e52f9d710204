/**
 * Traces of the glass drawing edit like electrode points in the points tool: pick a trace by
 * clicking it, drag its points (one undo step per drag), add a point with a double click, delete
 * points (the whole trace when fewer than two would remain) — only while the traces are on show.
 */
import { describe, expect, it } from 'vitest';
import { PointsTool } from '$lib/editor/tools/points-tool';
import { allTraceNodeKeys, parseTraceNodeKey, traceNodeKey } from '$lib/editor/trace-nodes';
import { parseNodeKey } from '$lib/editor/node-refs';
import { harness } from './fixtures';
import { del, lead, pointsOf, shown, withTrace } from './trace-fixture';

describe('trace points in the points tool', () => {
	it('keys of trace points never read as electrode points, and back', () => {
		const key = traceNodeKey({ traceId: 'tc-com1.2', index: 7 });
		expect(parseTraceNodeKey(key)).toEqual({ traceId: 'tc-com1.2', index: 7 });
		expect(parseNodeKey(key)).toBeNull();
		expect(parseTraceNodeKey('a/0/3')).toBeNull();
	});

	it('a click picks the whole trace; dragging a point moves it as one undo step', () => {
		const h = harness(withTrace(), shown);
		const p = h.pointer(new PointsTool());
		p.click(30.02, 35);
		expect([...h.editor.nodeSelection]).toEqual(allTraceNodeKeys(lead));
		p.click(50, 50);
		expect(h.editor.nodeSelection.size).toBe(0);
		// any shown trace's point can be grabbed directly
		p.click(30, 40);
		expect([...h.editor.nodeSelection]).toEqual([traceNodeKey({ traceId: lead.id, index: 1 })]);
		p.drag([30, 40], [32, 41]);
		expect(pointsOf(h.session.design)).toEqual([
			[30, 30],
			[32, 41],
			[40, 40]
		]);
		expect(h.session.history.undoLabel).toBe('Move point');
		h.session.history.undo();
		expect(pointsOf(h.session.design)).toEqual(pointsOf(withTrace()));
	});

	it('adds a point with a double click on the picked trace and deletes points with Delete', () => {
		const h = harness(withTrace(), shown);
		const tool = new PointsTool();
		const p = h.pointer(tool);
		p.click(35, 40);
		p.down(35, 40, { clicks: 2 });
		p.up(35, 40);
		expect(pointsOf(h.session.design)).toEqual([
			[30, 30],
			[30, 40],
			[35, 40],
			[40, 40]
		]);
		expect([...h.editor.nodeSelection]).toEqual([traceNodeKey({ traceId: lead.id, index: 2 })]);
		tool.key(h.ctx, del);
		expect(pointsOf(h.session.design)).toEqual(pointsOf(withTrace()));
		// the whole trace picked: Delete removes it
		p.click(30, 35);
		tool.key(h.ctx, del);
		expect(h.session.design.glassArt.traces).toEqual([]);
		h.session.history.undo();
		expect(h.session.design.glassArt.traces).toEqual([lead]);
		// two of its three points: one would remain, so the trace goes as a whole
		p.click(50, 50);
		p.click(30, 30);
		p.click(40, 40, { shift: true });
		expect(h.editor.nodeSelection.size).toBe(2);
		tool.key(h.ctx, del);
		expect(h.session.design.glassArt.traces).toEqual([]);
	});

	it('moves electrode and trace points together in one step', () => {
		const h = harness(withTrace(), shown);
		h.editor.selection = new Set(['a']);
		h.editor.nodeSelection = new Set(['a/0/0', traceNodeKey({ traceId: lead.id, index: 0 })]);
		h.pointer(new PointsTool()).drag([10, 10], [11, 10]);
		expect(h.session.design.electrodes[0].outline[0]).toEqual({ x: 11, y: 10 });
		expect(pointsOf(h.session.design)![0]).toEqual([31, 30]);
		expect(h.session.history.undoLabel).toBe('Move points');
	});

	it('leaves traces alone while they are hidden', () => {
		const h = harness(withTrace());
		const p = h.pointer(new PointsTool());
		p.click(30, 35);
		expect(h.editor.nodeSelection.size).toBe(0);
		p.drag([30, 40], [32, 41]);
		expect(pointsOf(h.session.design)).toEqual(pointsOf(withTrace()));
	});
});
