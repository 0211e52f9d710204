/** Messages between the page and the glass-plan worker. */
import type { GlassArt } from '$lib/core/design/glass-art-schema';
import type { Design } from '$lib/core/design/schema';
import type { Finding } from '$lib/core/findings/finding';

export interface GlassPlanRequest {
	id: number;
	design: Design;
}

export type GlassPlanResponse =
	| {
			id: number;
			kind: 'result';
			plan: Pick<GlassArt, 'transfers' | 'traces'>;
			findings: Finding[];
			elapsed_ms: number;
	  }
	| { id: number; kind: 'error'; message: string };
