/**
 * Whether a segment plate routed before the common plate still stands once the common plate is
 * laid: it does when none of its leads lies over a common-plate lead of a common it would light a
 * ghost with, where there is fluid. Laying the common plate only raises costs, so where no lead
 * meets a raised cell every lead is still a least-cost path in the same order, and routing the
 * plate again would give an equally good drawing. Seen on the segment router's own grid (same
 * domain, pitch and cost field), so this says exactly what a second routing would see.
 */
import type { Trace } from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import { ghostCosts } from './ghost-costs';
import type { GlassLayout } from './layout';
import { RouteGrid } from './route-grid';
import { segmentDomain } from './route-segment-plate';
import { traceRings } from './trace-rings';

export function leadsCrossBuses(options: {
	design: Design;
	layout: GlassLayout;
	leads: readonly Trace[];
	buses: readonly Trace[];
	/** Indexes of the commons a lead of this net lights a ghost over. */
	litOf: (net: string) => readonly number[];
}): boolean {
	const { design, layout, leads, buses, litOf } = options;
	if (buses.length === 0 || leads.length === 0) return false;
	const width = design.glassArt.traceWidth_mm;
	const grid = new RouteGrid({
		domain: segmentDomain(layout),
		cell_mm: width + design.rules.minGap_mm
	});
	const commons = design.commons.map((c) => c.id);
	const conductors = buses.flatMap((t) =>
		traceRings(t).map((ring) => ({ common: commons.indexOf(t.net), ring }))
	);
	const costs = ghostCosts({
		design,
		layout,
		grid,
		conductors: conductors.filter((c) => c.common >= 0)
	});
	const base = costs([]).cost;
	for (const lead of leads) {
		const lit = costs(litOf(lead.net)).cost;
		if (lit === base) continue;
		let raised = false;
		for (const ring of traceRings(lead))
			grid.forCellsNear(ring, 0, (cell) => {
				if (lit[cell] > base[cell]) raised = true;
			});
		if (raised) return true;
	}
	return false;
}
