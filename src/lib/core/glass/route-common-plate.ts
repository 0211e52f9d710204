/**
 * Routes the common plate: for each common its grown back-plate pieces and its transfer point are
 * joined inside the seal's outer edge by a growing tree per common (route-net). Two orders are
 * offered: the commons one after another from the outside of the glass inwards (the banded layout
 * of multiplexed glass, where the outer commons' buses run along the edges and the inner ones
 * cross between the digits), and all commons growing in turn, one join each (none walls in the
 * others first). Each common's leads avoid the segment leads they would light.
 *
 * Grid pitch = trace width + minimum gap; clearance = minimum gap + half the trace width.
 */
import type { Trace } from '../design/glass-art-schema';
import type { Design } from '../design/schema';
import type { PlatePiece } from './back-plate-pieces';
import { ghostCosts } from './ghost-costs';
import { GridSearch } from './grid-search';
import type { GlassLayout } from './layout';
import type { PlateRouting, Unrouted } from './plate-routing';
import { RouteGrid } from './route-grid';
import { growNet, type NetRoute, type Terminal } from './route-net';
import { dotRing, transferPoints } from './transfer-points';

/** Each common's distance from the glass centre (mean of its pieces' centres), largest first. */
export function outsideInOrder(design: Design, pieces: readonly PlatePiece[]): string[] {
	const cx = design.glass.width_mm / 2,
		cy = design.glass.height_mm / 2;
	const sum = new Map<string, [number, number, number]>();
	for (const p of pieces) {
		const r = p.grown[0];
		let x = 0,
			y = 0;
		for (let i = 0; i < r.length; i += 2) {
			x += r[i];
			y += r[i + 1];
		}
		const n = r.length / 2;
		const [sx, sy, k] = sum.get(p.common) ?? [0, 0, 0];
		sum.set(p.common, [sx + x / n, sy + y / n, k + 1]);
	}
	const off = (c: string) => {
		const [sx, sy, k] = sum.get(c) ?? [cx, cy, 1];
		return Math.hypot(
			(sx / k - cx) / design.glass.width_mm,
			(sy / k - cy) / design.glass.height_mm
		);
	};
	return design.commons.map((c) => c.id).sort((a, b) => off(b) - off(a));
}

export function routeCommonPlate(options: {
	design: Design;
	layout: GlassLayout;
	pieces: readonly PlatePiece[];
	/** Common ids in routing order; null = all commons growing in turn. */
	order: readonly string[] | null;
	/** Segment-plate conductors already laid, with the commons a back lead under them would light. */
	front: readonly { lit: readonly number[]; ring: Float64Array }[];
}): PlateRouting {
	const { design, layout, pieces, order, front } = options;
	const width = design.glassArt.traceWidth_mm;
	const gap = design.rules.minGap_mm;
	const clearance = gap + width / 2;
	const grid = new RouteGrid({ domain: layout.sealOuter, cell_mm: width + gap });
	const search = new GridSearch(grid);
	const commons = design.commons.map((c) => c.id);
	const dots = new Map(transferPoints(design, layout).map((t) => [t.common, dotRing(t)]));
	pieces.forEach((p) => grid.claim(p.grown[0], commons.indexOf(p.common), clearance));
	for (const [common, ring] of dots) grid.claim(ring, commons.indexOf(common), clearance);
	// Each common's home: the clearance around its own pieces and transfer point.
	const home = Int32Array.from(grid.owner);
	const costs = ghostCosts({
		design,
		layout,
		grid,
		conductors: front.flatMap((f) => f.lit.map((common) => ({ common, ring: f.ring })))
	});
	const growing = (order ?? commons).flatMap((common) => {
		const net = commons.indexOf(common);
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
			clearance_mm: clearance,
			home
		});
		return [{ common, net, steps, route: null as NetRoute | null }];
	});
	// Each common's own costs apply while it grows: its leads avoid the segment leads it would light.
	const advance = (g: (typeof growing)[number]) => {
		grid.setCost(costs.of([g.net]));
		const step = g.steps.next();
		if (step.done) g.route = step.value;
	};
	if (order === null) {
		while (growing.some((g) => !g.route)) for (const g of growing) if (!g.route) advance(g);
	} else {
		for (const g of growing) while (!g.route) advance(g);
	}
	const traces: Trace[] = [];
	const unrouted: Unrouted[] = [];
	let missed = 0;
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
		missed += route!.unreached.length;
		if (route!.unreached.length > 0)
			unrouted.push({
				plate: 'common',
				net: common,
				electrodes: route!.unreached.flatMap((t) => [...t.electrodes])
			});
	}
	costs.release();
	return { traces, unrouted, missed };
}
