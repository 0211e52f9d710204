/**
 * Keeps the viewing-angle report in step with the design while its tab is open: the design goes
 * to the worker (debounced) when a section the map depends on changes; the newest answer wins.
 */
import type { Design } from '$lib/core/design/schema';
import type { ViewAngleReport } from '$lib/core/viewangle/view-angle-report';
import {
	viewAngleKey,
	type ViewAngleRequest,
	type ViewAngleResponse
} from '$lib/workers/view-angle-protocol';
import { createViewAngleWorker } from '$lib/workers/create-view-angle-worker';

const DEBOUNCE_MS = 150;

export class ViewAngleAnalysis {
	report = $state.raw<ViewAngleReport | null>(null);
	error = $state<string | null>(null);
	busy = $state(false);
	progress = $state(0);
	elapsed_ms = $state(0);
	cached = $state(false);

	#worker: Worker | null = null;
	#latest = 0;
	#key = '';
	#timer: ReturnType<typeof setTimeout> | undefined;

	/** Call from the browser only; returns a cleanup. */
	start(): () => void {
		this.#worker = createViewAngleWorker();
		this.#worker.onmessage = (event: MessageEvent<ViewAngleResponse>) => this.#receive(event.data);
		this.#worker.onerror = (event) => {
			this.busy = false;
			this.error = `the viewing-angle worker stopped: ${event.message}`;
		};
		return () => {
			clearTimeout(this.#timer);
			this.#worker?.terminate();
			this.#worker = null;
		};
	}

	update(design: Design, grid: { polarStep_deg: number; azimuthStep_deg: number }) {
		const snapshot = $state.snapshot(design) as Design;
		const key = viewAngleKey({ design: snapshot, ...grid }) + JSON.stringify(snapshot.electrodes);
		if (key === this.#key) return;
		this.#key = key;
		clearTimeout(this.#timer);
		this.busy = true;
		this.progress = 0;
		this.#timer = setTimeout(() => {
			const message: ViewAngleRequest = { id: ++this.#latest, design: snapshot, ...grid };
			this.#worker?.postMessage(message);
		}, DEBOUNCE_MS);
	}

	#receive(message: ViewAngleResponse) {
		if (message.id !== this.#latest) return;
		if (message.kind === 'progress') {
			this.progress = message.done / message.total;
			return;
		}
		this.busy = false;
		if (message.kind === 'result') {
			this.report = message.report;
			this.error = null;
			this.elapsed_ms = message.elapsed_ms;
			this.cached = message.cached;
		} else {
			this.report = null;
			this.error = message.message;
		}
	}
}
