/**
 * The glass drawing's part of the design check: the glass check's findings on the stored drawing
 * (transfer points and traces as saved, never routed afresh), once the design has one. A design
 * with no traces and no transfer points has no glass drawing yet and is not judged on it: the
 * electrode drawing alone is a valid stage of the work, and the glass panel offers to generate it.
 */
import type { Design } from '../design/schema';
import type { Finding } from '../findings/finding';
import { checkGlass, type GlassReport } from './check-glass';

export interface GlassCheckSummary {
	findings: Finding[];
	traces: number;
	transfers: number;
	ghosts: number;
}

export function hasGlassDrawing(design: Design): boolean {
	return design.glassArt.traces.length > 0 || design.glassArt.transfers.length > 0;
}

export function glassInCheck(design: Design): GlassCheckSummary | null {
	return hasGlassDrawing(design) ? glassSummary(design, checkGlass(design)) : null;
}

/**
 * The design check's part of a glass check already run on this design (the app runs it once per
 * edit and shares it with the glass panel and the canvas); null while the design has no drawing.
 */
export function glassSummary(design: Design, report: GlassReport): GlassCheckSummary | null {
	if (!hasGlassDrawing(design)) return null;
	return {
		findings: report.findings,
		traces: design.glassArt.traces.length,
		transfers: design.glassArt.transfers.length,
		ghosts: report.ghosts.length
	};
}
