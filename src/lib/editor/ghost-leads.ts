/**
 * The leads behind a ghost finding: the glass check reports ghosts per (place, common, line) with
 * the overlaps' joint bounds as the finding's location; the traces whose overlaps fall in those
 * bounds at that place are the ones to reroute. Used to pick them for the points tool when the
 * finding is clicked.
 */
import type { Trace } from '$lib/core/design/glass-art-schema';
import type { Finding } from '$lib/core/findings/finding';
import type { Ghost, GhostPlace } from '$lib/core/glass/ghost-check';
import { ringBounds } from '$lib/core/glass/rings';

const PLACE_OF_CODE: Record<string, GhostPlace> = {
	'glass.ghost-visible': 'visible',
	'glass.ghost-hidden': 'bezel',
	'glass.ghost-under-seal': 'seal',
	'glass.ghost-idle': 'idle'
};

/** Tolerance for comparing bounds, in millimetres. */
const SLACK_mm = 1e-9;

export function ghostLeads(options: {
	finding: Finding;
	ghosts: readonly Ghost[];
	traces: readonly Trace[];
}): Trace[] {
	const { finding } = options;
	const place = PLACE_OF_CODE[finding.code];
	const at = finding.location;
	if (!place || !at) return [];
	const ids = new Set<string>();
	for (const g of options.ghosts) {
		if (g.where !== place) continue;
		const b = ringBounds(g.ring);
		if (
			b.minX >= at.x_mm - SLACK_mm &&
			b.minY >= at.y_mm - SLACK_mm &&
			b.maxX <= at.x_mm + at.width_mm + SLACK_mm &&
			b.maxY <= at.y_mm + at.height_mm + SLACK_mm
		)
			ids.add(g.conductor);
	}
	return options.traces.filter((t) => ids.has(t.id));
}
