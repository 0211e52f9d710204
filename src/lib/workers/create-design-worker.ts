/** Starts the design-check worker (browser only); Vite bundles the worker from this reference. */
export function createDesignWorker(): Worker {
	return new Worker(new URL('./design.worker.ts', import.meta.url), { type: 'module' });
}
