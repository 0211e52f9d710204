/**
 * Placement rules against the glass: an electrode (partly) off the glass cannot be made; one
 * closer to the glass edge than `edgeMargin_mm` leaves no room for the seal and the cut (common
 * practice: ≥ 1.3 mm possible, 1.5–2.0 mm recommended); one (partly) outside the viewing area is
 * hidden behind the bezel. A filled region lies inside an axis-aligned rectangle exactly when its
 * tight bounds do, so these rules compare bounds (curve extrema included) and cost O(1) each.
 */
import type { Rect } from '../design/schema';
import type { Bounds } from '../geometry/bounds';
import { finding, type Finding } from '../findings/finding';
import { locationOf, mm, type RuleContext } from './rule-context';

const rectBounds = (r: Rect): Bounds => ({
	minX: r.x_mm,
	minY: r.y_mm,
	maxX: r.x_mm + r.width_mm,
	maxY: r.y_mm + r.height_mm
});

/** How far `b` reaches beyond `outer` on its worst side (≤ 0 when inside). */
const overreach_mm = (b: Bounds, outer: Bounds): number =>
	Math.max(outer.minX - b.minX, outer.minY - b.minY, b.maxX - outer.maxX, b.maxY - outer.maxY);

export function placementFindings(ctx: RuleContext): Finding[] {
	const findings: Finding[] = [];
	const { glass } = ctx.design;
	const glassBox: Bounds = { minX: 0, minY: 0, maxX: glass.width_mm, maxY: glass.height_mm };
	const margin_mm = ctx.limits.edgeMargin_mm;
	const inset: Bounds = {
		minX: margin_mm,
		minY: margin_mm,
		maxX: glass.width_mm - margin_mm,
		maxY: glass.height_mm - margin_mm
	};
	const viewing = rectBounds(glass.viewingArea);
	for (const e of ctx.index.entries) {
		const where = locationOf(e.bounds, 0.5);
		const off_mm = overreach_mm(e.bounds, glassBox);
		if (off_mm > 0) {
			findings.push(
				finding({
					code: 'rule.outside-glass',
					severity: 'fail',
					message: `${e.id} reaches ${mm(off_mm)} beyond the ${glass.width_mm} × ${glass.height_mm} mm glass.`,
					fix: 'Move it onto the glass, or enlarge the glass.',
					electrodes: [e.id],
					location: where
				})
			);
			continue;
		}
		const into_mm = overreach_mm(e.bounds, inset);
		if (into_mm > 0) {
			findings.push(
				finding({
					code: 'rule.edge-margin',
					severity: 'fail',
					message: `${e.id} is ${mm(margin_mm - into_mm)} from the glass edge, under the ${mm(margin_mm)} margin.`,
					fix: `Keep it at least ${mm(margin_mm)} from every glass edge.`,
					electrodes: [e.id],
					location: where
				})
			);
		}
		const hidden_mm = overreach_mm(e.bounds, viewing);
		if (hidden_mm > 0) {
			findings.push(
				finding({
					code: 'rule.outside-viewing-area',
					severity: 'warn',
					message: `${e.id} reaches ${mm(hidden_mm)} outside the viewing area, behind the bezel.`,
					fix: 'Move it into the viewing area, or enlarge the viewing area.',
					electrodes: [e.id],
					location: where
				})
			);
		}
	}
	return findings;
}
