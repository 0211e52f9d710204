/**
 * Keeps the design report (wiring, drive, rules, load, legibility findings) in step with the
 * design, computed in a worker so a large drawing never stalls editing. Until the worker is
 * started (and on the server) a request is answered on the spot. The checks take a bounded time
 * (well under a second), so a request made while the worker is busy waits for it and only the
 * latest waiting design is sent next; a worker still busy after STUCK_MS is replaced. Should the worker itself fail to run, the report is computed here instead,
 * so the checks are never lost; should the checks themselves throw, `failure` says so and the
 * last report stays (an internal error is never shown as a verdict).
 *
 * The glass check runs once per design, inside the same job, and its full result (findings,
 * artwork, ghosts) is kept beside the report tagged with the design it belongs to: the glass panel
 * and the canvas ask `glassFor(design)` and get nothing for a design the check has not seen yet,
 * so a stale ghost is never drawn over a newer drawing.
 */
import { getContext, setContext } from 'svelte';
import type { DesignReport } from '$lib/core/analyze-design';
import type { Design } from '$lib/core/design/schema';
import type { GlassReport } from '$lib/core/glass/check-glass';
import type {
	DesignCheckInputs,
	DesignRequest,
	DesignResponse
} from '$lib/workers/design-protocol';
import { designCheckJob } from '$lib/workers/design-check-job';
import { createDesignWorker } from '$lib/workers/create-design-worker';

const DEBOUNCE_MS = 40;
const STUCK_MS = 15_000;

/** The parts of a Worker this class uses, so tests can drive it without a browser. */
export type DesignWorkerLike = Pick<Worker, 'postMessage' | 'terminate'> & {
	onmessage: ((event: MessageEvent<DesignResponse>) => void) | null;
	onerror: ((event: ErrorEvent) => void) | null;
};

/** A glass check and the design (by identity: designs are never mutated) and request it ran for. */
export interface GlassView {
	revision: number;
	design: Design;
	report: GlassReport;
}

export class DesignAnalysis {
	report = $state.raw<DesignReport>() as DesignReport;
	/** The latest glass check; it may belong to an older design than the open one. */
	glass = $state.raw<GlassView | null>(null);
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
	/** The designs as given (the requests carry snapshots), by request id. */
	// eslint-disable-next-line svelte/prefer-svelte-reactivity -- bookkeeping, never rendered
	#origins = new Map<number, Design>();
	#timer: ReturnType<typeof setTimeout> | undefined;
	#stuckTimer: ReturnType<typeof setTimeout> | undefined;

	constructor(
		design: Design,
		inputs: DesignCheckInputs,
		options: { createWorker?: () => DesignWorkerLike } = {}
	) {
		this.#accept(0, design, designCheckJob({ id: 0, design, inputs }));
		this.#create =
			options.createWorker ?? (() => createDesignWorker() as unknown as DesignWorkerLike);
	}

	/** The glass check of exactly this design, or null until it has been checked. */
	glassFor(design: Design): GlassReport | null {
		const view = this.glass;
		return view && view.design === design ? view.report : null;
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
		if (this.#pending) this.#origins.delete(this.#pending.id);
		this.#origins.set(request.id, design);
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
			this.#accept(request.id, this.#origin(request), designCheckJob(request));
			this.failure = null;
		} catch (error) {
			this.failure = error instanceof Error ? error.message : String(error);
		}
		this.#origins.delete(request.id);
	}

	#origin(request: DesignRequest): Design {
		return this.#origins.get(request.id) ?? request.design;
	}

	#accept(revision: number, design: Design, result: { report: DesignReport; glass: GlassReport }) {
		this.report = result.report;
		this.glass = { revision, design, report: result.glass };
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
		const design = this.#origins.get(message.id);
		this.#origins.delete(message.id);
		// An answer for a design edited since is dropped; the newest waiting one goes next.
		if (message.id !== this.#latest || !design) return void this.#pump();
		this.#pending = null;
		this.busy = false;
		if (message.kind === 'result') {
			this.#accept(message.id, design, message);
			this.failure = null;
		} else {
			this.failure = message.message;
		}
	}
}

const KEY = Symbol('design-analysis');
export const setDesignAnalysis = (analysis: DesignAnalysis) => setContext(KEY, analysis);
/** The page's design checks; undefined outside the app page (e.g. a component test). */
export const getDesignAnalysis = () => getContext<DesignAnalysis | undefined>(KEY);
