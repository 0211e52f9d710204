/**
 * The crossing matrix of a design: rows are commons, columns segment lines, each cell holds the
 * electrodes at that (common, line) crossing — none (a free crossing), one, or several (a conflict:
 * they would always switch together). Electrodes lacking a common or a line are listed apart.
 */
import type { Design } from '../design/schema';

export interface CrossingCell {
	common: string;
	line: string;
	/** Electrode ids, in document order. */
	electrodes: string[];
}

export interface CrossingMatrix {
	commons: { id: string; name: string }[];
	lines: { id: string; name: string }[];
	/** cells[row][column]: row = common index, column = line index. */
	cells: CrossingCell[][];
	/** Electrode ids without a common or a line, or with one the design does not list. */
	unassigned: string[];
	/** Ids of every electrode that shares its crossing with another. */
	conflicting: Set<string>;
	used: number;
}

export function crossingMatrix(design: Design): CrossingMatrix {
	const row = new Map(design.commons.map((c, i) => [c.id, i]));
	const column = new Map(design.segmentLines.map((l, i) => [l.id, i]));
	const cells = design.commons.map((c) =>
		design.segmentLines.map((l) => ({ common: c.id, line: l.id, electrodes: [] as string[] }))
	);
	const unassigned: string[] = [];
	for (const e of design.electrodes) {
		const r = e.common === null ? undefined : row.get(e.common);
		const c = e.line === null ? undefined : column.get(e.line);
		if (r === undefined || c === undefined) unassigned.push(e.id);
		else cells[r][c].electrodes.push(e.id);
	}
	const conflicting = new Set<string>();
	let used = 0;
	for (const cell of cells.flat()) {
		if (cell.electrodes.length > 0) used++;
		if (cell.electrodes.length > 1) for (const id of cell.electrodes) conflicting.add(id);
	}
	return {
		commons: design.commons.map(({ id, name }) => ({ id, name })),
		lines: design.segmentLines.map(({ id, name }) => ({ id, name })),
		cells,
		unassigned,
		conflicting,
		used
	};
}

/** Ids of electrodes that share a crossing with another (for highlighting on the drawing). */
export function conflictingElectrodes(design: Design): Set<string> {
	const seen = new Map<string, string>();
	const out = new Set<string>();
	for (const e of design.electrodes) {
		if (e.common === null || e.line === null) continue;
		const key = `${e.common}\u0000${e.line}`;
		const first = seen.get(key);
		if (first === undefined) seen.set(key, e.id);
		else out.add(first).add(e.id);
	}
	return out;
}
