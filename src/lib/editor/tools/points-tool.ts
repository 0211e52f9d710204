/**
 * Points: edit the points and Bezier handles of the selected electrodes. Click a point to select
 * it (shift adds), drag points or handles (alt breaks a smooth point's handles apart), drag on
 * empty glass to box-select points, double-click an edge to add a point there, double-click a
 * point to switch it between corner and smooth, Delete removes the selected points.
 *
 * While the glass drawing's traces are on show, their points are nodes too: click a trace to pick
 * it (all its points), drag its points, double-click it to add a point; Delete removes the picked
 * points, and a trace left with fewer than two points is removed whole.
 *
 * Idle ─down→ Pointing ─move→ MovingPoints | MovingHandle | Boxing ─up→ Idle; Escape bails.
 */
import type { XY } from '$lib/core/geometry/vec';
import type { Electrode } from '$lib/core/design/schema';
import { nearestPointOnContour } from '$lib/core/geometry/distance';
import { moveHandle } from '$lib/core/commands/move-handle';
import { insertPoint } from '$lib/core/commands/insert-point';
import {
	contoursOf,
	nodeKey,
	nodePosition,
	nodesWithVisibleHandles,
	nodeTargetAt,
	parseNodeKey,
	type NodeRef,
	type NodeTarget
} from '../node-refs';
import { deleteNodeKeys, moveNodeKeys, toggleNodesSmooth } from '../node-edits';
import { insertTracePoint } from '$lib/core/commands/insert-trace-point';
import {
	activeTraces,
	allTraceNodeKeys,
	traceEdgeAt,
	traceNodeAt,
	traceNodeKey,
	traceNodePosition,
	type TraceNodeRef
} from '../trace-nodes';
import { rectFromCorners } from '../overlay';
import {
	movedBeyondThreshold,
	type KeyInput,
	type PointerInput,
	type Tool,
	type ToolContext
} from './tool';

type State =
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

const REACH_px = 7;

export class PointsTool implements Tool {
	readonly id = 'points';
	#state: State = { name: 'idle' };

	get state() {
		return this.#state.name;
	}

	get cursor() {
		return this.#state.name === 'idle' ? 'default' : 'grabbing';
	}

