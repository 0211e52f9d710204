/** One segment-plate lead of SEG1 on the editor's test design, for the trace-editing tests. */
import type { Trace } from '$lib/core/design/glass-art-schema';
import type { Design } from '$lib/core/design/schema';
import { testDesign } from './fixtures';

/** An L-shaped lead: (30, 30) down to (30, 40), then right to (40, 40). */
export const lead: Trace = {
	id: 'ts-seg1-1',
	plate: 'segment',
	net: 'seg1',
	width_mm: 0.1,
	points: [
		{ x: 30, y: 30 },
		{ x: 30, y: 40 },
		{ x: 40, y: 40 }
	]
};

/** The test design with the lead as its only trace. */
export function withTrace(): Design {
	const d = testDesign();
	return { ...d, glassArt: { ...d.glassArt, traces: [lead] } };
}

/** Electrodes and plates on show, so traces can be picked. */
export const shown = { layers: { electrodes: true, plates: true } };
/** The first trace's points as [x, y] pairs. */
export const pointsOf = (d: Design) => d.glassArt.traces[0]?.points.map((p) => [p.x, p.y]);
/** The Delete key, no modifiers. */
export const del = { key: 'Delete', shift: false, alt: false, mod: false };
