/**
 * Generating the glass drawing off the main thread: the worker's answer becomes one undoable
 * edit, a newer request or a cancel stops a busy worker, a failure is reported, and a plan whose
 * drawing changed while it was routed is set aside instead of overwriting the newer edit.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import {
	GlassPlanning,
	tracesKey,
	type GlassWorkerLike
} from '../../src/lib/state/glass-planning.svelte';
import type {
	GlassPlanRequest,
	GlassPlanResponse
} from '../../src/lib/workers/glass-plan-protocol';
import { answerGlassPlan } from '../../src/lib/workers/glass-plan-job';
import type { Patch } from '../../src/lib/core/commands/patch';
import { History } from '../../src/lib/core/commands/history';
import { moveElectrodes } from '../../src/lib/core/commands/move-electrodes';
import type { Design } from '../../src/lib/core/design/schema';
import { testDesign } from '../commands/fixtures';

/** A worker that answers only when told to, with the real worker's work. */
class HeldWorker implements GlassWorkerLike {
	onmessage: ((event: MessageEvent<GlassPlanResponse>) => void) | null = null;
	onerror: ((event: ErrorEvent) => void) | null = null;
	received: GlassPlanRequest[] = [];
	terminated = false;
	postMessage(message: GlassPlanRequest) {
		this.received.push(message);
	}
	terminate() {
		this.terminated = true;
	}
	answer(response: GlassPlanResponse = answerGlassPlan(this.received.at(-1)!)) {
		this.onmessage?.({ data: response } as MessageEvent<GlassPlanResponse>);
	}
}

describe('glass generation in a worker', () => {
	let workers: HeldWorker[];
	let design: Design;
	let steps: string[];
	let planning: GlassPlanning;
	let history: History;
	const edit = (command: (d: Design) => Patch) => {
		history.apply(command(history.design), 'Move');
		design = history.design;
	};

	beforeEach(() => {
		vi.useFakeTimers();
		workers = [];
		steps = [];
		design = testDesign();
		history = new History(design);
		planning = new GlassPlanning({
			createWorker: () => {
				const w = new HeldWorker();
				workers.push(w);
				return w;
			},
			apply: (label, command) => {
				try {
					const patch = command(history.design);
					if (history.apply(patch, label)) steps.push(label);
					design = history.design;
					return { ok: true, patch };
				} catch (error) {
					return { ok: false, message: (error as Error).message };
				}
			}
		});
	});
	afterEach(() => {
		planning.dispose();
		vi.useRealTimers();
	});

	it('applies the routed plan as one undoable step and keeps the routing findings', () => {
		planning.generate(design);
		expect(planning.busy).toBe(true);
		expect(steps).toEqual([]);
		vi.advanceTimersByTime(600);
		expect(planning.running_ms).toBeGreaterThan(0);
		workers[0].answer();
		expect(planning.busy).toBe(false);
		expect(planning.error).toBeNull();
		expect(steps).toEqual(['Generate plates and traces']);
		// e1 is the only wired electrode: a segment-plate lead from it to its pad at least
		expect(design.glassArt.traces.some((t) => t.plate === 'segment' && t.net === 'seg1')).toBe(
			true
		);
		const expected = answerGlassPlan({ id: 0, design: testDesign() });
		if (expected.kind !== 'result') throw new Error('the reference plan failed');
		expect(design.glassArt.traces).toEqual(expected.plan.traces);
		expect(planning.findings).toEqual(expected.findings);
		expect(planning.appliedTraces).toBe(tracesKey(design.glassArt.traces));
		expect(planning.notice).toBeNull();
		// the same drawing routed again gives the same traces: nothing to undo, and said so
		planning.generate(design);
		workers[0].answer();
		expect(steps).toHaveLength(1);
		expect(planning.notice).toMatch(/nothing changed/);
		expect(planning.findings).toEqual(expected.findings);
	});

	it('a newer request stops the busy worker; its late answer is ignored', () => {
		planning.generate(design);
		planning.generate(design);
		expect(workers).toHaveLength(2);
		expect(workers[0].terminated).toBe(true);
		workers[0].answer();
		expect(steps).toEqual([]);
		expect(planning.busy).toBe(true);
		workers[1].answer();
		expect(steps).toHaveLength(1);
	});

	it('sets the plan aside when the drawing changed while it was routed', () => {
		planning.generate(design);
		edit((d) => moveElectrodes(d, { ids: ['e1'], dx_mm: 1, dy_mm: 0 }));
		const moved = design;
		workers[0].answer();
		expect(design).toBe(moved);
		expect(steps).toEqual([]);
		expect(planning.error).toMatch(/drawing changed/);
		expect(planning.busy).toBe(false);
	});

	it('reports a routing failure and a stopped worker in words, applying nothing', () => {
		planning.generate(design);
		workers[0].answer({ id: workers[0].received[0].id, kind: 'error', message: 'out of memory' });
		expect(planning.error).toBe('Routing failed: out of memory');
		planning.generate(design);
		workers[0].onerror?.({ message: 'script error' } as ErrorEvent);
		expect(planning.error).toMatch(/worker stopped: script error/);
		expect(planning.busy).toBe(false);
		expect(steps).toEqual([]);
	});

	it('cancel stops the worker and nothing lands later', () => {
		planning.generate(design);
		planning.cancel();
		expect(planning.busy).toBe(false);
		expect(workers[0].terminated).toBe(true);
		workers[0].answer();
		expect(steps).toEqual([]);
	});
});
