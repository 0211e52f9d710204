/**
 * Trace points as nodes of the points tool: addressing (keys `~<trace id>/<index>`, which no
 * electrode node key can equal — ids never contain `~` or `/`), hit-testing points and trace
 * bodies within a reach in millimetres, the traces being edited (those with a selected point), and
 * multi-point edits composed from the core's one-point trace commands.
 */
import type { Trace } from '$lib/core/design/glass-art-schema';
import type { Design } from '$lib/core/design/schema';
import type { Patch } from '$lib/core/commands/patch';
import type { XY } from '$lib/core/geometry/vec';
import { nearestOnSegment } from '$lib/core/geometry/distance';
import { moveTracePoint } from '$lib/core/commands/move-trace-point';
import { deleteTracePoint } from '$lib/core/commands/delete-trace-point';
import { deleteTraces } from '$lib/core/commands/delete-traces';
import { chainPatches } from './chain-patches';

export interface TraceNodeRef {
	traceId: string;
	index: number;
}

export const traceNodeKey = (r: TraceNodeRef) => `~${r.traceId}/${r.index}`;

export function parseTraceNodeKey(key: string): TraceNodeRef | null {
	const m = /^~([^/]+)\/(\d+)$/.exec(key);
	return m ? { traceId: m[1], index: Number(m[2]) } : null;
}

export const traceNodeRefs = (keys: Iterable<string>): TraceNodeRef[] =>
	[...keys].map(parseTraceNodeKey).filter((r): r is TraceNodeRef => r !== null);

/** Keys of every point of a trace: picking a trace selects all of it. */
export const allTraceNodeKeys = (t: Trace): string[] =>
	t.points.map((_, index) => traceNodeKey({ traceId: t.id, index }));

/** Traces with at least one selected point, in drawing order. */
export function activeTraces(design: Design, selected: ReadonlySet<string>): Trace[] {
	const ids = new Set(traceNodeRefs(selected).map((r) => r.traceId));
	return ids.size === 0 ? [] : design.glassArt.traces.filter((t) => ids.has(t.id));
}

export function traceNodePosition(design: Design, ref: TraceNodeRef): XY | null {
	const p = design.glassArt.traces.find((t) => t.id === ref.traceId)?.points[ref.index];
	return p ? { x: p.x, y: p.y } : null;
}

/** The trace point nearest `at` within `reach_mm`; the last-drawn trace wins a tie. */
export function traceNodeAt(options: {
	traces: readonly Trace[];
	at: XY;
	reach_mm: number;
}): TraceNodeRef | null {
	let best: TraceNodeRef | null = null;
	let bestDistance = options.reach_mm;
	for (const t of options.traces)
		t.points.forEach((p, index) => {
			const d = Math.hypot(p.x - options.at.x, p.y - options.at.y);
			if (d <= bestDistance) [best, bestDistance] = [{ traceId: t.id, index }, d];
		});
	return best;
}

/** The trace whose drawn body (centre line ± half its width) passes within `reach_mm` of `at`. */
export function traceEdgeAt(options: {
	traces: readonly Trace[];
	at: XY;
	reach_mm: number;
}): { traceId: string; edgeIndex: number; t: number } | null {
	let best: { traceId: string; edgeIndex: number; t: number } | null = null;
	let bestDistance = Infinity;
	for (const trace of options.traces)
		for (let i = 0; i + 1 < trace.points.length; i++) {
			const hit = nearestOnSegment(options.at, { a: trace.points[i], b: trace.points[i + 1] });
			const d = hit.distance - trace.width_mm / 2;
			if (d <= options.reach_mm && d <= bestDistance) {
				bestDistance = d;
				best = { traceId: trace.id, edgeIndex: i, t: hit.t };
			}
		}
	return best;
}

/** Moves every referenced trace point by (dx, dy) from where it is in `design`. */
export function moveTraceNodes(
	design: Design,
	args: { refs: readonly TraceNodeRef[]; dx_mm: number; dy_mm: number }
): Patch {
	return chainPatches(
		design,
		args.refs.flatMap((ref) => {
			const p = traceNodePosition(design, ref);
			if (!p) return [];
			return [
				(d: Design) => moveTracePoint(d, { ref, x_mm: p.x + args.dx_mm, y_mm: p.y + args.dy_mm })
			];
		})
	);
}

/**
 * Deletes the referenced trace points, highest index first; a trace that would keep fewer than
 * two points is deleted whole.
 */
export function deleteTraceNodes(design: Design, args: { refs: readonly TraceNodeRef[] }): Patch {
	const byTrace = new Map<string, Set<number>>();
	for (const r of args.refs)
		byTrace.set(r.traceId, (byTrace.get(r.traceId) ?? new Set()).add(r.index));
	const whole: string[] = [];
	const steps: ((d: Design) => Patch)[] = [];
	for (const trace of design.glassArt.traces) {
		const indices = byTrace.get(trace.id);
		if (!indices) continue;
		const present = [...indices].filter((i) => i < trace.points.length).sort((a, b) => b - a);
		if (trace.points.length - present.length < 2) whole.push(trace.id);
		else
			for (const index of present)
				steps.push((d) => deleteTracePoint(d, { ref: { traceId: trace.id, index } }));
	}
	if (whole.length > 0) steps.push((d) => deleteTraces(d, { ids: whole }));
	return chainPatches(design, steps);
}
