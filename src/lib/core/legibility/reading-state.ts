/**
 * Which electrodes a reading lights: the characters of `text` go onto the character groups in
 * reading order ('.' and ',' light the previous character's decimal point, ':' lights the colon
 * electrodes: a colon group or electrodes named "COL…"); each bar graph shows its first `bars`
 * steps; listed icons are lit. Everything else is off. Characters a group cannot show are
 * reported, never silently dropped.
 */
import type { Design } from '../design/schema';
import type { Reading } from '../design/legibility-schema';
import { segmentsFor } from '../glyphs/segment-charsets';
import type { CharacterGroup } from './character-groups';

export interface ReadingState {
	lit: Set<string>;
	/** Characters that found no group, or that their group cannot show. */
	unshown: string[];
}

function colonIds(design: Design): string[] {
	const fromGroups = design.groups
		.filter((g) => g.generator?.kind === 'colon')
		.flatMap((g) => g.members);
	if (fromGroups.length > 0) return fromGroups;
	return design.electrodes.filter((e) => /^col(on)?\b/i.test(e.name)).map((e) => e.id);
}

export function readingState(options: {
	design: Design;
	groups: readonly CharacterGroup[];
	reading: Reading;
}): ReadingState {
	const { design, groups, reading } = options;
	const lit = new Set<string>();
	const unshown: string[] = [];
	let next = 0;
	for (const char of reading.text) {
		if (char === '.' || char === ',') {
			const dp = next > 0 ? groups[next - 1].segmentIds.dp : undefined;
			if (dp) lit.add(dp);
			else unshown.push(char);
			continue;
		}
		if (char === ':') {
			const ids = colonIds(design);
			if (ids.length === 0) unshown.push(char);
			ids.forEach((id) => lit.add(id));
			continue;
		}
		const group = groups[next++];
		const segments = group ? segmentsFor(char, group.segmentCount) : null;
		if (!group || !segments) {
			unshown.push(char);
			continue;
		}
		for (const key of segments) {
			const id = group.segmentIds[key];
			if (id) lit.add(id);
		}
	}
	for (const group of design.groups) {
		if (group.generator?.kind !== 'bar-graph') continue;
		group.members
			.slice(0, Math.min(reading.bars, group.members.length))
			.forEach((id) => lit.add(id));
	}
	const known = new Set(design.electrodes.map((e) => e.id));
	for (const id of reading.icons) if (known.has(id)) lit.add(id);
	return { lit, unshown };
}
