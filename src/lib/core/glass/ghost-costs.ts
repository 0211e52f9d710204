/**
 * Routing costs for leads on one plate over the other plate's conductors. A lead over a conductor
 * of a common it shares an electrode with lights a ghost wherever there is fluid: heavy in the
 * viewing area, lighter behind the bezel, nothing under the seal and beyond. Over a common whose
 * pair with the lead's line drives no electrode, the crossing only ever sees the unselected voltage
 * and costs nothing extra. Every cell in the viewing area costs a little, so buses and leads keep
 * to the border where they can.
 */
import type { Design } from '../design/schema';
import { crossingZones, ZONE_BEZEL, ZONE_VIEW } from './crossing-zones';
import type { GlassLayout } from './layout';
import type { RouteGrid } from './route-grid';

/** Extra cost of a cell in the viewing area: a quarter of a step (STEP_COST = 4 units). */
const VIEW_COST = 1;
/** Extra cost per cell of a lead over a common it would light a ghost with, in the viewing area. */
const GHOST_COST_VIEW = 1600;
/** The same behind the bezel, where a ghost switches but is hidden. */
const GHOST_COST_BEZEL = 600;

/**
 * Cost grids for leads on one plate over the other plate's conductors: the viewing-area cost
 * everywhere in it, plus, for each set of commons a lead would light a ghost with, the ghost cost
 * over those commons' conductors (heavy in the viewing area, light behind the bezel, none where
 * there is no fluid). One grid per set of commons, made on first use.
 */
export function ghostCosts(options: {
	design: Design;
	layout: GlassLayout;
	grid: RouteGrid;
	conductors: readonly { common: number; ring: Float64Array }[];
}): (lit: readonly number[]) => Float32Array {
	const { design, layout, grid, conductors } = options;
	const reach = design.glassArt.traceWidth_mm / 2;
	const zones = crossingZones(grid, {
		viewing: design.glass.viewingArea,
		sealInner: layout.sealInner
	});
	const n = grid.nx * grid.ny;
	const layers = design.commons.map(() => new Float32Array(n));
	for (const { common, ring } of conductors)
		grid.forCellsNear(ring, reach, (cell) => {
			const zone = zones[cell];
			layers[common][cell] =
				zone === ZONE_VIEW ? GHOST_COST_VIEW : zone === ZONE_BEZEL ? GHOST_COST_BEZEL : 0;
		});
	const base = new Float32Array(n);
	for (let cell = 0; cell < n; cell++) if (zones[cell] === ZONE_VIEW) base[cell] = VIEW_COST;
	const made = new Map<string, Float32Array>();
	return (lit) => {
		const name = lit.join(',');
		let cost = made.get(name);
		if (!cost) {
			cost = Float32Array.from(base);
			for (const c of lit) {
				const layer = layers[c];
				for (let cell = 0; cell < n; cell++) cost[cell] += layer[cell];
			}
			made.set(name, cost);
		}
		return cost;
	};
}
