/** Deletes one point of a trace; its neighbours are then joined straight. A trace keeps 2 points. */
import type { Design } from '../design/schema';
import { requireThat } from './command-error';
import type { Patch } from './patch';
import { checkTracePointIndex, editTracePoints, type TracePointRef } from './trace-point-ref';

export function deleteTracePoint(design: Design, args: { ref: TracePointRef }): Patch {
	return editTracePoints(design, args.ref.traceId, (points) => {
		checkTracePointIndex(points, args.ref.index);
		requireThat(points.length > 2, 'a trace keeps at least 2 points; delete the trace instead');
		return points.filter((_, i) => i !== args.ref.index);
	});
}
