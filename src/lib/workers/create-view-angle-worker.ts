/** Starts the viewing-angle worker (browser only); Vite bundles the worker from this reference. */
export function createViewAngleWorker(): Worker {
	return new Worker(new URL('./view-angle.worker.ts', import.meta.url), { type: 'module' });
}
