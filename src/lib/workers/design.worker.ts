/** Runs the design checks (wiring, drive, rules, load, legibility) off the main thread. */
import { analyzeDesign } from '$lib/core/analyze-design';
import type { DesignRequest, DesignResponse } from './design-protocol';

const post = (message: DesignResponse) => (self as unknown as Worker).postMessage(message);

self.onmessage = (event: MessageEvent<DesignRequest>) => {
	const { id, design, inputs } = event.data;
	const start = performance.now();
	try {
		const report = analyzeDesign(design, inputs);
		post({ id, kind: 'result', report, elapsed_ms: performance.now() - start });
	} catch (error) {
		post({ id, kind: 'error', message: error instanceof Error ? error.message : String(error) });
	}
};
