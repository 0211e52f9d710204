/**
 * Adds a point on a trace's edge `edgeIndex` (from point edgeIndex to edgeIndex + 1) at parameter
 * t, 0 < t < 1; the trace keeps its course, so the new point can then be dragged to bend it.
 */
import type { Design } from '../design/schema';
import { requireThat } from './command-error';
import type { Patch } from './patch';
import { editTracePoints } from './trace-point-ref';

export function insertTracePoint(
	design: Design,
	args: { traceId: string; edgeIndex: number; t: number }
): Patch {
	requireThat(args.t > 0 && args.t < 1, 'expected t strictly between 0 and 1');
	return editTracePoints(design, args.traceId, (points) => {
		const i = args.edgeIndex;
		requireThat(
			Number.isInteger(i) && i >= 0 && i < points.length - 1,
			`no edge ${i} on this trace`
		);
		const [a, b] = [points[i], points[i + 1]];
		const added = { x: a.x + (b.x - a.x) * args.t, y: a.y + (b.y - a.y) * args.t };
		return [...points.slice(0, i + 1), added, ...points.slice(i + 1)];
	});
}
