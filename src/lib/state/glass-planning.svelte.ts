/**
 * Generates the glass drawing's transfer points and traces in a worker, so the page stays
 * responsive while the router works (seconds on a full display). One request at a time: asking
 * again, or cancelling, terminates a busy worker and starts a fresh one (the routing cannot be
 * interrupted from outside). The plan comes back with the drawing it was made from and is applied
 * through `apply` as one undoable core command, which sets it aside when the drawing has changed
 * meanwhile. `busy` is true from the request until its answer has been applied or refused.
 */
import type { Design } from '$lib/core/design/schema';
import type { Trace } from '$lib/core/design/glass-art-schema';
import type { Finding } from '$lib/core/findings/finding';
import { applyGlassPlan, glassPlanInputs } from '$lib/core/commands/apply-glass-plan';
import type { Patch } from '$lib/core/commands/patch';
import { isNoopPatch } from '$lib/core/commands/patch-algebra';
import type { GlassPlanRequest, GlassPlanResponse } from '$lib/workers/glass-plan-protocol';
import { createGlassPlanWorker } from '$lib/workers/create-glass-plan-worker';
import type { EditOutcome } from './edit-session.svelte';

/** The parts of a Worker this class uses, so tests can drive it without a browser. */
export type GlassWorkerLike = Pick<Worker, 'postMessage' | 'terminate'> & {
	onmessage: ((event: MessageEvent<GlassPlanResponse>) => void) | null;
	onerror: ((event: ErrorEvent) => void) | null;
};

export type ApplyEdit = (label: string, command: (design: Design) => Patch) => EditOutcome;

export const GENERATE_LABEL = 'Generate plates and traces';

/** The course of every trace, as one comparable string. */
export const tracesKey = (traces: readonly Trace[]): string =>
	JSON.stringify(
		traces.map((t) => [t.id, t.plate, t.net, t.width_mm, t.points.map((p) => [p.x, p.y])])
	);

export class GlassPlanning {
	busy = $state(false);
	/** Why the last request gave nothing: the worker failed, or the drawing changed meanwhile. */
	error = $state<string | null>(null);
	/** The routing's own findings (leads that found no path) for the plan last applied. */
	findings = $state.raw<Finding[]>([]);
	/** The traces that plan put into the design (`tracesKey`): its findings hold while they stay. */
	appliedTraces = $state<string | null>(null);
	/** A word on the last plan applied, e.g. that it changed nothing. */
	notice = $state<string | null>(null);
	elapsed_ms = $state(0);
	/** Time since the running request started, refreshed while busy. */
	running_ms = $state(0);

	#create: () => GlassWorkerLike;
	#apply: ApplyEdit;
	#worker: GlassWorkerLike | null = null;
	#latest = 0;
	#madeFrom = '';
	#started_ms = 0;
	#ticker: ReturnType<typeof setInterval> | undefined;

	constructor(options: { apply: ApplyEdit; createWorker?: () => GlassWorkerLike }) {
		this.#apply = options.apply;
		this.#create =
			options.createWorker ?? (() => createGlassPlanWorker() as unknown as GlassWorkerLike);
	}

	#spawn(): GlassWorkerLike {
		const worker = this.#create();
		worker.onmessage = (event) => this.#receive(event.data);
		worker.onerror = (event) => {
			if (this.#worker !== worker) return;
			this.#stop();
			this.#worker?.terminate();
			this.#worker = null;
			this.error = `the routing worker stopped: ${event.message}`;
		};
		this.#worker = worker;
		return worker;
	}

	/** Plans `design`; a request still running is abandoned. */
	generate(design: Design): void {
		if (this.busy) this.#drop();
		const snapshot = $state.snapshot(design) as Design;
		this.#madeFrom = glassPlanInputs(snapshot);
		const message: GlassPlanRequest = { id: ++this.#latest, design: snapshot };
		this.error = null;
		this.notice = null;
		this.busy = true;
		this.#started_ms = performance.now();
		this.running_ms = 0;
		clearInterval(this.#ticker);
		this.#ticker = setInterval(() => {
			this.running_ms = performance.now() - this.#started_ms;
		}, 250);
		(this.#worker ?? this.#spawn()).postMessage(message);
	}

	/** Abandons the running request; nothing is applied. */
	cancel(): void {
		if (!this.busy) return;
		this.#drop();
		this.#stop();
	}

	dispose(): void {
		this.#stop();
		this.#worker?.terminate();
		this.#worker = null;
	}

	/** Terminates the busy worker; the next request starts a fresh one. */
	#drop() {
		this.#latest++;
		this.#worker?.terminate();
		this.#worker = null;
	}

	#stop() {
		this.busy = false;
		clearInterval(this.#ticker);
	}

	#receive(message: GlassPlanResponse) {
		if (message.id !== this.#latest) return;
		this.#stop();
		if (message.kind === 'error') {
			this.error = `Routing failed: ${message.message}`;
			return;
		}
		this.elapsed_ms = message.elapsed_ms;
		const madeFrom = this.#madeFrom;
		const outcome = this.#apply(GENERATE_LABEL, (design) =>
			applyGlassPlan(design, { plan: message.plan, madeFrom })
		);
		if (outcome.ok) {
			this.findings = message.findings;
			this.appliedTraces = tracesKey(message.plan.traces);
			if (isNoopPatch(outcome.patch))
				this.notice = 'The routed plates and traces match the drawing already: nothing changed.';
		} else this.error = `Nothing applied: ${outcome.message}. Generate again.`;
	}
}
