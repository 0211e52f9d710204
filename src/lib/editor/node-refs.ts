/**
 * Addressing points and Bezier handles inside electrodes for node editing: contour 0 is the
 * outline, 1… are holes. Hit-testing prefers handles (they sit on top) and then points, within a
 * reach given in millimetres.
 */
import type { Contour, Electrode } from '$lib/core/design/schema';
import type { XY } from '$lib/core/geometry/vec';

export interface NodeRef {
	electrodeId: string;
	/** 0 = outline, 1 + h = holes[h] (as the core's PointRef). */
	contour: number;
	index: number;
}

export interface NodeTarget extends NodeRef {
	/** 'point' for the node itself, or which of its handles. */
	part: 'point' | 'in' | 'out';
}

export const nodeKey = (n: NodeRef) => `${n.electrodeId}/${n.contour}/${n.index}`;

export function parseNodeKey(key: string): NodeRef | null {
	const m = /^(.+)\/(\d+)\/(\d+)$/.exec(key);
	return m ? { electrodeId: m[1], contour: Number(m[2]), index: Number(m[3]) } : null;
}

export const contoursOf = (e: Electrode): Contour[] => [e.outline, ...e.holes];

export function nodePosition(e: Electrode, t: NodeTarget): XY | null {
	const p = contoursOf(e)[t.contour]?.[t.index];
	if (!p) return null;
	if (t.part === 'point') return { x: p.x, y: p.y };
	const h = p[t.part];
	return h ? { x: p.x + h[0], y: p.y + h[1] } : null;
}

/** Handles are shown only for selected nodes and their neighbours; points always. */
export function nodeTargetAt(options: {
	electrodes: readonly Electrode[];
	at: XY;
	reach_mm: number;
	showHandlesOf: ReadonlySet<string>;
}): NodeTarget | null {
	let best: NodeTarget | null = null;
	let bestDistance = options.reach_mm;
	const consider = (t: NodeTarget, q: XY | null, bias: number) => {
		if (!q) return;
		const d = Math.hypot(q.x - options.at.x, q.y - options.at.y) - bias;
		if (d <= bestDistance) [best, bestDistance] = [t, d];
	};
	for (const e of options.electrodes) {
		contoursOf(e).forEach((contour, ci) => {
			contour.forEach((p, pi) => {
				const ref = { electrodeId: e.id, contour: ci, index: pi };
				if (options.showHandlesOf.has(nodeKey(ref))) {
					for (const part of ['in', 'out'] as const)
						consider({ ...ref, part }, nodePosition(e, { ...ref, part }), 1e-9);
				}
				consider({ ...ref, part: 'point' }, { x: p.x, y: p.y }, 0);
			});
		});
	}
	return best;
}

/** Keys of the selected nodes plus their neighbours along the contour (whose handles shape the same edges). */
export function nodesWithVisibleHandles(
	electrodes: readonly Electrode[],
	selected: ReadonlySet<string>
): Set<string> {
	const out = new Set<string>();
	for (const key of selected) {
		const ref = parseNodeKey(key);
		if (!ref) continue;
		const e = electrodes.find((x) => x.id === ref.electrodeId);
		const contour = e ? contoursOf(e)[ref.contour] : undefined;
		if (!contour) continue;
		const n = contour.length;
		for (const k of [ref.index - 1, ref.index, ref.index + 1])
			out.add(nodeKey({ ...ref, index: ((k % n) + n) % n }));
	}
	return out;
}
