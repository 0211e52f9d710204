/**
 * The pin map of a design: which electrode sits at each (common, segment line) crossing. Each
 * crossing can address at most one electrode; two electrodes on the same crossing always switch
 * together, which is a wiring error.
 */
import type { Design } from '../design/schema';

export interface PinConflict {
	common: string;
	line: string;
	/** Names of the electrodes (for messages). */
	electrodes: string[];
	/** Their ids (for findings and selection). */
	electrodeIds: string[];
}

export interface PinMap {
	/** Commons declared plus segment lines in use. */
	pinCount: number;
	commonsUsed: number;
	linesUsed: number;
	conflicts: PinConflict[];
	/** Names of electrodes that lack a common or a line. */
	unassigned: string[];
	/** Ids of the same electrodes. */
	unassignedIds: string[];
	/** Commons that carry electrodes but lie beyond the drive's common count. */
	commonsBeyondDrive: string[];
}

export function pinMap(design: Design): PinMap {
	const byCrossing = new Map<
		string,
		{ common: string; line: string; electrodes: string[]; electrodeIds: string[] }
	>();
	const unassigned: string[] = [];
	const unassignedIds: string[] = [];
	const linesUsed = new Set<string>();
	const commonsUsed = new Set<string>();
	for (const electrode of design.electrodes) {
		if (electrode.common === null || electrode.line === null) {
			unassigned.push(electrode.name || electrode.id);
			unassignedIds.push(electrode.id);
			continue;
		}
		linesUsed.add(electrode.line);
		commonsUsed.add(electrode.common);
		const key = `${electrode.common}\u0000${electrode.line}`;
		const entry = byCrossing.get(key) ?? {
			common: electrode.common,
			line: electrode.line,
			electrodes: [],
			electrodeIds: []
		};
		entry.electrodes.push(electrode.name || electrode.id);
		entry.electrodeIds.push(electrode.id);
		byCrossing.set(key, entry);
	}
	const conflicts = [...byCrossing.values()].filter((entry) => entry.electrodes.length > 1);
	const nameOfCommon = new Map(design.commons.map((c) => [c.id, c.name || c.id]));
	const nameOfLine = new Map(design.segmentLines.map((l) => [l.id, l.name || l.id]));
	const commonsBeyondDrive = design.commons
		.slice(design.drive.commons)
		.filter((c) => commonsUsed.has(c.id))
		.map((c) => c.name || c.id);
	return {
		pinCount: design.commons.length + linesUsed.size,
		commonsUsed: commonsUsed.size,
		linesUsed: linesUsed.size,
		conflicts: conflicts.map((c) => ({
			common: nameOfCommon.get(c.common) ?? c.common,
			line: nameOfLine.get(c.line) ?? c.line,
			electrodes: c.electrodes,
			electrodeIds: c.electrodeIds
		})),
		unassigned,
		unassignedIds,
		commonsBeyondDrive
	};
}
