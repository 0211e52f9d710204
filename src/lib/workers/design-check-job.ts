/**
 * The work of the design-check worker, testable in Node: the glass check runs once and serves
 * both the design report (its findings, once the design has a glass drawing) and the glass panel
 * and canvas (findings, artwork, ghosts), so the page never repeats it.
 */
import { analyzeDesign } from '$lib/core/analyze-design';
import { checkGlass } from '$lib/core/glass/check-glass';
import { glassSummary } from '$lib/core/glass/glass-in-check';
import type { DesignRequest, DesignResult } from './design-protocol';

export function designCheckJob(request: DesignRequest): DesignResult {
	const { design, inputs } = request;
	const glass = checkGlass(design);
	const report = analyzeDesign(design, { ...inputs, glass: glassSummary(design, glass) });
	return { report, glass };
}
