/**
 * Keeps the cell report in step with the design: when a section the optics depend on changes,
 * the design goes to the worker (debounced); the newest answer wins and older ones are ignored.
 */
import type { Design } from '$lib/core/design/schema';
import type { CellReport } from '$lib/core/cell/analyze-cell';
import type { CellRequest, CellResponse } from '$lib/workers/cell-protocol';
import { createCellWorker } from '$lib/workers/create-cell-worker';

const DEBOUNCE_MS = 120;

function opticalKey(design: Design): string {
	const { cell, lighting, drive } = design;
	return JSON.stringify([cell, lighting, drive]);
}

export class CellAnalysis {
	report = $state.raw<CellReport | null>(null);
	error = $state<string | null>(null);
	busy = $state(false);
	progress = $state(0);
	elapsed_ms = $state(0);

	#worker: Worker | null = null;
	#latest = 0;
	#key = '';
	#timer: ReturnType<typeof setTimeout> | undefined;

	/** Call from the browser only; returns a cleanup. */
	start(): () => void {
		this.#worker = createCellWorker();
		this.#worker.onmessage = (event: MessageEvent<CellResponse>) => this.#receive(event.data);
		this.#worker.onerror = (event) => {
			this.busy = false;
			this.error = `the optics worker stopped: ${event.message}`;
		};
		return () => {
			clearTimeout(this.#timer);
			this.#worker?.terminate();
			this.#worker = null;
		};
	}

	update(design: Design) {
		const key = opticalKey(design);
		if (key === this.#key) return;
		this.#key = key;
		clearTimeout(this.#timer);
		this.busy = true;
		this.progress = 0;
		this.#timer = setTimeout(() => {
			const message: CellRequest = {
				id: ++this.#latest,
				design: $state.snapshot(design) as Design
			};
			this.#worker?.postMessage(message);
		}, DEBOUNCE_MS);
	}

	#receive(message: CellResponse) {
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
		} else {
			this.report = null;
			this.error = message.message;
		}
	}
}
