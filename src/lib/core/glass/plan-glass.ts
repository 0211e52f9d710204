/**
 * Plans the glass drawing for the current electrodes: fills in a transfer point for every common
 * that lacks one and routes every lead of both plates. Leads that cannot be routed come back as
 * `glass.no-route` findings naming the net and the electrodes left without a path.
 */
import type { GlassArt } from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import { finding, type Finding } from '../findings/finding';
import { glassLayout } from './layout';
import { routeGlass } from './route-glass';
import { transferPoints } from './transfer-points';

export interface GlassPlan {
	glassArt: GlassArt;
	findings: Finding[];
}

export function planGlass(design: Design): GlassPlan {
	const transfers = transferPoints(design, glassLayout(design));
	const withTransfers: Design = {
		...design,
		glassArt: { ...design.glassArt, transfers, traces: [] }
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
