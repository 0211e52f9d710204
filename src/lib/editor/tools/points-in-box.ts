/**
 * Box selection of the points tool: the keys of the points of the selected electrodes and of the
 * picked traces that lie inside a rectangle.
 */
import type { Bounds } from '$lib/core/geometry/bounds';
import type { Electrode } from '$lib/core/design/schema';
import type { XY } from '$lib/core/geometry/vec';
import { contoursOf, nodeKey } from '../node-refs';
import { activeTraces, traceNodeKey } from '../trace-nodes';
import type { ToolContext } from './tool';

export function pointsInBox(
	ctx: ToolContext,
	options: { rect: Bounds; electrodes: readonly Electrode[] }
): string[] {
	const { rect } = options;
	const within = (p: XY) =>
		p.x >= rect.minX && p.x <= rect.maxX && p.y >= rect.minY && p.y <= rect.maxY;
	const inside: string[] = [];
	for (const e of options.electrodes)
		contoursOf(e).forEach((c, ci) =>
			c.forEach((p, pi) => {
				if (within(p)) inside.push(nodeKey({ electrodeId: e.id, contour: ci, index: pi }));
			})
		);
	for (const t of activeTraces(ctx.design, ctx.nodeSelection))
		t.points.forEach((p, index) => {
			if (within(p)) inside.push(traceNodeKey({ traceId: t.id, index }));
		});
	return inside;
}
