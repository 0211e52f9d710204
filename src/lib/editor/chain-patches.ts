/**
 * Runs several core commands one after the other, each on the design the previous one produced,
 * and squashes their patches into one — for edits the core offers one item at a time.
 */
import type { Design } from '$lib/core/design/schema';
import { applyPatch, type Patch } from '$lib/core/commands/patch';
import { squashPatches } from '$lib/core/commands/patch-algebra';

export function chainPatches(design: Design, steps: readonly ((d: Design) => Patch)[]): Patch {
	const patches: Patch[] = [];
	let current = design;
	for (const step of steps) {
		const patch = step(current);
		patches.push(patch);
		current = applyPatch(current, patch);
	}
	return squashPatches(patches);
}
