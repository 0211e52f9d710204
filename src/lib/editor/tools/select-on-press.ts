/**
 * Shared behaviour of the transform tools: pressing on an electrode outside the selection selects
 * it (shift adds), pressing on empty glass clears the selection. Returns true when the press was
 * used up that way.
 */
import type { PointerInput, ToolContext } from './tool';

export function selectOnPress(ctx: ToolContext, input: PointerInput): boolean {
	const hitId = ctx.hit(input.point);
	if (hitId && ctx.selection.has(hitId)) return false;
	if (hitId) ctx.setSelection(input.shift ? [...ctx.selection, hitId] : [hitId]);
	else if (!input.shift) ctx.setSelection([]);
	return true;
}
