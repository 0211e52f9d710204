/**
 * The points tool's states: Idle ─down→ Pointing ─move→ MovingPoints | MovingHandle | Boxing
 * ─up→ Idle; Escape bails. Pointing remembers what the press landed on.
 */
import type { XY } from '$lib/core/geometry/vec';
import type { NodeTarget } from '../node-refs';
import type { TraceNodeRef } from '../trace-nodes';

export type PointsState =
	| { name: 'idle' }
	| {
			name: 'pointing';
			start: XY;
			target: NodeTarget | null;
			/** A trace point under the press, when no electrode node was. */
			trace: TraceNodeRef | null;
			shift: boolean;
			wasSelected: boolean;
	  }
	| { name: 'movingPoints'; start: XY; anchor: XY; keys: string[]; ignore: ReadonlySet<string> }
	| { name: 'movingHandle'; target: NodeTarget; point: XY; alt: boolean }
	| { name: 'boxing'; start: XY; shift: boolean };

export type PointingState = Extract<PointsState, { name: 'pointing' }>;

/** How near, in screen pixels, a press must land to grab a point, handle or edge. */
export const REACH_px = 7;
