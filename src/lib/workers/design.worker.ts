/** Runs the design checks (wiring, drive, rules, load, legibility, glass) off the main thread. */
import { designCheckJob } from './design-check-job';
import type { DesignRequest, DesignResponse } from './design-protocol';

const post = (message: DesignResponse) => (self as unknown as Worker).postMessage(message);

self.onmessage = (event: MessageEvent<DesignRequest>) => {
	const { id } = event.data;
	const start = performance.now();
	try {
		const result = designCheckJob(event.data);
		post({ id, kind: 'result', ...result, elapsed_ms: performance.now() - start });
	} catch (error) {
		post({ id, kind: 'error', message: error instanceof Error ? error.message : String(error) });
	}
};
