/**
 * Automatic routing of both plates. The common plate goes first: for each common its grown pieces
 * and its transfer point are joined inside the seal's outer edge, preferring to stay out of the
 * viewing area; the commons grow in turn, one join each, so no common walls in the others first. The segment plate follows: for each segment line its electrodes and pad, and for
 * each common its transfer point and pad, on the front glass; a lead over a common-plate conductor
 * inside the seal costs much more, since there it lights a ghost.
 *
 * Grid pitch = trace width + minimum gap; clearance = minimum gap + half the trace width.
 */
import type { Trace } from '../design/glass-art-schema';
import type { Design, Rect } from '../design/schema';
import { platePieces, type PlatePiece } from './back-plate-pieces';
import { GridSearch } from './grid-search';
import { glassLayout, type GlassLayout } from './layout';
import { rectRing } from './rings';
import { traceRings } from './trace-rings';
import { RouteGrid } from './route-grid';
import { growNet, routeNet, type NetRoute, type Terminal } from './route-net';
import { dotRing, transferPoints } from './transfer-points';
import { flattenContour } from '../geometry/flatten';

const VIEW_COST = 2;
const GHOST_COST = 40;

export interface Unrouted {
	plate: 'segment' | 'common';
	net: string;
	electrodes: string[];
}

export interface GlassRouting {
	traces: Trace[];
	unrouted: Unrouted[];
}

const inset = (r: Rect, d: number): Rect => ({
	x_mm: r.x_mm + d,
	y_mm: r.y_mm + d,
	width_mm: r.width_mm - 2 * d,
	height_mm: r.height_mm - 2 * d
});

function routeCommonPlate(options: { design: Design; layout: GlassLayout; pieces: PlatePiece[] }): {
	traces: Trace[];
	unrouted: Unrouted[];
} {
	const { design, layout, pieces } = options;
	const width = design.glassArt.traceWidth_mm;
	const gap = design.rules.minGap_mm;
	const clearance = gap + width / 2;
	const grid = new RouteGrid({ domain: layout.sealOuter, cell_mm: width + gap });
	const search = new GridSearch(grid);
	const commons = design.commons.map((c) => c.id);
	const dots = new Map(transferPoints(design, layout).map((t) => [t.common, dotRing(t)]));
	pieces.forEach((p) => grid.claim(p.grown[0], commons.indexOf(p.common), clearance));
	for (const [common, ring] of dots) grid.claim(ring, commons.indexOf(common), clearance);
	grid.addCost(rectRing(design.glass.viewingArea), VIEW_COST);
	const traces: Trace[] = [];
	const unrouted: Unrouted[] = [];
	// The commons grow in turn, one join each, so no common's bus fills the plate first.
	const growing = commons.flatMap((common, net) => {
		const mine = pieces.filter((p) => p.common === common);
		const dot = dots.get(common);
		if (mine.length === 0 || !dot) return [];
		const terminals: Terminal[] = [
			{ electrodes: [], ring: dot },
			...mine.map((p) => ({ electrodes: [p.electrode.id], ring: p.grown[0] }))
		];
		const steps = growNet({
			grid,
			search,
			net,
			terminals,
			width_mm: width,
			clearance_mm: clearance
		});
		return [{ common, steps, route: null as NetRoute | null }];
	});
	while (growing.some((g) => !g.route))
		for (const g of growing) {
			if (g.route) continue;
			const step = g.steps.next();
			if (step.done) g.route = step.value;
		}
	for (const { common, route } of growing) {
		route!.leads.forEach((points, i) =>
			traces.push({
				id: `tc-${common}-${i + 1}`,
				plate: 'common',
				net: common,
				width_mm: width,
				points
			})
		);
		if (route!.unreached.length > 0)
			unrouted.push({
				plate: 'common',
				net: common,
				electrodes: route!.unreached.flatMap((t) => [...t.electrodes])
			});
	}
	return { traces, unrouted };
}

function routeSegmentPlate(options: {
	design: Design;
	layout: GlassLayout;
	commonConductors: Float64Array[];
}): { traces: Trace[]; unrouted: Unrouted[] } {
	const { design, layout, commonConductors } = options;
	const width = design.glassArt.traceWidth_mm;
	const gap = design.rules.minGap_mm;
	const clearance = gap + width / 2;
	const grid = new RouteGrid({ domain: inset(layout.glass, 0.3), cell_mm: width + gap });
	const search = new GridSearch(grid);
	const dots = new Map(transferPoints(design, layout).map((t) => [t.common, dotRing(t)]));
	const nets = layout.pads.map((pad) => {
		const electrodes =
			pad.kind === 'segment' ? design.electrodes.filter((e) => e.line === pad.net) : [];
		const terminals: Terminal[] = [
			{ electrodes: [], ring: rectRing(pad.rect) },
			...electrodes.map((e) => ({
				electrodes: [e.id],
				ring: flattenContour(e.outline, { tolerance_um: 5 })
			}))
		];
		const dot = pad.kind === 'common' ? dots.get(pad.net) : undefined;
		if (dot) terminals.push({ electrodes: [], ring: dot });
		return { pad, terminals };
	});
	nets.forEach((n, k) => n.terminals.forEach((t) => grid.claim(t.ring, k, clearance)));
	grid.addCost(rectRing(design.glass.viewingArea), VIEW_COST);
	const inner = layout.sealInner;
	for (const ring of commonConductors) grid.addCost(ring, GHOST_COST, width / 2);
	// Under the seal and on the ledge there is no liquid crystal: no ghost there.
	grid.forCellsNear(rectRing(layout.glass), 0, (cell) => {
		const ix = cell % grid.nx;
		const iy = (cell - ix) / grid.nx;
		const x = grid.centreX(ix),
			y = grid.centreY(iy);
		const inside =
			x > inner.x_mm &&
			y > inner.y_mm &&
			x < inner.x_mm + inner.width_mm &&
			y < inner.y_mm + inner.height_mm;
		if (!inside) grid.cost[cell] = 0;
	});
	const traces: Trace[] = [];
	const unrouted: Unrouted[] = [];
	nets.forEach(({ pad, terminals }, net) => {
		const route = routeNet({
			grid,
			search,
			net,
			terminals,
			width_mm: width,
			clearance_mm: clearance
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
		if (route.unreached.length > 0)
			unrouted.push({
				plate: 'segment',
				net: pad.net,
				electrodes: route.unreached.flatMap((t) => [...t.electrodes])
			});
	});
	return { traces, unrouted };
}

/** Routes every lead of both plates for the design's current drawing. */
export function routeGlass(design: Design): GlassRouting {
	const layout = glassLayout(design);
	const { pieces } = platePieces(design);
	const common = routeCommonPlate({ design, layout, pieces });
	const dots = transferPoints(design, layout).map(dotRing);
	const commonConductors = [
		...pieces.map((p) => p.grown[0]),
		...common.traces.flatMap(traceRings),
		...dots
	];
	const segment = routeSegmentPlate({ design, layout, commonConductors });
	return {
		traces: [...common.traces, ...segment.traces],
		unrouted: [...common.unrouted, ...segment.unrouted]
	};
}
