/** Starts the cell worker (browser only); Vite bundles the worker from this reference. */
export function createCellWorker(): Worker {
	return new Worker(new URL('./cell.worker.ts', import.meta.url), { type: 'module' });
}
