/**
 * Routes the segment plate: for each segment line its electrodes and pad, and for each common its
 * transfer point and pad, on the front glass, one growing tree per net (route-net) in pin order,
 * the common leads first (nearest the ledge first). A lead over a common-plate conductor costs
 * what the ghost it would light is worth (ghost-costs). When some leads find no way, the plate is
 * routed again with those nets first (a rip-up and retry on net order) and the attempt that
 * reaches the most terminals is kept.
 *
 * Grid pitch = trace width + minimum gap; clearance = minimum gap + half the trace width.
 */
import type { Trace } from '../design/glass-art-schema';
import type { Design, Rect } from '../design/schema';
import { flattenContour } from '../geometry/flatten';
import { ghostCosts } from './ghost-costs';
import { GridSearch } from './grid-search';
import type { GlassLayout } from './layout';
import type { PlateRouting, Unrouted } from './plate-routing';
import { rectRing } from './rings';
import { RouteGrid } from './route-grid';
import { routeNet, type Terminal } from './route-net';
import { traceRings } from './trace-rings';
import { dotRing, transferPoints } from './transfer-points';

/** Routing attempts at most (the first plus retries with failed nets first). */
const SEGMENT_ATTEMPTS = 3;

const inset = (r: Rect, d: number): Rect => ({
	x_mm: r.x_mm + d,
	y_mm: r.y_mm + d,
	width_mm: r.width_mm - 2 * d,
	height_mm: r.height_mm - 2 * d
});

/** Where segment-plate leads may run: the front glass, 0.3 mm in from its edge. */
export const segmentDomain = (layout: GlassLayout): Rect => inset(layout.glass, 0.3);

interface SegmentNet {
	pad: GlassLayout['pads'][number];
	terminals: Terminal[];
	/** Indexes of the commons a lead of this net lights a ghost over. */
	lit: number[];
}

/** The segment-plate nets: common leads first, nearest the ledge first, then the lines in pin order. */
function segmentNets(design: Design, layout: GlassLayout): SegmentNet[] {
	const commons = design.commons.map((c) => c.id);
	const transfers = new Map(transferPoints(design, layout).map((t) => [t.common, t]));
	const all = commons.map((_, i) => i);
	const nets = layout.pads.map((pad): SegmentNet => {
		if (pad.kind === 'common') {
			const t = transfers.get(pad.net);
			return {
				pad,
				terminals: [
					{ electrodes: [], ring: rectRing(pad.rect) },
					...(t ? [{ electrodes: [], ring: dotRing(t) }] : [])
				],
				lit: all
			};
		}
		const electrodes = design.electrodes.filter((e) => e.line === pad.net);
		return {
			pad,
			terminals: [
				{ electrodes: [], ring: rectRing(pad.rect) },
				...electrodes.map((e) => ({
					electrodes: [e.id],
					ring: flattenContour(e.outline, { tolerance_um: 5 })
				}))
			],
			lit: [...new Set(electrodes.map((e) => commons.indexOf(e.common ?? '')))].filter(
				(i) => i >= 0
			)
		};
	});
	const toLedge = (pad: SegmentNet['pad']) => {
		const t = transfers.get(pad.net);
		return t ? Math.hypot(t.x_mm - pad.entry.x, t.y_mm - pad.entry.y) : 0;
	};
	const commonNets = nets.filter((n) => n.pad.kind === 'common');
	commonNets.sort((a, b) => toLedge(a.pad) - toLedge(b.pad));
	const lineNets = nets.filter((n) => n.pad.kind !== 'common');
	return [...commonNets, ...lineNets];
}

function routeSegmentAttempt(options: {
	design: Design;
	layout: GlassLayout;
	nets: readonly SegmentNet[];
	commonConductors: readonly { common: number; ring: Float64Array }[];
	kept: readonly Trace[];
}): PlateRouting {
	const { design, layout, nets, commonConductors, kept } = options;
	const width = design.glassArt.traceWidth_mm;
	const gap = design.rules.minGap_mm;
	const clearance = gap + width / 2;
	const grid = new RouteGrid({ domain: segmentDomain(layout), cell_mm: width + gap });
	const search = new GridSearch(grid);
	nets.forEach((n, k) => n.terminals.forEach((t) => grid.claim(t.ring, k, clearance)));
	// Each net's home: the clearance around its own terminals, before any lead is laid.
	const home = Int32Array.from(grid.owner);
	const costOf = ghostCosts({ design, layout, grid, conductors: commonConductors });
	const traces: Trace[] = [];
	const unrouted: Unrouted[] = [];
	const netIndex = new Map(nets.map((n, k) => [n.pad.net, k]));
	const keptNets = new Set<string>();
	for (const t of kept) {
		const net = netIndex.get(t.net);
		if (net === undefined) continue;
		keptNets.add(t.net);
		traces.push(t);
		for (const ring of traceRings(t)) grid.claim(ring, net, clearance);
	}
	let missed = 0;
	nets.forEach(({ pad, terminals, lit }, net) => {
		if (keptNets.has(pad.net)) return;
		grid.setCost(costOf.of(lit));
		const route = routeNet({
			grid,
			search,
			net,
			terminals,
			width_mm: width,
			clearance_mm: clearance,
			home
		});
		route.leads.forEach((points, i) =>
			traces.push({
				id: `ts-${pad.net}-${i + 1}`,
				plate: 'segment',
				net: pad.net,
				width_mm: width,
				points
			})
		);
		missed += route.unreached.length;
		if (route.unreached.length > 0)
			unrouted.push({
				plate: 'segment',
				net: pad.net,
				electrodes: route.unreached.flatMap((t) => [...t.electrodes])
			});
	});
	costOf.release();
	return { traces, unrouted, missed };
}

export function routeSegmentPlate(options: {
	design: Design;
	layout: GlassLayout;
	commonConductors: readonly { common: number; ring: Float64Array }[];
	/** Net order to start from (pad nets), e.g. the order that worked on an earlier pass. */
	start?: readonly string[];
	/** Leads laid already, kept as they are: their nets are not routed again. */
	kept?: readonly Trace[];
}): PlateRouting & { order: string[] } {
	let nets = segmentNets(options.design, options.layout);
	if (options.start) {
		const rank = new Map(options.start.map((net, i) => [net, i]));
		nets = [...nets].sort(
			(a, b) => (rank.get(a.pad.net) ?? Infinity) - (rank.get(b.pad.net) ?? Infinity)
		);
	}
	let best: (PlateRouting & { order: string[] }) | null = null;
	for (let attempt = 0; attempt < SEGMENT_ATTEMPTS; attempt++) {
		const result = routeSegmentAttempt({ ...options, nets, kept: options.kept ?? [] });
		if (!best || result.missed < best.missed)
			best = { ...result, order: nets.map((n) => n.pad.net) };
		const failed = new Set(result.unrouted.map((u) => u.net));
		// Reordering settles a few nets that cut each other off; when many fail the glass is too
		// crowded for the order to matter, and another attempt would only cost time.
		if (failed.size === 0 || failed.size > Math.max(2, nets.length / 10)) break;
		nets = [
			...nets.filter((n) => failed.has(n.pad.net)),
			...nets.filter((n) => !failed.has(n.pad.net))
		];
	}
	return best!;
}
