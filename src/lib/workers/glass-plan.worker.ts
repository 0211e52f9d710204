/** Routes the glass drawing's transfer points and traces off the main thread. */
import { answerGlassPlan } from './glass-plan-job';
import type { GlassPlanRequest } from './glass-plan-protocol';

self.onmessage = (event: MessageEvent<GlassPlanRequest>) => {
	(self as unknown as Worker).postMessage(answerGlassPlan(event.data));
};
