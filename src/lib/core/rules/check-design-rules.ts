/**
 * The design-rule check: every geometric and usage rule on a design, as findings with stable
 * `rule.*` codes, the electrodes concerned, a location to zoom to and a fix. Limits come from
 * `design.rules` (millimetres and arcminutes). An electrode whose outline crosses itself or has no
 * area is reported once and left out of the width rule; bad geometry never throws.
 */
import type { Design } from '../design/schema';
import {
	finding,
	overallSeverity,
	sortFindings,
	type Finding,
	type Severity
} from '../findings/finding';
import type { SpatialIndex } from '../geometry/spatial-index';
import { characterFindings } from './rule-characters';
import { ruleContext } from './rule-context';
import { outlineFindings } from './rule-outline';
import { placementFindings } from './rule-placement';
import { spacingFindings } from './rule-spacing';
import { usageFindings } from './rule-usage';

export interface RulesReport {
	findings: Finding[];
	severity: Severity;
	/** Electrodes checked. */
	electrodes: number;
}

export function checkDesignRules(
	design: Design,
	options: { index?: SpatialIndex } = {}
): RulesReport {
	const ctx = ruleContext(design, options);
	const findings = [
		...usageFindings(ctx),
		...outlineFindings(ctx),
		...spacingFindings(ctx),
		...placementFindings(ctx),
		...characterFindings(ctx)
	];
	if (design.electrodes.length > 0 && !findings.some((f) => f.severity !== 'pass')) {
		const r = design.rules;
		findings.unshift(
			finding({
				code: 'rule.ok',
				severity: 'pass',
				message:
					`${design.electrodes.length} electrodes: no overlaps, gaps ≥ ${r.minGap_mm} mm, widths ≥ ${r.minWidth_mm} mm, ` +
					`all on the glass, ≥ ${r.edgeMargin_mm} mm from its edge and inside the viewing area.`
			})
		);
	}
	const sorted = sortFindings(findings);
	return {
		findings: sorted,
		severity: overallSeverity(sorted),
		electrodes: design.electrodes.length
	};
}
