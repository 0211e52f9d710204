/** Messages between the page and the cell worker. */
import type { Design } from '$lib/core/design/schema';
import type { CellReport } from '$lib/core/cell/analyze-cell';

export interface CellRequest {
	id: number;
	design: Design;
}

export type CellResponse =
	| { id: number; kind: 'progress'; done: number; total: number }
	| { id: number; kind: 'result'; report: CellReport; elapsed_ms: number }
	| { id: number; kind: 'error'; message: string };
