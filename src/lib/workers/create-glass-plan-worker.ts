/** Starts the glass-plan worker (browser only); Vite bundles the worker from this reference. */
export function createGlassPlanWorker(): Worker {
	return new Worker(new URL('./glass-plan.worker.ts', import.meta.url), { type: 'module' });
}
