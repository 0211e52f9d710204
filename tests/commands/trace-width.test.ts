/**
 * A trace's width edits as one undoable step; a width the document cannot hold, or an unknown
 * trace, is refused with the field named and nothing changed.
 */
import { describe, expect, it } from 'vitest';
import { setTraceWidth } from '../../src/lib/core/commands/set-trace-width';
import { invertPatch } from '../../src/lib/core/commands/patch-algebra';
import type { Trace } from '../../src/lib/core/design/glass-art-schema';
import type { Design } from '../../src/lib/core/design/schema';
import { run, testDesign } from './fixtures';

const lead = (id: string, width_mm: number): Trace => ({
	id,
	plate: 'segment',
	net: 'seg1',
	width_mm,
	points: [
		{ x: 1, y: 2 },
		{ x: 1, y: 10 }
	]
});

function withTraces(): Design {
	const d = testDesign();
	return { ...d, glassArt: { ...d.glassArt, traces: [lead('t1', 0.1), lead('t2', 0.1)] } };
}

const widths = (d: Design) => d.glassArt.traces.map((t) => t.width_mm);

describe('trace width', () => {
	it('sets the width of the chosen traces only, and undo gives the design back', () => {
		const before = withTraces();
		const patch = setTraceWidth(before, { ids: ['t2'], width_mm: 0.25 });
		const after = run(before, patch);
		expect(widths(after)).toEqual([0.1, 0.25]);
		expect(after.glassArt.traces[1].points).toEqual(before.glassArt.traces[1].points);
		expect(run(after, invertPatch(patch))).toEqual(before);
	});

	it('refuses widths outside the document range, naming the field', () => {
		const d = withTraces();
		expect(() => setTraceWidth(d, { ids: ['t1'], width_mm: 0 })).toThrow(
			/glassArt\.traces\.0\.width_mm/
		);
		expect(() => setTraceWidth(d, { ids: ['t1'], width_mm: Number.NaN })).toThrow(
			/glassArt\.traces\.0\.width_mm/
		);
		expect(() => setTraceWidth(d, { ids: ['t1'], width_mm: 6 })).toThrow(/width_mm/);
	});

	it('refuses an unknown trace or an empty list', () => {
		const d = withTraces();
		expect(() => setTraceWidth(d, { ids: ['nope'], width_mm: 0.2 })).toThrow(/no trace "nope"/);
		expect(() => setTraceWidth(d, { ids: [], width_mm: 0.2 })).toThrow(/at least one trace/);
	});
});
