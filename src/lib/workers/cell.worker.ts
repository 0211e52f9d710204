/** Runs the cell's director, optics and colour model off the main thread. */
import { analyzeCell } from '$lib/core/cell/analyze-cell';
import { withScenarioViews } from '$lib/core/legibility/oblique-views';
import type { CellRequest, CellResponse } from './cell-protocol';

const post = (message: CellResponse) => (self as unknown as Worker).postMessage(message);

self.onmessage = (event: MessageEvent<CellRequest>) => {
	const { id, design } = event.data;
	const start = performance.now();
	try {
		const report = withScenarioViews(
			analyzeCell(design, (done, total) => post({ id, kind: 'progress', done, total })),
			design
		);
		post({ id, kind: 'result', report, elapsed_ms: performance.now() - start });
	} catch (error) {
		post({ id, kind: 'error', message: error instanceof Error ? error.message : String(error) });
	}
};
