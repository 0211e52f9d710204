/**
 * Routing costs for leads on one plate over the other plate's conductors. A lead over a conductor
 * of a common it shares an electrode with lights a ghost wherever there is fluid: heavy in the
 * viewing area, lighter behind the bezel, nothing under the seal and beyond. Over a common whose
 * pair with the lead's line drives no electrode, the crossing only ever sees the unselected voltage
 * and costs nothing extra. Every cell in the viewing area costs a little, so buses and leads keep
 * to the border where they can.
 */
import type { Design } from '../design/schema';
import { cellZone, viewingColumns, ZONE_DRY, ZONE_VIEW } from './crossing-zones';
import type { GlassLayout } from './layout';
import type { RouteGrid } from './route-grid';
import { SpareArrays } from './spare-arrays';

/** Extra cost of a cell in the viewing area: a quarter of a step (STEP_COST = 4 units). */
const VIEW_COST = 1;
/** Extra cost per cell of a lead over a common it would light a ghost with, in the viewing area. */
const GHOST_COST_VIEW = 1600;
/** The same behind the bezel, where a ghost switches but is hidden. */
const GHOST_COST_BEZEL = 600;

/** Per common the cells over its conductors where a lead lighting it pays extra, and how much. */
export interface GhostLayer {
	cells: Int32Array;
	extra: Float32Array;
}

/**
 * The ghost cost of each cell over each common's conductors (within half a trace width of them):
 * GHOST_COST_VIEW in the viewing area, GHOST_COST_BEZEL behind the bezel, none where dry. Each
 * cell once per common; a conductor covers few cells of a plate, so these are lists, not grids.
 */
export function ghostLayers(options: {
	design: Design;
	layout: GlassLayout;
	grid: RouteGrid;
	conductors: readonly { common: number; ring: Float64Array }[];
}): GhostLayer[] {
	const { design, layout, grid, conductors } = options;
	const reach = design.glassArt.traceWidth_mm / 2;
	const zoneOf = cellZone(grid, { viewing: design.glass.viewingArea, sealInner: layout.sealInner });
	const byCommon = design.commons.map(() => [] as Float64Array[]);
	for (const c of conductors) byCommon[c.common]?.push(c.ring);
	let found = new Int32Array(1024);
	return byCommon.map((rings) => {
		let count = 0;
		for (const ring of rings)
			grid.forCellsNear(ring, reach, (cell) => {
				if (count === found.length) {
					const grown = new Int32Array(2 * found.length);
					grown.set(found);
					found = grown;
				}
				found[count++] = cell;
			});
		const sorted = found.subarray(0, count).sort();
		const cells = new Int32Array(count);
		const extra = new Float32Array(count);
		let kept = 0;
		for (let k = 0; k < count; k++) {
			const cell = sorted[k];
			if (k > 0 && sorted[k - 1] === cell) continue;
			const zone = zoneOf(cell);
			if (zone === ZONE_DRY) continue;
			cells[kept] = cell;
			extra[kept++] = zone === ZONE_VIEW ? GHOST_COST_VIEW : GHOST_COST_BEZEL;
		}
		return { cells: cells.slice(0, kept), extra: extra.slice(0, kept) };
	});
}

/** Cost fields handed back by finished plates, kept for the next (filled afresh on taking). */
const spareFields = new SpareArrays<Float32Array>((cells) => new Float32Array(cells), 12);

export interface GhostCosts {
	/** The cost field of a lead that lights these commons (shared between callers: read only). */
	of(lit: readonly number[]): Float32Array;
	/** Hands the fields back for reuse; the caller must not read them afterwards. */
	release(): void;
}

/**
 * Cost fields for leads on one plate over the other plate's conductors: the viewing-area cost
 * everywhere in it, plus, for each set of commons a lead would light a ghost with, the ghost cost
 * over those commons' conductors. One field per set of commons, made on first use.
 */
export function ghostCosts(options: {
	design: Design;
	layout: GlassLayout;
	grid: RouteGrid;
	conductors: readonly { common: number; ring: Float64Array }[];
}): GhostCosts {
	const { design, grid } = options;
	const layers = ghostLayers(options);
	const n = grid.nx * grid.ny;
	const viewRow = viewingColumns(grid, design.glass.viewingArea);
	const made = new Map<string, Float32Array>();
	return {
		of(lit) {
			const name = lit.join(',');
			let cost = made.get(name);
			if (cost) return cost;
			cost = spareFields.take(n).fill(0);
			for (let iy = 0; iy < grid.ny; iy++) {
				const [first, last] = viewRow(iy);
				if (first <= last) cost.fill(VIEW_COST, iy * grid.nx + first, iy * grid.nx + last + 1);
			}
			for (const c of lit) {
				const layer = layers[c];
				if (!layer) continue;
				for (let k = 0; k < layer.cells.length; k++) cost[layer.cells[k]] += layer.extra[k];
			}
			made.set(name, cost);
			return cost;
		},
		release() {
			for (const field of made.values()) spareFields.give(field);
			made.clear();
		}
	};
}
