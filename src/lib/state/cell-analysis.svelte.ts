/**
 * Keeps the cell report in step with the design: when a section the optics depend on changes,
 * the design goes to the worker (debounced). A request made while the worker is still busy with an
 * older one terminates that worker and starts a fresh one, so a hostile design can never hold the
 * optics for the life of the tab; a request that runs past the time limit is stopped the same way
 * and reported as a finding. `current` is true only while the report belongs to the open design.
 */
import type { Design } from '$lib/core/design/schema';
import type { CellReport } from '$lib/core/cell/analyze-cell';
import { OPTICS_TIME_LIMIT_s } from '$lib/core/cell/optics-timeout';
import type { CellRequest, CellResponse } from '$lib/workers/cell-protocol';
import { createCellWorker } from '$lib/workers/create-cell-worker';

const DEBOUNCE_MS = 120;

function opticalKey(design: Design): string {
	const { cell, lighting, drive, orientation } = design;
	// the worker also sees the cell from each scenario's viewing angle
	const angles = design.legibility.scenarios.map((s) => s.viewAngle_deg);
	return JSON.stringify([cell, lighting, drive, orientation, angles]);
}

/** The parts of a Worker this class uses, so tests can drive it without a browser. */
export type WorkerLike = Pick<Worker, 'postMessage' | 'terminate'> & {
	onmessage: ((event: MessageEvent<CellResponse>) => void) | null;
	onerror: ((event: ErrorEvent) => void) | null;
};

export class CellAnalysis {
	report = $state.raw<CellReport | null>(null);
	error = $state<string | null>(null);
	/** Set (in seconds) when the last request was stopped at the time limit. */
	timedOut_s = $state<number | null>(null);
	busy = $state(false);
	progress = $state(0);
	elapsed_ms = $state(0);
	/** How many times a running worker was stopped (newer request or time limit). */
	restarts = $state(0);

	#create: () => WorkerLike;
	#timeLimit_ms: number;
	#worker: WorkerLike | null = null;
	#latest = 0;
	/** Id of the request the worker is computing, or 0 when idle. */
	#running = 0;
	#key = '';
	#timer: ReturnType<typeof setTimeout> | undefined;
	#limitTimer: ReturnType<typeof setTimeout> | undefined;

	constructor(options: { createWorker?: () => WorkerLike; timeLimit_s?: number } = {}) {
		this.#create = options.createWorker ?? (() => createCellWorker() as unknown as WorkerLike);
		this.#timeLimit_ms = (options.timeLimit_s ?? OPTICS_TIME_LIMIT_s) * 1000;
	}

	/** Call from the browser only; returns a cleanup. */
	start(): () => void {
		this.#spawn();
		return () => {
			clearTimeout(this.#timer);
			clearTimeout(this.#limitTimer);
			this.#worker?.terminate();
			this.#worker = null;
		};
	}

	/** True when the report on show is for the design last given to `update`. */
	get current(): boolean {
		return !this.busy;
	}

	#spawn() {
		const worker = this.#create();
		worker.onmessage = (event) => this.#receive(event.data);
		worker.onerror = (event) => {
			if (this.#worker !== worker) return;
			this.#finish();
			this.error = `the optics worker stopped: ${event.message}`;
		};
		this.#worker = worker;
	}

	/** Stops a busy worker and starts a fresh one; its half-done work is dropped. */
	#restart() {
		this.#worker?.terminate();
		this.restarts++;
		this.#spawn();
	}

	update(design: Design) {
		const key = opticalKey(design);
		if (key === this.#key) return;
		this.#key = key;
		clearTimeout(this.#timer);
		this.busy = true;
		this.progress = 0;
		// The id is taken now, so an answer for an older design arriving meanwhile is ignored.
		const id = ++this.#latest;
		const snapshot = $state.snapshot(design) as Design;
		this.#timer = setTimeout(() => this.#send(snapshot, id), DEBOUNCE_MS);
	}

	#send(design: Design, id: number) {
		if (!this.#worker || id !== this.#latest) return;
		if (this.#running !== 0) this.#restart();
		const message: CellRequest = { id, design };
		this.#running = message.id;
		clearTimeout(this.#limitTimer);
		this.#limitTimer = setTimeout(() => this.#stopAtLimit(message.id), this.#timeLimit_ms);
		this.#worker.postMessage(message);
	}

	#stopAtLimit(id: number) {
		if (this.#running !== id) return;
		this.#restart();
		this.#finish();
		this.report = null;
		this.error = null;
		this.timedOut_s = this.#timeLimit_ms / 1000;
	}

	#finish() {
		this.#running = 0;
		this.busy = false;
		clearTimeout(this.#limitTimer);
	}

	#receive(message: CellResponse) {
		if (message.id !== this.#latest) return;
		if (message.kind === 'progress') {
			this.progress = message.done / message.total;
			return;
		}
		this.#finish();
		this.timedOut_s = null;
		if (message.kind === 'result') {
			this.report = message.report;
			this.error = null;
			this.elapsed_ms = message.elapsed_ms;
		} else {
			this.report = null;
			this.error = message.message;
		}
	}
}
