/**
 * Turns a list of bars between named joints of a frame into segment outlines: for each bar end it
 * gathers the other bars ending at the same joint (and, for a stem, the bar it meets side-on) and
 * lets segment-bar.ts cut the ends by style.
 */
import type { Contour } from '../design/schema';
import { cross, dot, normalize, perpendicular, scale, sub, add, type XY } from '../geometry/vec';
import { barContour } from './segment-bar';
import type { BarEndContext } from './segment-ends';
import type { JointName, SegmentFrame } from './segment-frame';

export interface BarDef {
	readonly key: string;
	readonly from: JointName;
	readonly to: JointName;
	/** This end meets the side of the named bar (which runs through the joint). */
	readonly stemFrom?: string;
	readonly stemTo?: string;
}

const isVertical = (bar: BarDef) => bar.from[0] === bar.to[0];

function directionFrom(frame: SegmentFrame, bar: BarDef, joint: JointName): XY {
	const other = bar.from === joint ? bar.to : bar.from;
	return normalize(sub(frame.joint(other), frame.joint(joint)));
}

function endContext(
	frame: SegmentFrame,
	bars: readonly BarDef[],
	bar: BarDef,
	end: 'from' | 'to'
): BarEndContext {
	const jointName = bar[end];
	const joint = frame.joint(jointName);
	const u = directionFrom(frame, bar, jointName);
	const stemKey = end === 'from' ? bar.stemFrom : bar.stemTo;
	const atJoint = bars.filter(
		(b) =>
			(b.from === jointName && b.stemFrom === undefined) ||
			(b.to === jointName && b.stemTo === undefined)
	);
	const dirs = atJoint.map((b) => ({ bar: b, u: directionFrom(frame, b, jointName) }));
	const neighbours = dirs
		.filter((d) => d.bar !== bar)
		.map((d) => ({
			u: d.u,
			vertical: isVertical(d.bar),
			hasPartner: dirs.some(
				(o) => o.bar !== d.bar && Math.abs(cross(o.u, d.u)) < 1e-9 && dot(o.u, d.u) < 0
			)
		}));
	let stem: BarEndContext['stem'];
	if (stemKey) {
		const through = bars.find((b) => b.key === stemKey)!;
		const edgeDir = normalize(sub(frame.joint(through.to), frame.joint(through.from)));
		let normal = perpendicular(edgeDir);
		if (dot(normal, u) < 0) normal = scale(normal, -1);
		stem = {
			edgePoint: add(frame.joint(through.from), scale(normal, frame.half)),
			edgeDir,
			normal
		};
	}
	return {
		joint,
		u,
		half: frame.half,
		gap: frame.gap,
		vertical: isVertical(bar),
		crossAxis: isVertical(bar) ? frame.across : frame.down,
		neighbours,
		stem
	};
}

export function layoutBars(frame: SegmentFrame, bars: readonly BarDef[]): Record<string, Contour> {
	const result: Record<string, Contour> = {};
	for (const bar of bars) {
		result[bar.key] = barContour({
			key: bar.key,
			style: frame.params.style,
			from: endContext(frame, bars, bar, 'from'),
			to: endContext(frame, bars, bar, 'to')
		});
	}
	return result;
}
