/**
 * Points: edit the points and Bezier handles of the selected electrodes. Click a point to select
 * it (shift adds), drag points or handles (alt breaks a smooth point's handles apart), drag on
 * empty glass to box-select points, double-click an edge to add a point there, double-click a
 * point to switch it between corner and smooth, Delete removes the selected points.
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
import { deleteNodes, moveNodes, toggleNodesSmooth } from '../node-edits';
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
	| { name: 'pointing'; start: XY; target: NodeTarget | null; shift: boolean; wasSelected: boolean }
	| { name: 'movingPoints'; start: XY; anchor: XY; refs: NodeRef[]; ignore: ReadonlySet<string> }
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
		if (s.name === 'pointing' && s.target?.part === 'point' && s.shift && s.wasSelected) {
			const key = nodeKey(s.target);
			ctx.setNodeSelection([...ctx.nodeSelection].filter((k) => k !== key));
		} else if (s.name === 'pointing' && !s.target && !s.shift) {
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
		let wasSelected = false;
		if (target?.part === 'point') {
			const key = nodeKey(target);
			wasSelected = ctx.nodeSelection.has(key);
			if (!wasSelected) ctx.setNodeSelection(input.shift ? [...ctx.nodeSelection, key] : [key]);
		} else if (!target) {
			const hitId = ctx.hit(input.point);
			if (hitId && !ctx.selection.has(hitId)) {
				ctx.setSelection(input.shift ? [...ctx.selection, hitId] : [hitId]);
				ctx.setNodeSelection([]);
				return;
			}
		}
		this.#state = { name: 'pointing', start: input.point, target, shift: input.shift, wasSelected };
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

	#startDrag(ctx: ToolContext, s: Extract<State, { name: 'pointing' }>) {
		const t = s.target;
		if (!t) {
			this.#state = { name: 'boxing', start: s.start, shift: s.shift };
			return;
		}
		const e = ctx.design.electrodes.find((x) => x.id === t.electrodeId);
		const at = e ? nodePosition(e, t) : null;
		if (!e || !at) return;
		if (t.part === 'point') {
			const refs = [...ctx.nodeSelection].map(parseNodeKey).filter((r): r is NodeRef => r !== null);
			ctx.begin(refs.length > 1 ? 'Move points' : 'Move point');
			this.#state = {
				name: 'movingPoints',
				start: s.start,
				anchor: at,
				refs,
				ignore: new Set(refs.map((r) => r.electrodeId))
			};
		} else {
			const point = nodePosition(e, { ...t, part: 'point' })!;
			ctx.begin('Move handle');
			this.#state = { name: 'movingHandle', target: t, point, alt: false };
		}
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
			ctx.preview((start) => moveNodes(start, { refs: s.refs, dx_mm, dy_mm }));
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
			const refs = [...ctx.nodeSelection].map(parseNodeKey).filter((r): r is NodeRef => r !== null);
			if (
				ctx.run(refs.length > 1 ? 'Delete points' : 'Delete point', (d) => deleteNodes(d, { refs }))
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
