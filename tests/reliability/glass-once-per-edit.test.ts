/**
 * The glass check runs once per edit, in the design-check worker: the page's state never runs it
 * (nor the ghost check inside it) while the worker answers, keeps the worker's result tagged with
 * the design it belongs to, and hands nothing out for a design the check has not seen yet. Only
 * when the worker cannot run does the page compute it itself, once per edit.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { DesignAnalysis, type DesignWorkerLike } from '../../src/lib/state/design-analysis.svelte';
import { designCheckJob } from '../../src/lib/workers/design-check-job';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';
import type { DesignRequest, DesignResponse } from '../../src/lib/workers/design-protocol';

/** Calls made outside the stand-in worker, i.e. on the page. */
const onPage = vi.hoisted(() => ({ inWorker: false, checkGlass: 0, ghostCheck: 0 }));

vi.mock('../../src/lib/core/glass/check-glass', async (importOriginal) => {
	const real = await importOriginal<typeof import('../../src/lib/core/glass/check-glass')>();
	return {
		...real,
		checkGlass: (design: Design) => {
			if (!onPage.inWorker) onPage.checkGlass++;
			return real.checkGlass(design);
		}
	};
});
vi.mock('../../src/lib/core/glass/ghost-check', async (importOriginal) => {
	const real = await importOriginal<typeof import('../../src/lib/core/glass/ghost-check')>();
	return {
		...real,
		ghostCheck: (...args: Parameters<typeof real.ghostCheck>) => {
			if (!onPage.inWorker) onPage.ghostCheck++;
			return real.ghostCheck(...args);
		}
	};
});

class StandInWorker implements DesignWorkerLike {
	onmessage: ((event: MessageEvent<DesignResponse>) => void) | null = null;
	onerror: ((event: ErrorEvent) => void) | null = null;
	received: DesignRequest[] = [];
	postMessage(message: DesignRequest) {
		this.received.push(message);
	}
	terminate() {}
	/** Answers the latest request as the real worker would, its work counted as the worker's. */
	answerLatest() {
		const request = this.received[this.received.length - 1];
		onPage.inWorker = true;
		const result = designCheckJob(request);
		onPage.inWorker = false;
		this.onmessage?.({
			data: { id: request.id, kind: 'result', ...result, elapsed_ms: 1 }
		} as MessageEvent<DesignResponse>);
	}
}

const NO_CELL = { cell: null, cellError: null, cellTimeLimit_s: null };

/** The demo with its first electrode moved by dx (a new design object, as every edit makes). */
function moved(base: Design, dx_mm: number): Design {
	const [first, ...rest] = base.electrodes;
	const outline = first.outline.map((node) => ({ ...node, x: node.x + dx_mm }));
	return { ...base, electrodes: [{ ...first, outline }, ...rest] };
}

describe('glass check once per edit, off the page', () => {
	const demo = demoDesign();
	let worker: StandInWorker;
	let analysis: DesignAnalysis;

	beforeEach(() => {
		vi.useFakeTimers();
		analysis = new DesignAnalysis(demo, NO_CELL, {
			createWorker: () => (worker = new StandInWorker())
		});
		onPage.checkGlass = 0;
		onPage.ghostCheck = 0;
	});
	afterEach(() => vi.useRealTimers());

	it('runs no glass or ghost check on the page while the worker answers', () => {
		analysis.start();
		let design = demo;
		for (let edit = 1; edit <= 5; edit++) {
			design = moved(design, 0.01);
			analysis.update(design, NO_CELL);
			vi.advanceTimersByTime(100);
			worker.answerLatest();
			expect(analysis.glassFor(design)).not.toBeNull();
		}
		expect(worker.received).toHaveLength(5);
		expect(onPage).toMatchObject({ checkGlass: 0, ghostCheck: 0 });
	});

	it('hands out a glass check only for the design it was run on', () => {
		analysis.start();
		const first = moved(demo, 0.2);
		analysis.update(first, NO_CELL);
		vi.advanceTimersByTime(100);
		worker.answerLatest();
		const checked = analysis.glassFor(first);
		expect(checked?.artwork.segment.length).toBeGreaterThan(0);
		// The next edit is on its way: its drawing has no check yet, the old one keeps its own.
		const second = moved(first, 0.2);
		analysis.update(second, NO_CELL);
		expect(analysis.glassFor(second)).toBeNull();
		expect(analysis.glassFor(first)).toBe(checked);
		// An equal copy is not the same revision.
		expect(analysis.glassFor({ ...first })).toBeNull();
		vi.advanceTimersByTime(100);
		worker.answerLatest();
		expect(analysis.glassFor(second)).not.toBeNull();
		expect(analysis.glassFor(first)).toBeNull();
		expect(analysis.glass?.revision).toBe(worker.received[1].id);
	});

	it('computes the glass check on the page, once per edit, only when the worker cannot run', () => {
		analysis.start();
		worker.onerror?.({ message: 'failed to load' } as ErrorEvent);
		const design = moved(demo, 0.3);
		analysis.update(design, NO_CELL);
		expect(onPage.checkGlass).toBe(1);
		expect(analysis.glassFor(design)).not.toBeNull();
	});
});
