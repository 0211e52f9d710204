/**
 * The optics worker can never hold the app: a newer request stops a busy worker and starts a
 * fresh one, a request past the time limit is stopped and becomes a finding, and the state says
 * "not current" from the moment the design changes until that design's answer arrives.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { CellAnalysis, type WorkerLike } from '../../src/lib/state/cell-analysis.svelte';
import { demoDesign } from '../../src/lib/core/design/demo';
import { analyzeDesign } from '../../src/lib/core/analyze-design';
import type { CellRequest, CellResponse } from '../../src/lib/workers/cell-protocol';
import type { CellReport } from '../../src/lib/core/cell/analyze-cell';

/** A worker that never answers on its own (as one stuck on a hostile design). */
class StuckWorker implements WorkerLike {
	onmessage: ((event: MessageEvent<CellResponse>) => void) | null = null;
	onerror: ((event: ErrorEvent) => void) | null = null;
	received: CellRequest[] = [];
	terminated = false;
	postMessage(message: CellRequest) {
		this.received.push(message);
	}
	terminate() {
		this.terminated = true;
	}
	answer(response: CellResponse) {
		this.onmessage?.({ data: response } as MessageEvent<CellResponse>);
	}
}

const fakeReport = { findings: [], thresholds: [] } as unknown as CellReport;

describe('optics worker supervision', () => {
	let workers: StuckWorker[];
	let analysis: CellAnalysis;
	const demo = demoDesign();
	const withGap = (gap_um: number) => ({ ...demo, cell: { ...demo.cell, gap_um } });

	beforeEach(() => {
		vi.useFakeTimers();
		workers = [];
		analysis = new CellAnalysis({
			createWorker: () => {
				const w = new StuckWorker();
				workers.push(w);
				return w;
			},
			timeLimit_s: 30
		});
		analysis.start();
	});
	afterEach(() => vi.useRealTimers());

	it('terminates a busy worker when a newer design is sent, and restarts it', () => {
		analysis.update(withGap(5));
		vi.advanceTimersByTime(200);
		expect(workers[0].received).toHaveLength(1);
		analysis.update(withGap(6));
		vi.advanceTimersByTime(200);
		expect(workers[0].terminated).toBe(true);
		expect(workers).toHaveLength(2);
		expect(workers[1].received[0].design.cell.gap_um).toBe(6);
		expect(analysis.restarts).toBe(1);
	});

	it('ignores an answer for an older design and stays "not current" until the new one', () => {
		analysis.update(withGap(5));
		vi.advanceTimersByTime(200);
		const first = workers[0].received[0].id;
		analysis.update(withGap(6));
		// The old answer arrives during the debounce of the new design: it must not clear "busy".
		workers[0].answer({ id: first, kind: 'result', report: fakeReport, elapsed_ms: 1 });
		expect(analysis.current).toBe(false);
		expect(analysis.report).toBeNull();
		vi.advanceTimersByTime(200);
		const second = workers[1].received[0].id;
		workers[1].answer({ id: second, kind: 'result', report: fakeReport, elapsed_ms: 1 });
		expect(analysis.current).toBe(true);
		expect(analysis.report).toBe(fakeReport);
	});

	it('stops a request at the time limit and reports it as a failing finding', () => {
		analysis.update(withGap(5));
		vi.advanceTimersByTime(200);
		expect(analysis.busy).toBe(true);
		vi.advanceTimersByTime(30_000);
		expect(workers[0].terminated).toBe(true);
		expect(workers).toHaveLength(2);
		expect(analysis.busy).toBe(false);
		expect(analysis.timedOut_s).toBe(30);
		const report = analyzeDesign(demo, { cellTimeLimit_s: analysis.timedOut_s });
		const timeout = report.opticsFindings.find((f) => f.code === 'optics.model-timeout');
		expect(timeout?.severity).toBe('fail');
		expect(report.severity).toBe('fail');
		// The fresh worker takes the next design.
		analysis.update(withGap(6));
		vi.advanceTimersByTime(200);
		expect(workers[1].received).toHaveLength(1);
	});
});
