/**
 * Node edits on several points at once, composed from the core's one-point commands: each step
 * is applied to the design the previous one produced and the patches are squashed into one
 * (chain-patches.ts). The `…NodeKeys` edits take selection keys of both kinds: electrode points
 * (node-refs.ts) and trace points (trace-nodes.ts).
 */
import type { Design } from '$lib/core/design/schema';
import type { Patch } from '$lib/core/commands/patch';
import { movePoint } from '$lib/core/commands/move-point';
import { deletePoint } from '$lib/core/commands/delete-point';
import { togglePointSmooth } from '$lib/core/commands/toggle-point-smooth';
import { chainPatches as chain } from './chain-patches';
import { contoursOf, parseNodeKey, type NodeRef } from './node-refs';
import { deleteTraceNodes, moveTraceNodes, traceNodeRefs } from './trace-nodes';

/** Moves every referenced point by (dx, dy) from where it is in `design`. */
export function moveNodes(
	design: Design,
	args: { refs: readonly NodeRef[]; dx_mm: number; dy_mm: number }
): Patch {
	const byId = new Map(design.electrodes.map((e) => [e.id, e]));
	return chain(
		design,
		args.refs.flatMap((ref) => {
			const e = byId.get(ref.electrodeId);
			const p = e ? contoursOf(e)[ref.contour]?.[ref.index] : undefined;
			if (!p) return [];
			return [(d: Design) => movePoint(d, { ref, x_mm: p.x + args.dx_mm, y_mm: p.y + args.dy_mm })];
		})
	);
}

/** Deletes the referenced points, highest index first so earlier indices stay valid. */
export function deleteNodes(design: Design, args: { refs: readonly NodeRef[] }): Patch {
	const sorted = [...args.refs].sort((a, b) => b.index - a.index);
	return chain(
		design,
		sorted.map((ref) => (d: Design) => deletePoint(d, { ref }))
	);
}

export function toggleNodesSmooth(design: Design, args: { refs: readonly NodeRef[] }): Patch {
	return chain(
		design,
		args.refs.map((ref) => (d: Design) => togglePointSmooth(d, { ref }))
	);
}

/** Moves every selected node, electrode points and trace points alike, as one patch. */
export function moveNodeKeys(
	design: Design,
	args: { keys: Iterable<string>; dx_mm: number; dy_mm: number }
): Patch {
	const keys = [...args.keys];
	const refs = keys.map(parseNodeKey).filter((r): r is NodeRef => r !== null);
	const { dx_mm, dy_mm } = args;
	return chain(design, [
		(d) => moveNodes(d, { refs, dx_mm, dy_mm }),
		(d) => moveTraceNodes(d, { refs: traceNodeRefs(keys), dx_mm, dy_mm })
	]);
}

/** Deletes every selected node, electrode points and trace points alike, as one patch. */
export function deleteNodeKeys(design: Design, args: { keys: Iterable<string> }): Patch {
	const keys = [...args.keys];
	const refs = keys.map(parseNodeKey).filter((r): r is NodeRef => r !== null);
	return chain(design, [
		(d) => deleteNodes(d, { refs }),
		(d) => deleteTraceNodes(d, { refs: traceNodeRefs(keys) })
	]);
}
