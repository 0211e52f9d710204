/**
 * The design checks run in a worker: the report follows the latest design only, a newer design
 * stops a busy worker, a worker that cannot run hands the work back to the page, and checks that
 * throw are reported as a failure rather than as a verdict.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { DesignAnalysis, type DesignWorkerLike } from '../../src/lib/state/design-analysis.svelte';
import { designCheckJob } from '../../src/lib/workers/design-check-job';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { DesignRequest, DesignResponse } from '../../src/lib/workers/design-protocol';

class HeldWorker implements DesignWorkerLike {
	onmessage: ((event: MessageEvent<DesignResponse>) => void) | null = null;
	onerror: ((event: ErrorEvent) => void) | null = null;
	received: DesignRequest[] = [];
	terminated = false;
	postMessage(message: DesignRequest) {
		this.received.push(message);
	}
	terminate() {
		this.terminated = true;
	}
	/** Answers a request as the real worker would. */
	answer(request: DesignRequest) {
		const result = designCheckJob(request);
		this.onmessage?.({
			data: { id: request.id, kind: 'result', ...result, elapsed_ms: 1 }
		} as MessageEvent<DesignResponse>);
	}
}

const NO_CELL = { cell: null, cellError: null, cellTimeLimit_s: null };

describe('design checks in a worker', () => {
	const demo = demoDesign();
	const named = (name: string) => ({ ...demo, name });
	let workers: HeldWorker[];
	let analysis: DesignAnalysis;

	beforeEach(() => {
		vi.useFakeTimers();
		workers = [];
		analysis = new DesignAnalysis(demo, NO_CELL, {
			createWorker: () => {
				const w = new HeldWorker();
				workers.push(w);
				return w;
			}
		});
	});
	afterEach(() => vi.useRealTimers());

	it('answers on the spot before the worker starts, and has a report from the start', () => {
		expect(analysis.report.design.name).toBe(demo.name);
		analysis.update(named('Before start'), NO_CELL);
		expect(analysis.report.design.name).toBe('Before start');
		expect(analysis.busy).toBe(false);
	});

	it('shows only the latest design: edits made while the worker is busy wait, and only the last is sent', () => {
		analysis.start();
		analysis.update(named('First'), NO_CELL);
		vi.advanceTimersByTime(100);
		expect(workers[0].received).toHaveLength(1);
		expect(analysis.busy).toBe(true);
		analysis.update(named('Second'), NO_CELL);
		vi.advanceTimersByTime(100);
		analysis.update(named('Third'), NO_CELL);
		vi.advanceTimersByTime(100);
		// Nothing more is sent while the worker is busy.
		expect(workers[0].received).toHaveLength(1);
		// The answer for the first design is dropped and the newest waiting design goes next.
		workers[0].answer(workers[0].received[0]);
		expect(analysis.report.design.name).toBe(demo.name);
		expect(workers[0].received.map((r) => r.design.name)).toEqual(['First', 'Third']);
		expect(analysis.busy).toBe(true);
		workers[0].answer(workers[0].received[1]);
		expect(analysis.busy).toBe(false);
		expect(analysis.report.design.name).toBe('Third');
		expect(workers).toHaveLength(1);
	});

	it('replaces a worker that stays busy far too long', () => {
		analysis.start();
		analysis.update(named('Stuck'), NO_CELL);
		vi.advanceTimersByTime(100);
		vi.advanceTimersByTime(20_000);
		expect(workers[0].terminated).toBe(true);
		expect(workers).toHaveLength(2);
		expect(workers[1].received.map((r) => r.design.name)).toEqual(['Stuck']);
		workers[1].answer(workers[1].received[0]);
		expect(analysis.report.design.name).toBe('Stuck');
	});

	it('computes on the page when the worker cannot run', () => {
		analysis.start();
		analysis.update(named('No worker'), NO_CELL);
		vi.advanceTimersByTime(100);
		workers[0].onerror?.({ message: 'failed to load' } as ErrorEvent);
		expect(analysis.busy).toBe(false);
		expect(analysis.workerError).toBe('failed to load');
		expect(analysis.report.design.name).toBe('No worker');
		// Later edits are answered on the page.
		analysis.update(named('Still checked'), NO_CELL);
		expect(analysis.report.design.name).toBe('Still checked');
	});

	it('reports checks that throw as a failure, keeping the last report', () => {
		analysis.start();
		analysis.update(named('Breaks'), NO_CELL);
		vi.advanceTimersByTime(100);
		const request = workers[0].received[0];
		workers[0].onmessage?.({
			data: { id: request.id, kind: 'error', message: 'boom' }
		} as MessageEvent<DesignResponse>);
		expect(analysis.failure).toBe('boom');
		expect(analysis.busy).toBe(false);
		expect(analysis.report.design.name).toBe(demo.name);
	});
});
