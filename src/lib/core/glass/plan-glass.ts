/**
 * Plans the glass drawing for the current electrodes: fills in a transfer point for every common
 * that lacks one and routes every lead of both plates. Leads that cannot be routed come back as
 * `glass.no-route` findings naming the net and the electrodes left without a path; a glass too
 * large for the routing grid at its trace pitch is one such finding, with nothing routed.
 */
import type { GlassArt } from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import { finding, type Finding } from '../findings/finding';
import { glassLayout } from './layout';
import { routeGlass } from './route-glass';
import { gridCells, MAX_GRID_CELLS } from './route-grid';
import { segmentDomain } from './route-segment-plate';
import { transferPoints } from './transfer-points';

export interface GlassPlan {
	glassArt: GlassArt;
	findings: Finding[];
}

export function planGlass(design: Design): GlassPlan {
	const layout = glassLayout(design);
	const transfers = transferPoints(design, layout);
	const withTransfers: Design = {
		...design,
		glassArt: { ...design.glassArt, transfers, traces: [] }
	};
	// Both plates' grids must fit: a fine pitch over a large glass asks for more cells than a
	// search can hold, and that is the design's limit to state, not a failure of the router.
	const pitch_mm = design.glassArt.traceWidth_mm + design.rules.minGap_mm;
	const cells = Math.max(
		gridCells(segmentDomain(layout), pitch_mm),
		gridCells(layout.sealOuter, pitch_mm)
	);
	if (cells > MAX_GRID_CELLS)
		return {
			glassArt: withTransfers.glassArt,
			findings: [
				finding({
					code: 'glass.no-route',
					severity: 'fail',
					message: `The glass is too large to route at a ${pitch_mm} mm pitch (trace width plus minimum gap): ${(cells / 1e6).toFixed(1)} million grid cells, above the ${MAX_GRID_CELLS / 1e6} million the router can hold. No lead was routed.`,
					fix: 'Widen the traces or the minimum gap, or draw the leads by hand.'
				})
			]
		};
	const routing = routeGlass(withTransfers);
	const names = new Map(
		[...design.commons, ...design.segmentLines].map((r) => [r.id, r.name || r.id])
	);
	const findings = routing.unrouted.map((u) =>
		finding({
			code: 'glass.no-route',
			severity: 'fail',
			message:
				u.electrodes.length > 0
					? `No ${u.plate}-plate lead of ${names.get(u.net) ?? u.net} reaches ${u.electrodes.length} electrode(s) keeping the ${design.rules.minGap_mm} mm gap.`
					: `No ${u.plate}-plate lead joins ${names.get(u.net) ?? u.net}'s transfer point to its pad.`,
			fix: 'Make room between electrodes, move the transfer point, change the pin order, or draw the trace by hand.',
			electrodes: u.electrodes
		})
	);
	return { glassArt: { ...withTransfers.glassArt, traces: routing.traces }, findings };
}
