/**
 * Which nets of a segment plate routed before the common plate no longer stand once the common
 * plate is laid: those with a lead over a common-plate lead of a common it would light a ghost
 * with, where there is fluid. Laying the common plate only raises costs, so a lead that meets no
 * raised cell is still a least-cost path, and only the nets that do are worth routing again. Seen
 * on the segment router's own grid (same domain, pitch and cost field), so this says exactly what
 * a second routing would see.
 */
import type { Trace } from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import { ghostLayers } from './ghost-costs';
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
}): Set<string> {
	const { design, layout, leads, buses, litOf } = options;
	const crossing = new Set<string>();
	if (buses.length === 0 || leads.length === 0) return crossing;
	const width = design.glassArt.traceWidth_mm;
	const grid = new RouteGrid({
		domain: segmentDomain(layout),
		cell_mm: width + design.rules.minGap_mm
	});
	const commons = design.commons.map((c) => c.id);
	const conductors = buses.flatMap((t) =>
		traceRings(t).map((ring) => ({ common: commons.indexOf(t.net), ring }))
	);
	const layers = ghostLayers({
		design,
		layout,
		grid,
		conductors: conductors.filter((c) => c.common >= 0)
	});
	// Per cell the commons a lead there would pay a ghost cost over.
	const over = new Map<number, number[]>();
	layers.forEach((layer, common) => {
		for (const cell of layer.cells) {
			const list = over.get(cell);
			if (list) list.push(common);
			else over.set(cell, [common]);
		}
	});
	for (const lead of leads) {
		if (crossing.has(lead.net)) continue;
		const lit = litOf(lead.net);
		for (const ring of traceRings(lead))
			grid.forCellsNear(ring, 0, (cell) => {
				if (over.get(cell)?.some((c) => lit.includes(c))) crossing.add(lead.net);
			});
	}
	return crossing;
}
