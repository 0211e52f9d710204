/**
 * The firmware's view of the wiring: for every character group, which (common, line) bit drives
 * each of its segments; electrodes in no group follow as single entries. Bits are 0-based indices
 * into the design's lists (COM1 = common 0, SEG1 = line 0); an unwired electrode has null bits.
 * A group made by a generator names its segments by the generator's part keys (a … g, dp for a
 * 7-segment digit); other members are named by the electrode's name.
 */
import type { Design, Group } from '../design/schema';
import { runGenerator } from '../glyphs/generator-registry';

export interface SegmentBit {
	/** Segment key within its group (`a`, `dp`, …), or the electrode's name. */
	segment: string;
	electrode: string;
	name: string;
	common: number | null;
	line: number | null;
}

export interface GroupMap {
	groupId: string | null;
	name: string;
	/** Generator kind, e.g. `seven-segment`; null for hand-made groups and single electrodes. */
	kind: string | null;
	bits: SegmentBit[];
}

function partKeys(group: Group): string[] | null {
	if (!group.generator) return null;
	try {
		const parts = runGenerator(group.generator.kind, group.generator.params).parts;
		return parts.length === group.members.length ? parts.map((p) => p.key) : null;
	} catch {
		return null;
	}
}

export function segmentMap(design: Design): GroupMap[] {
	const byId = new Map(design.electrodes.map((e) => [e.id, e]));
	const commonIndex = new Map(design.commons.map((c, i) => [c.id, i]));
	const lineIndex = new Map(design.segmentLines.map((l, i) => [l.id, i]));
	const grouped = new Set<string>();
	const bitOf = (id: string, segment: string): SegmentBit => {
		const e = byId.get(id)!;
		grouped.add(id);
		const common = e.common === null ? undefined : commonIndex.get(e.common);
		const line = e.line === null ? undefined : lineIndex.get(e.line);
		const wired = common !== undefined && line !== undefined;
		return {
			segment,
			electrode: e.id,
			name: e.name || e.id,
			common: wired ? common : null,
			line: wired ? line : null
		};
	};
	const maps: GroupMap[] = [];
	for (const group of design.groups) {
		const keys = partKeys(group);
		const members = group.members.filter((id) => byId.has(id) && !grouped.has(id));
		if (members.length === 0) continue;
		maps.push({
			groupId: group.id,
			name: group.name || group.id,
			kind: keys ? group.generator!.kind : null,
			bits: members.map((id) =>
				bitOf(id, keys?.[group.members.indexOf(id)] ?? byId.get(id)!.name ?? id)
			)
		});
	}
	for (const e of design.electrodes) {
		if (grouped.has(e.id)) continue;
		maps.push({
			groupId: null,
			name: e.name || e.id,
			kind: null,
			bits: [bitOf(e.id, e.name || e.id)]
		});
	}
	return maps;
}
