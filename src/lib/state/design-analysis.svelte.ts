/**
 * Keeps the design report (wiring, drive, rules, load, legibility findings) in step with the
 * design, computed in a worker so a large drawing never stalls editing. Until the worker is
 * started (and on the server) a request is answered on the spot. The checks take a bounded time
 * (well under a second), so a request made while the worker is busy waits for it and only the
 * latest waiting design is sent next; a worker still busy after STUCK_MS is replaced. Should the worker itself fail to run, the report is computed here instead,
 * so the checks are never lost; should the checks themselves throw, `failure` says so and the
 * last report stays (an internal error is never shown as a verdict).
 */
import { analyzeDesign, type DesignReport } from '$lib/core/analyze-design';
import type { Design } from '$lib/core/design/schema';
import type {
	DesignCheckInputs,
	DesignRequest,
	DesignResponse
} from '$lib/workers/design-protocol';
import { createDesignWorker } from '$lib/workers/create-design-worker';

const DEBOUNCE_MS = 40;
const STUCK_MS = 15_000;

/** The parts of a Worker this class uses, so tests can drive it without a browser. */
export type DesignWorkerLike = Pick<Worker, 'postMessage' | 'terminate'> & {
	onmessage: ((event: MessageEvent<DesignResponse>) => void) | null;
	onerror: ((event: ErrorEvent) => void) | null;
};

export class DesignAnalysis {
	report = $state.raw<DesignReport>() as DesignReport;
	/** True from a change until the report for it arrives. */
	busy = $state(false);
	/** Set when the worker failed and the report was computed on the page instead. */
	workerError = $state<string | null>(null);
	/** Set when the checks could not be computed for the latest design (an internal error). */
	failure = $state<string | null>(null);

	#create: () => DesignWorkerLike;
	#worker: DesignWorkerLike | null = null;
	#latest = 0;
	#running = 0;
	#pending: DesignRequest | null = null;
	#timer: ReturnType<typeof setTimeout> | undefined;
	#stuckTimer: ReturnType<typeof setTimeout> | undefined;

	constructor(
		design: Design,
		inputs: DesignCheckInputs,
		options: { createWorker?: () => DesignWorkerLike } = {}
	) {
		this.report = analyzeDesign(design, inputs);
		this.#create =
			options.createWorker ?? (() => createDesignWorker() as unknown as DesignWorkerLike);
	}

	/** Call from the browser only; returns a cleanup. */
	start(): () => void {
		this.#spawn();
		return () => {
			clearTimeout(this.#timer);
			clearTimeout(this.#stuckTimer);
			this.#worker?.terminate();
			this.#worker = null;
		};
	}

	update(design: Design, inputs: DesignCheckInputs) {
		const request: DesignRequest = {
			id: ++this.#latest,
			design: $state.snapshot(design) as Design,
			inputs: $state.snapshot(inputs) as DesignCheckInputs
		};
		if (!this.#worker) {
			this.#computeHere(request);
			return;
		}
		this.busy = true;
		this.#pending = request;
		clearTimeout(this.#timer);
		this.#timer = setTimeout(() => this.#pump(), DEBOUNCE_MS);
	}

	#spawn() {
		const worker = this.#create();
		worker.onmessage = (event) => this.#receive(event.data);
		worker.onerror = (event) => {
			if (this.#worker !== worker) return;
			this.#fallBack(event.message || 'the design-check worker stopped');
		};
		this.#worker = worker;
	}

	/** Sends the latest waiting design when the worker is free. */
	#pump() {
		const request = this.#pending;
		if (!this.#worker || this.#running !== 0 || !request || request.id !== this.#latest) return;
		this.#running = request.id;
		clearTimeout(this.#stuckTimer);
		this.#stuckTimer = setTimeout(() => this.#unstick(request.id), STUCK_MS);
		this.#worker.postMessage(request);
	}

	#unstick(id: number) {
		if (this.#running !== id) return;
		this.#worker?.terminate();
		this.#spawn();
		this.#running = 0;
		this.#pump();
	}

	#computeHere(request: DesignRequest) {
		try {
			this.report = analyzeDesign(request.design, request.inputs);
			this.failure = null;
		} catch (error) {
			this.failure = error instanceof Error ? error.message : String(error);
		}
	}

	/** The worker cannot run: compute the latest request here and keep going without it. */
	#fallBack(message: string) {
		this.#worker?.terminate();
		this.#worker = null;
		this.#running = 0;
		clearTimeout(this.#stuckTimer);
		this.workerError = message;
		if (this.#pending) this.#computeHere(this.#pending);
		this.#pending = null;
		this.busy = false;
	}

	#receive(message: DesignResponse) {
		if (message.id !== this.#running) return;
		this.#running = 0;
		clearTimeout(this.#stuckTimer);
		// An answer for a design edited since is dropped; the newest waiting one goes next.
		if (message.id !== this.#latest) return void this.#pump();
		this.#pending = null;
		this.busy = false;
		if (message.kind === 'result') {
			this.report = message.report;
			this.failure = null;
		} else {
			this.failure = message.message;
		}
	}
}
