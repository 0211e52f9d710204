/**
 * Automatic routing of both plates, in three passes: the segment plate over the bare back-plate
 * pieces (where the leads want to go), then the common plate keeping its leads from under those
 * segment leads where they would light a ghost (the commons from the outside in, and, if that
 * leaves pieces unjoined, all growing in turn), then the segment plate again over the finished
 * common plate, starting from the net order that worked on the first pass: only the nets with a
 * first-pass lead over a common-plate lead it would light are routed again, around the others.
 */
import type { Trace } from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import { platePieces } from './back-plate-pieces';
import { glassLayout } from './layout';
import type { GlassRouting, PlateRouting } from './plate-routing';
import { outsideInOrder, routeCommonPlate } from './route-common-plate';
import { routeSegmentPlate } from './route-segment-plate';
import { traceRings } from './trace-rings';
import { leadsCrossBuses } from './leads-cross-buses';
import { dotRing, transferPoints } from './transfer-points';

export type { GlassRouting, Unrouted } from './plate-routing';

export function routeGlass(design: Design): GlassRouting {
	const layout = glassLayout(design);
	const { pieces } = platePieces(design);
	const commons = design.commons.map((c) => c.id);
	const lines = new Map<string, number[]>();
	for (const e of design.electrodes) {
		const c = commons.indexOf(e.common ?? '');
		if (c < 0 || e.line === null) continue;
		const list = lines.get(e.line) ?? [];
		if (!list.includes(c)) list.push(c);
		lines.set(e.line, list);
	}
	const all = commons.map((_, i) => i);
	const dots = transferPoints(design, layout).map((t) => ({
		common: commons.indexOf(t.common),
		ring: dotRing(t)
	}));
	const bare = [
		...pieces.map((p) => ({ common: commons.indexOf(p.common), ring: p.grown[0] })),
		...dots
	].filter((c) => c.common >= 0);
	const first = routeSegmentPlate({ design, layout, commonConductors: bare });
	const front = first.traces.flatMap((t) =>
		traceRings(t).map((ring) => ({ lit: lines.get(t.net) ?? all, ring }))
	);
	let common: PlateRouting | null = null;
	for (const order of [outsideInOrder(design, pieces), null]) {
		const result = routeCommonPlate({ design, layout, pieces, order, front });
		if (!common || result.missed < common.missed) common = result;
		// The other order helps when a common's pieces or transfer point end up walled in.
		if (result.missed === 0) break;
	}
	const commonConductors = [
		...bare,
		...common!.traces.flatMap((t) =>
			traceRings(t).map((ring) => ({ common: commons.indexOf(t.net), ring }))
		)
	].filter((c) => c.common >= 0);
	const crossing = leadsCrossBuses({
		design,
		layout,
		leads: first.traces,
		buses: common!.traces,
		litOf: (net) => lines.get(net) ?? all
	});
	const again = (kept: Trace[]) =>
		routeSegmentPlate({ design, layout, commonConductors, start: first.order, kept });
	let segment = first;
	if (crossing.size > 0) {
		// Only the nets whose leads cross a bus they light are routed again, around the rest; if
		// that reaches fewer terminals than the first pass did, the whole plate is routed again.
		// Nets left short on the first pass are routed again too.
		for (const u of first.unrouted) crossing.add(u.net);
		segment = again(first.traces.filter((t) => !crossing.has(t.net)));
		if (segment.missed > first.missed) segment = again([]);
	}
	return {
		traces: [...common!.traces, ...segment.traces],
		unrouted: [...common!.unrouted, ...segment.unrouted]
	};
}
