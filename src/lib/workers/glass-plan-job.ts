/** The glass-plan worker's work for one request, apart from the worker so tests can run it. */
import { planGlass } from '$lib/core/glass/plan-glass';
import type { GlassPlanRequest, GlassPlanResponse } from './glass-plan-protocol';

/** Plans transfer points and traces for one request; never throws. */
export function answerGlassPlan(request: GlassPlanRequest): GlassPlanResponse {
	const start = performance.now();
	try {
		const { glassArt, findings } = planGlass(request.design);
		return {
			id: request.id,
			kind: 'result',
			plan: { transfers: glassArt.transfers, traces: glassArt.traces },
			findings,
			elapsed_ms: performance.now() - start
		};
	} catch (error) {
		return {
			id: request.id,
			kind: 'error',
			message: error instanceof Error ? error.message : String(error)
		};
	}
}
