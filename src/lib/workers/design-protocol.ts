/** Messages between the page and the design-check worker (wiring, drive, rules, load, legibility). */
import type { Design } from '$lib/core/design/schema';
import type { CellReport } from '$lib/core/cell/analyze-cell';
import type { DesignReport } from '$lib/core/analyze-design';

export interface DesignCheckInputs {
	cell: CellReport | null;
	cellError: string | null;
	cellTimeLimit_s: number | null;
}

export interface DesignRequest {
	id: number;
	design: Design;
	inputs: DesignCheckInputs;
}

export type DesignResponse =
	| { id: number; kind: 'result'; report: DesignReport; elapsed_ms: number }
	| { id: number; kind: 'error'; message: string };
