import { describe, expect, it } from 'vitest';
import { applyGlassPlan, glassPlanInputs } from '../../src/lib/core/commands/apply-glass-plan';
import { deleteTracePoint } from '../../src/lib/core/commands/delete-trace-point';
import { deleteTraces } from '../../src/lib/core/commands/delete-traces';
import { insertTracePoint } from '../../src/lib/core/commands/insert-trace-point';
import { moveTracePoint } from '../../src/lib/core/commands/move-trace-point';
import { invertPatch } from '../../src/lib/core/commands/patch-algebra';
import type { Trace, Transfer } from '../../src/lib/core/design/glass-art-schema';
import type { Design } from '../../src/lib/core/design/schema';
import { run, testDesign } from './fixtures';

const lead = (id: string, points: [number, number][]): Trace => ({
	id,
	plate: 'segment',
	net: 'seg1',
	width_mm: 0.1,
	points: points.map(([x, y]) => ({ x, y }))
});

function withTraces(): Design {
	const d = testDesign();
	return {
		...d,
		glassArt: {
			...d.glassArt,
			traces: [
				lead('t1', [
					[1, 2],
					[1, 10],
					[5, 10]
				]),
				lead('t2', [
					[5, 2],
					[5, 8]
				])
			]
		}
	};
}

const pointsOf = (d: Design, id: string) =>
	d.glassArt.traces.find((t) => t.id === id)!.points.map((p) => [p.x, p.y]);

/** Undo is the inverse patch: it must give back the very design the edit started from. */
function expectUndoable(before: Design, patch: Parameters<typeof run>[1]) {
	const after = run(before, patch);
	expect(run(after, invertPatch(patch))).toEqual(before);
	return after;
}

describe('hand editing of traces', () => {
	it('moves one point of one trace and leaves every other point alone', () => {
		const d = withTraces();
		const next = expectUndoable(
			d,
			moveTracePoint(d, { ref: { traceId: 't1', index: 1 }, x_mm: 3, y_mm: 12 })
		);
		expect(pointsOf(next, 't1')).toEqual([
			[1, 2],
			[3, 12],
			[5, 10]
		]);
		expect(pointsOf(next, 't2')).toEqual(pointsOf(d, 't2'));
		expect(() => moveTracePoint(d, { ref: { traceId: 't1', index: 3 }, x_mm: 0, y_mm: 0 })).toThrow(
			/no point 3/
		);
		expect(() =>
			moveTracePoint(d, { ref: { traceId: 'nope', index: 0 }, x_mm: 0, y_mm: 0 })
		).toThrow(/no trace "nope"/);
		expect(() =>
			moveTracePoint(d, { ref: { traceId: 't1', index: 0 }, x_mm: NaN, y_mm: 0 })
		).toThrow(/finite/);
	});

	it('inserts a point on an edge without changing the course, then deletes it again', () => {
		const d = withTraces();
		// a quarter of the way along the edge (1,10)→(5,10) is (2,10)
		const added = expectUndoable(d, insertTracePoint(d, { traceId: 't1', edgeIndex: 1, t: 0.25 }));
		expect(pointsOf(added, 't1')).toEqual([
			[1, 2],
			[1, 10],
			[2, 10],
			[5, 10]
		]);
		expect(() => insertTracePoint(d, { traceId: 't1', edgeIndex: 2, t: 0.5 })).toThrow(/no edge 2/);
		expect(() => insertTracePoint(d, { traceId: 't1', edgeIndex: 0, t: 1 })).toThrow(/strictly/);
		const removed = expectUndoable(
			added,
			deleteTracePoint(added, { ref: { traceId: 't1', index: 2 } })
		);
		expect(pointsOf(removed, 't1')).toEqual(pointsOf(d, 't1'));
	});

	it('keeps at least two points on a trace; whole traces are deleted instead', () => {
		const d = withTraces();
		expect(() => deleteTracePoint(d, { ref: { traceId: 't2', index: 0 } })).toThrow(
			/at least 2 points/
		);
		const next = expectUndoable(d, deleteTraces(d, { ids: ['t2'] }));
		expect(next.glassArt.traces.map((t) => t.id)).toEqual(['t1']);
		expect(() => deleteTraces(d, { ids: ['t2', 'ghost'] })).toThrow(/no trace "ghost"/);
	});
});

describe('applying a glass plan', () => {
	const transfers: Transfer[] = [{ common: 'com1', x_mm: 30, y_mm: 1, diameter_mm: 0.8 }];
	const plan = {
		transfers,
		traces: [
			lead('p1', [
				[0, 0],
				[0, 5]
			])
		]
	};

	it('replaces transfer points and traces in one undoable step and keeps the settings', () => {
		const d = withTraces();
		const next = expectUndoable(d, applyGlassPlan(d, { plan, madeFrom: glassPlanInputs(d) }));
		expect(next.glassArt.traces.map((t) => t.id)).toEqual(['p1']);
		expect(next.glassArt.transfers).toEqual(transfers);
		expect(next.glassArt.seal).toEqual(d.glassArt.seal);
		expect(next.glassArt.traceWidth_mm).toBe(d.glassArt.traceWidth_mm);
	});

	it('sets aside a plan made from an older drawing', () => {
		const d = withTraces();
		const madeFrom = glassPlanInputs(d);
		const moved = run(d, moveTracePoint(d, { ref: { traceId: 't2', index: 1 }, x_mm: 6, y_mm: 8 }));
		expect(() => applyGlassPlan(moved, { plan, madeFrom })).toThrow(/drawing changed/);
		const renamed = { ...d, electrodes: d.electrodes.map((e, i) => (i ? e : { ...e, name: 'X' })) };
		expect(() => applyGlassPlan(renamed, { plan, madeFrom })).toThrow(/drawing changed/);
	});

	it('refuses a plan the document schema would not accept, naming the field', () => {
		const d = withTraces();
		const bad = {
			transfers,
			traces: [
				{
					...lead('p1', [
						[0, 0],
						[0, 5]
					]),
					width_mm: -1
				}
			]
		};
		expect(() => applyGlassPlan(d, { plan: bad })).toThrow(/glassArt\.traces\.0\.width_mm/);
	});
});