	#editable(ctx: ToolContext): Electrode[] {
		return ctx.design.electrodes.filter((e) => ctx.selection.has(e.id));
	}

	pointer(ctx: ToolContext, input: PointerInput): void {
		if (input.type === 'down') return this.#down(ctx, input);
		const s = this.#state;
		if (input.type === 'move') {
			if (s.name === 'pointing' && movedBeyondThreshold(ctx, s.start, input.point))
				this.#startDrag(ctx, s);
			this.#drag(ctx, input);
			return;
		}
		const pressedKey =
			s.name !== 'pointing'
				? null
				: s.target?.part === 'point'
					? nodeKey(s.target)
					: s.trace
						? traceNodeKey(s.trace)
						: null;
		if (s.name === 'pointing' && pressedKey && s.shift && s.wasSelected) {
			const key = pressedKey;
			ctx.setNodeSelection([...ctx.nodeSelection].filter((k) => k !== key));
		} else if (s.name === 'pointing' && !s.target && !s.trace && !s.shift) {
			ctx.setNodeSelection([]);
		} else if (s.name === 'movingPoints' || s.name === 'movingHandle') {
			ctx.commit();
		} else if (s.name === 'boxing') {
			const rect = rectFromCorners(s.start, input.point);
			const inside: string[] = [];
			for (const e of this.#editable(ctx))
				contoursOf(e).forEach((c, ci) =>
					c.forEach((p, pi) => {
						if (p.x >= rect.minX && p.x <= rect.maxX && p.y >= rect.minY && p.y <= rect.maxY)
							inside.push(nodeKey({ electrodeId: e.id, contour: ci, index: pi }));
					})
				);
			for (const t of activeTraces(ctx.design, ctx.nodeSelection))
				t.points.forEach((p, index) => {
					if (p.x >= rect.minX && p.x <= rect.maxX && p.y >= rect.minY && p.y <= rect.maxY)
						inside.push(traceNodeKey({ traceId: t.id, index }));
				});
			ctx.setNodeSelection(s.shift ? [...ctx.nodeSelection, ...inside] : inside);
		}
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
	}

	#down(ctx: ToolContext, input: PointerInput) {
		if (input.button !== 0) return;
		const editable = this.#editable(ctx);
		const target = nodeTargetAt({
			electrodes: editable,
			at: input.point,
			reach_mm: REACH_px / ctx.scale_px_per_mm,
			showHandlesOf: nodesWithVisibleHandles(editable, ctx.nodeSelection)
		});
		if (target?.part === 'point' && input.clicks >= 2) {
			ctx.run('Corner/smooth point', (d) => toggleNodesSmooth(d, { refs: [target] }));
			return;
		}
		if (!target && input.clicks >= 2 && this.#insertOnEdge(ctx, editable, input.point)) return;
		const reach_mm = REACH_px / ctx.scale_px_per_mm;
		const traces = ctx.tracesEditable ? ctx.design.glassArt.traces : [];
		const trace = target ? null : traceNodeAt({ traces, at: input.point, reach_mm });
		if (!target && !trace && input.clicks >= 2 && this.#insertOnTrace(ctx, input.point)) return;
		let wasSelected = false;
		const pressed = target?.part === 'point' ? nodeKey(target) : trace ? traceNodeKey(trace) : null;
		if (pressed) {
			wasSelected = ctx.nodeSelection.has(pressed);
			if (!wasSelected)
				ctx.setNodeSelection(input.shift ? [...ctx.nodeSelection, pressed] : [pressed]);
		} else if (!target) {
			const hitId = ctx.hit(input.point);
			if (hitId && !ctx.selection.has(hitId)) {
				ctx.setSelection(input.shift ? [...ctx.selection, hitId] : [hitId]);
				ctx.setNodeSelection([]);
				return;
			}
			const body = hitId ? null : traceEdgeAt({ traces, at: input.point, reach_mm });
			if (body) {
				const whole = allTraceNodeKeys(traces.find((t) => t.id === body.traceId)!);
				ctx.setNodeSelection(input.shift ? [...ctx.nodeSelection, ...whole] : whole);
				return;
			}
		}
		this.#state = {
			name: 'pointing',
			start: input.point,
			target,
			trace,
			shift: input.shift,
			wasSelected
		};
	}

	#insertOnEdge(ctx: ToolContext, editable: readonly Electrode[], at: XY): boolean {
		const reach = REACH_px / ctx.scale_px_per_mm;
		for (const e of editable) {
			const contours = contoursOf(e);
			for (let ci = 0; ci < contours.length; ci++) {
				const hit = nearestPointOnContour(contours[ci], at);
				if (hit.distance_mm > reach || !(hit.t > 1e-6 && hit.t < 1 - 1e-6)) continue;
				const patch = ctx.run('Add point', (d) =>
					insertPoint(d, {
						ref: { electrodeId: e.id, contour: ci },
						edgeIndex: hit.edgeIndex,
						t: hit.t
					})
				);
				if (patch)
					ctx.setNodeSelection([
						nodeKey({ electrodeId: e.id, contour: ci, index: hit.edgeIndex + 1 })
					]);
				return true;
			}
		}
		return false;
	}

	/** A double click on a picked trace's body adds a point there and selects it. */
	#insertOnTrace(ctx: ToolContext, at: XY): boolean {
		const hit = traceEdgeAt({
			traces: activeTraces(ctx.design, ctx.nodeSelection),
			at,
			reach_mm: REACH_px / ctx.scale_px_per_mm
		});
		if (!hit || !(hit.t > 1e-6 && hit.t < 1 - 1e-6)) return false;
		if (ctx.run('Add trace point', (d) => insertTracePoint(d, hit)))
			ctx.setNodeSelection([traceNodeKey({ traceId: hit.traceId, index: hit.edgeIndex + 1 })]);
		return true;
	}

	#startDrag(ctx: ToolContext, s: Extract<State, { name: 'pointing' }>) {
		const t = s.target;
		if (!t && s.trace) {
			const anchor = traceNodePosition(ctx.design, s.trace);
			if (!anchor) return;
			this.#startMoving(ctx, s.start, anchor);
			return;
		}
		if (!t) {
			this.#state = { name: 'boxing', start: s.start, shift: s.shift };
			return;
		}
		const e = ctx.design.electrodes.find((x) => x.id === t.electrodeId);
		const at = e ? nodePosition(e, t) : null;
		if (!e || !at) return;
		if (t.part === 'point') {
			this.#startMoving(ctx, s.start, at);
		} else {
			const point = nodePosition(e, { ...t, part: 'point' })!;
			ctx.begin('Move handle');
			this.#state = { name: 'movingHandle', target: t, point, alt: false };
		}
	}

	/** Starts moving every selected node, electrode and trace points alike. */
	#startMoving(ctx: ToolContext, start: XY, anchor: XY) {
		const keys = [...ctx.nodeSelection];
		const refs = keys.map(parseNodeKey).filter((r): r is NodeRef => r !== null);
		ctx.begin(keys.length > 1 ? 'Move points' : 'Move point');
		this.#state = {
			name: 'movingPoints',
			start,
			anchor,
			keys,
			ignore: new Set(refs.map((r) => r.electrodeId))
		};
	}

	#drag(ctx: ToolContext, input: PointerInput) {
		const s = this.#state;
		if (s.name === 'movingPoints') {
			const raw = {
				x: s.anchor.x + input.point.x - s.start.x,
				y: s.anchor.y + input.point.y - s.start.y
			};
			const to = ctx.snap(raw, { from: s.anchor, angle: input.shift, ignore: s.ignore });
			const dx_mm = to.x - s.anchor.x;
			const dy_mm = to.y - s.anchor.y;
			ctx.preview((start) => moveNodeKeys(start, { keys: s.keys, dx_mm, dy_mm }));
			ctx.overlay({
				readout: { at: input.point, text: `${to.x.toFixed(3)}, ${to.y.toFixed(3)} mm` }
			});
		} else if (s.name === 'movingHandle') {
			const to = ctx.snap(input.point, {
				from: s.point,
				angle: input.shift,
				ignore: new Set([s.target.electrodeId])
			});
			const side = s.target.part === 'in' ? 'in' : 'out';
			ctx.preview((start) =>
				moveHandle(start, {
					ref: s.target,
					side,
					dx_mm: to.x - s.point.x,
					dy_mm: to.y - s.point.y,
					partner: input.alt ? 'free' : undefined
				})
			);
		} else if (s.name === 'boxing') {
			ctx.overlay({ marquee: rectFromCorners(s.start, input.point) });
		}
	}

	key(ctx: ToolContext, input: KeyInput): boolean {
		if ((input.key === 'Delete' || input.key === 'Backspace') && ctx.nodeSelection.size > 0) {
			const keys = [...ctx.nodeSelection];
			if (
				ctx.run(keys.length > 1 ? 'Delete points' : 'Delete point', (d) =>
					deleteNodeKeys(d, { keys })
				)
			)
				ctx.setNodeSelection([]);
			return true;
		}
		return false;
	}

	cancel(ctx: ToolContext): void {
		const s = this.#state.name;
		if (s === 'movingPoints' || s === 'movingHandle') ctx.cancelGesture();
		ctx.clearOverlay();
		this.#state = { name: 'idle' };
	}
}
