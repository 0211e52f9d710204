/** Messages between the page and the design-check worker (wiring, drive, rules, load, legibility, glass). */
import type { Design } from '$lib/core/design/schema';
import type { CellReport } from '$lib/core/cell/analyze-cell';
import type { DesignReport } from '$lib/core/analyze-design';
import type { GlassReport } from '$lib/core/glass/check-glass';

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

/** The design report and the full glass check it was built from (artwork, ghosts, findings). */
export interface DesignResult {
	report: DesignReport;
	glass: GlassReport;
}

export type DesignResponse =
	| ({ id: number; kind: 'result'; elapsed_ms: number } & DesignResult)
	| { id: number; kind: 'error'; message: string };
