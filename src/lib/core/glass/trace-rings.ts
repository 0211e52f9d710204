/** The conductor of a trace: one square-ended rectangle per straight run (filled non-zero). */
import type { Trace } from '../design/glass-art-schema';
import { leadRing } from './rings';

export function traceRings(trace: Trace): Float64Array[] {
	const rings: Float64Array[] = [];
	for (let i = 1; i < trace.points.length; i++)
		rings.push(leadRing({ a: trace.points[i - 1], b: trace.points[i], width_mm: trace.width_mm }));
	return rings;
}
