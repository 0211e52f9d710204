/**
 * The demo design as the browser flows know it: read from the file the app opens on first start,
 * and its generated glass drawing (the same deterministic core function the app's worker runs).
 */
import { readFileSync } from 'node:fs';
import type { Trace } from '../../src/lib/core/design/glass-art-schema';
import { parseDesignText } from '../../src/lib/core/design/parse-design';
import type { Design } from '../../src/lib/core/design/schema';
import { planGlass } from '../../src/lib/core/glass/plan-glass';

export function demoFromFile(): Design {
	const parsed = parseDesignText(readFileSync('src/lib/core/design/demo-design.json', 'utf8'));
	if (!parsed.ok) throw new Error('the demo design does not parse');
	return parsed.design;
}

/** The first generated segment-plate lead of SEG1 with at least `points` points. */
export function seg1Lead(design: Design, points: number): Trace {
	const seg1 = design.segmentLines.find((l) => l.name === 'SEG1')!;
	const lead = planGlass(design).glassArt.traces.find(
		(t) => t.plate === 'segment' && t.net === seg1.id && t.points.length >= points
	);
	if (!lead) throw new Error(`SEG1 has no lead of ${points} points or more`);
	return lead;
}
