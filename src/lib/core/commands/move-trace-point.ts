/** Moves one point of a trace to (x, y) mm. */
import type { Design } from '../design/schema';
import { requireThat } from './command-error';
import type { Patch } from './patch';
import { checkTracePointIndex, editTracePoints, type TracePointRef } from './trace-point-ref';

export function moveTracePoint(
	design: Design,
	args: { ref: TracePointRef; x_mm: number; y_mm: number }
): Patch {
	requireThat(
		Number.isFinite(args.x_mm) && Number.isFinite(args.y_mm),
		'expected finite coordinates'
	);
	return editTracePoints(design, args.ref.traceId, (points) => {
		checkTracePointIndex(points, args.ref.index);
		return points.map((p, i) => (i === args.ref.index ? { x: args.x_mm, y: args.y_mm } : p));
	});
}
