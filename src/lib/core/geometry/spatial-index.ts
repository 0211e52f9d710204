/**
 * A uniform-grid spatial index over electrodes for hit-testing and marquee selection. Each
 * electrode is flattened once (tolerance in µm) and registered in every grid cell its tight
 * bounds touch; a query visits only the cells around the point or rectangle. Rebuilding with
 * `previous` reuses the flattening of unchanged (identical) electrode records, so rebuilding after
 * each edit costs little. Results come in draw order or, for hits, topmost first.
 */
import type { Electrode } from '../design/schema';
import type { Bounds } from './bounds';
import { flattenShape } from './flatten';
import { shapeTightBounds, expandBounds } from './tight-bounds';
import type { XY } from './vec';

export interface IndexedElectrode {
	readonly electrode: Electrode;
	readonly id: string;
	/** Position in draw order (0 = bottom). */
	readonly order: number;
	readonly bounds: Bounds;
	/** Flattened outline then holes. */
	readonly rings: readonly Float64Array[];
}

export interface SpatialIndex {
	readonly cellSize_mm: number;
	readonly tolerance_um: number;
	readonly entries: readonly IndexedElectrode[];
	readonly cells: ReadonlyMap<number, readonly number[]>;
}

const OFFSET = 1 << 15;
const cellKey = (ix: number, iy: number) => (ix + OFFSET) * 65536 + (iy + OFFSET);

function autoCellSize(entries: readonly IndexedElectrode[]): number {
	const sizes = entries
		.map((e) => Math.max(e.bounds.maxX - e.bounds.minX, e.bounds.maxY - e.bounds.minY))
		.sort((a, b) => a - b);
	const median = sizes.length ? sizes[Math.floor(sizes.length / 2)] : 5;
	return Math.min(50, Math.max(0.5, median));
}

export function buildSpatialIndex(
	electrodes: readonly Electrode[],
	options: { cellSize_mm?: number; tolerance_um?: number; previous?: SpatialIndex } = {}
): SpatialIndex {
	const tolerance_um = options.tolerance_um ?? 2;
	const reuse = new Map<Electrode, IndexedElectrode>();
	if (options.previous && options.previous.tolerance_um === tolerance_um) {
		for (const e of options.previous.entries) reuse.set(e.electrode, e);
	}
	const entries = electrodes.map((electrode, order): IndexedElectrode => {
		const old = reuse.get(electrode);
		if (old) return old.order === order ? old : { ...old, order };
		return {
			electrode,
			id: electrode.id,
			order,
			bounds: shapeTightBounds(electrode),
			rings: flattenShape(electrode, { tolerance_um })
		};
	});
	const cellSize_mm = options.cellSize_mm ?? autoCellSize(entries);
	const cells = new Map<number, number[]>();
	for (const entry of entries) {
		const b = entry.bounds;
		for (let ix = Math.floor(b.minX / cellSize_mm); ix <= Math.floor(b.maxX / cellSize_mm); ix++) {
			for (
				let iy = Math.floor(b.minY / cellSize_mm);
				iy <= Math.floor(b.maxY / cellSize_mm);
				iy++
			) {
				const key = cellKey(ix, iy);
				const list = cells.get(key);
				if (list) list.push(entry.order);
				else cells.set(key, [entry.order]);
			}
		}
	}
	return { cellSize_mm, tolerance_um, entries, cells };
}

/** Entries whose bounds may touch `area`, in draw order, each once. */
export function candidatesIn(index: SpatialIndex, area: Bounds): IndexedElectrode[] {
	const s = index.cellSize_mm;
	const seen = new Set<number>();
	const spanX = Math.floor(area.maxX / s) - Math.floor(area.minX / s);
	const spanY = Math.floor(area.maxY / s) - Math.floor(area.minY / s);
	if ((spanX + 1) * (spanY + 1) > index.cells.size) {
		index.entries.forEach((e) => seen.add(e.order));
	} else {
		for (let ix = Math.floor(area.minX / s); ix <= Math.floor(area.maxX / s); ix++) {
			for (let iy = Math.floor(area.minY / s); iy <= Math.floor(area.maxY / s); iy++) {
				for (const order of index.cells.get(cellKey(ix, iy)) ?? []) seen.add(order);
			}
		}
	}
	return [...seen]
		.sort((a, b) => a - b)
		.map((order) => index.entries[order])
		.filter(
			(e) =>
				e.bounds.minX <= area.maxX &&
				e.bounds.maxX >= area.minX &&
				e.bounds.minY <= area.maxY &&
				e.bounds.maxY >= area.minY
		);
}

export const pointArea = (p: XY, margin_mm: number): Bounds =>
	expandBounds({ minX: p.x, minY: p.y, maxX: p.x, maxY: p.y }, margin_mm);
