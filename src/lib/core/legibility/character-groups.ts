/**
 * The character groups of a design: groups made by a segmented-character generator (7, 14 or 16
 * segments), with the character height and stroke width their generator was given, and which
 * electrode is which segment (the generator run again gives the part keys in member order).
 * Groups are ordered left to right, then top to bottom, as a reading is laid onto them.
 */
import type { Design } from '../design/schema';
import type { SegmentCount } from '../glyphs/segment-charsets';
import type { GeneratedGroup } from '../glyphs/glyph-types';
import { generateSevenSegment } from '../glyphs/seven-segment';
import { generateStarburst } from '../glyphs/starburst-segments';

type StarburstParams = Parameters<typeof generateStarburst>[0];

/** The segmented-character generators only (the icon generators and their geometry kernel stay unloaded). */
const SEGMENT_GENERATORS: Readonly<
	Record<string, { count: SegmentCount; run: (params: unknown) => GeneratedGroup }>
> = {
	'seven-segment': {
		count: 7,
		run: (p) => generateSevenSegment(p as Parameters<typeof generateSevenSegment>[0])
	},
	'fourteen-segment': {
		count: 14,
		run: (p) => generateStarburst(p as StarburstParams, { count: 14 })
	},
	'sixteen-segment': {
		count: 16,
		run: (p) => generateStarburst(p as StarburstParams, { count: 16 })
	}
};

export interface CharacterGroup {
	id: string;
	name: string;
	height_mm: number;
	stroke_mm: number;
	segmentCount: SegmentCount;
	/** Electrode id of each segment key ('a', 'g1', 'dp' …). */
	segmentIds: Record<string, string>;
	members: string[];
	x_mm: number;
	y_mm: number;
}

export function characterGroups(design: Design): CharacterGroup[] {
	const groups: CharacterGroup[] = [];
	for (const group of design.groups) {
		const generator = group.generator;
		if (!generator) continue;
		const segmented = SEGMENT_GENERATORS[generator.kind];
		const { height_mm, stroke_mm } = generator.params;
		if (!segmented || typeof height_mm !== 'number' || typeof stroke_mm !== 'number') continue;
		const segmentCount = segmented.count;
		const segmentIds: Record<string, string> = {};
		try {
			const parts = segmented.run(generator.params).parts;
			parts.forEach((part, i) => {
				if (i < group.members.length && part.key) segmentIds[part.key] = group.members[i];
			});
		} catch {
			// parameters no longer valid: the group still has a size, only no segment map
		}
		groups.push({
			id: group.id,
			name: group.name,
			height_mm,
			stroke_mm,
			segmentCount,
			segmentIds,
			members: [...group.members],
			x_mm: Number(generator.params.x_mm ?? 0),
			y_mm: Number(generator.params.y_mm ?? 0)
		});
	}
	return groups.sort((a, b) => a.y_mm - b.y_mm || a.x_mm - b.x_mm);
}
