/**
 * Bad leads of the glass drawing: a trace whose points are not numbers or fewer than two, one of
 * no length, one on a net that is neither a common nor a segment line of its plate, and one that
 * runs past its glass — the whole glass for the segment plate, the back glass (the glass less the
 * contact ledge) for the common plate — or lies entirely off it, with nothing under it.
 *
 * Which traces the plates are built from: only those whose conductor stays within one glass size
 * of the glass's edge (`DRAW_REACH` × the longer side). A trace beyond that cannot be made and is
 * left out of the artwork, so every polygon, ghost and export kernel works on glass-sized numbers
 * whatever the file holds (a point at 1e300 mm would otherwise overflow the integer clipping grid
 * and turn every area into rounding noise). Nearer traces are drawn as they are and reported.
 *
 * Units: millimetres, glass coordinates (x right, y down, origin top-left).
 */
import type { Trace } from '../design/glass-art-schema';
import type { Design, Rect } from '../design/schema';
import type { GlassLayout } from './layout';

/** How far beyond the glass, in glass sizes (its longer side), a trace is still drawn. */
export const DRAW_REACH = 1;

export type TraceFaultKind =
	'not-a-number' | 'too-few-points' | 'no-length' | 'no-net' | 'off-glass';

export interface TraceFault {
	trace: Trace;
	/** Place of the trace in `glassArt.traces`. */
	index: number;
	fault: TraceFaultKind;
	/** For `off-glass`: no part of the trace lies over its glass. */
	entirely?: boolean;
	/** For `off-glass`: the trace is too far out to be drawn at all. */
	undrawn?: boolean;
}

const finitePoints = (t: Trace) =>
	Number.isFinite(t.width_mm) &&
	t.width_mm > 0 &&
	t.points.every((p) => Number.isFinite(p.x) && Number.isFinite(p.y));

/** The conductor's bounds: the points' box grown by half the width (square ends). */
export function traceBox(t: Trace): Rect {
	const xs = t.points.map((p) => p.x),
		ys = t.points.map((p) => p.y);
	const h = t.width_mm / 2;
	const x0 = Math.min(...xs) - h,
		y0 = Math.min(...ys) - h;
	return {
		x_mm: x0,
		y_mm: y0,
		width_mm: Math.max(...xs) + h - x0,
		height_mm: Math.max(...ys) + h - y0
	};
}

const within = (inner: Rect, outer: Rect) =>
	inner.x_mm >= outer.x_mm &&
	inner.y_mm >= outer.y_mm &&
	inner.x_mm + inner.width_mm <= outer.x_mm + outer.width_mm &&
	inner.y_mm + inner.height_mm <= outer.y_mm + outer.height_mm;

const meets = (a: Rect, b: Rect) =>
	a.x_mm < b.x_mm + b.width_mm &&
	b.x_mm < a.x_mm + a.width_mm &&
	a.y_mm < b.y_mm + b.height_mm &&
	b.y_mm < a.y_mm + a.height_mm;

function drawLimit(glass: Rect): Rect {
	const r = DRAW_REACH * Math.max(glass.width_mm, glass.height_mm);
	return {
		x_mm: glass.x_mm - r,
		y_mm: glass.y_mm - r,
		width_mm: glass.width_mm + 2 * r,
		height_mm: glass.height_mm + 2 * r
	};
}

/** Whether the plates may draw this trace: numbers only, two points or more, near the glass. */
export function traceDrawable(trace: Trace, glass: Rect): boolean {
	return (
		finitePoints(trace) && trace.points.length >= 2 && within(traceBox(trace), drawLimit(glass))
	);
}

function length_mm(t: Trace): number {
	let sum = 0;
	for (let i = 1; i < t.points.length; i++)
		sum += Math.hypot(t.points[i].x - t.points[i - 1].x, t.points[i].y - t.points[i - 1].y);
	return sum;
}

export function traceFaults(design: Design, layout: GlassLayout): TraceFault[] {
	const commons = new Set(design.commons.map((c) => c.id));
	const lines = new Set(design.segmentLines.map((l) => l.id));
	const faults: TraceFault[] = [];
	design.glassArt.traces.forEach((trace, index) => {
		if (!finitePoints(trace)) return void faults.push({ trace, index, fault: 'not-a-number' });
		if (trace.points.length < 2) return void faults.push({ trace, index, fault: 'too-few-points' });
		if (!(length_mm(trace) > 0)) faults.push({ trace, index, fault: 'no-length' });
		const known = commons.has(trace.net) || (trace.plate === 'segment' && lines.has(trace.net));
		if (!known) faults.push({ trace, index, fault: 'no-net' });
		const under = trace.plate === 'segment' ? layout.glass : layout.backGlass;
		const box = traceBox(trace);
		if (!within(box, under))
			faults.push({
				trace,
				index,
				fault: 'off-glass',
				entirely: !meets(box, under),
				undrawn: !traceDrawable(trace, layout.glass)
			});
	});
	return faults;
}
