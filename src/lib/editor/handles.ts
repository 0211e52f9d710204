/**
 * Handles around a selection's frame: eight for sizing (corners and edge midpoints) and one above
 * the top edge for turning. Positions are in document millimetres; their hit size is given in
 * screen pixels and converted with the current scale, so handles feel the same at any zoom.
 */
import type { Bounds } from '$lib/core/geometry/bounds';
import type { XY } from '$lib/core/geometry/vec';

export type SizeHandle = 'nw' | 'n' | 'ne' | 'e' | 'se' | 's' | 'sw' | 'w';
export const SIZE_HANDLES: readonly SizeHandle[] = ['nw', 'n', 'ne', 'e', 'se', 's', 'sw', 'w'];

/** Distance of the turn handle above the frame, in screen pixels. */
export const TURN_HANDLE_OFFSET_px = 22;
export const HANDLE_SIZE_px = 8;

export function sizeHandlePoint(b: Bounds, h: SizeHandle): XY {
	const cx = (b.minX + b.maxX) / 2;
	const cy = (b.minY + b.maxY) / 2;
	const x = h.includes('w') ? b.minX : h.includes('e') ? b.maxX : cx;
	const y = h.startsWith('n') ? b.minY : h.startsWith('s') ? b.maxY : cy;
	return { x, y };
}

/** The handle opposite `h`, which stays fixed while `h` is dragged. */
export function oppositeHandle(h: SizeHandle): SizeHandle {
	const swap: Record<string, string> = { n: 's', s: 'n', e: 'w', w: 'e' };
	return h
		.split('')
		.map((c) => swap[c])
		.join('') as SizeHandle;
}

export function turnHandlePoint(b: Bounds, scale_px_per_mm: number): XY {
	return { x: (b.minX + b.maxX) / 2, y: b.minY - TURN_HANDLE_OFFSET_px / scale_px_per_mm };
}

/** The sizing handle under `p`, if any, within the handle's hit size plus a little slack. */
export function sizeHandleAt(b: Bounds, p: XY, scale_px_per_mm: number): SizeHandle | null {
	const reach = (HANDLE_SIZE_px / 2 + 3) / scale_px_per_mm;
	for (const h of SIZE_HANDLES) {
		const q = sizeHandlePoint(b, h);
		if (Math.abs(q.x - p.x) <= reach && Math.abs(q.y - p.y) <= reach) return h;
	}
	return null;
}

export function isOnTurnHandle(b: Bounds, p: XY, scale_px_per_mm: number): boolean {
	const q = turnHandlePoint(b, scale_px_per_mm);
	return Math.hypot(q.x - p.x, q.y - p.y) <= (HANDLE_SIZE_px / 2 + 4) / scale_px_per_mm;
}

/**
 * Scale factors for dragging handle `h` to `p` with the opposite handle fixed; edge handles scale
 * one axis only; `uniform` keeps the aspect ratio (the larger factor wins). Factors never reach 0.
 */
export function scaleForHandle(options: {
	bounds: Bounds;
	handle: SizeHandle;
	to: XY;
	uniform: boolean;
}): { sx: number; sy: number; origin: XY } {
	const { bounds: b, handle: h, to } = options;
	const origin = sizeHandlePoint(b, oppositeHandle(h));
	const from = sizeHandlePoint(b, h);
	const min = 1e-3;
	const factor = (now: number, was: number) => {
		if (Math.abs(was) < 1e-12) return 1;
		const f = now / was;
		return Math.abs(f) < min ? (f < 0 ? -min : min) : f;
	};
	let sx = h === 'n' || h === 's' ? 1 : factor(to.x - origin.x, from.x - origin.x);
	let sy = h === 'e' || h === 'w' ? 1 : factor(to.y - origin.y, from.y - origin.y);
	if (options.uniform) {
		const k =
			h.length === 2
				? Math.max(Math.abs(sx), Math.abs(sy))
				: h === 'n' || h === 's'
					? Math.abs(sy)
					: Math.abs(sx);
		sx = Math.sign(sx) * k;
		sy = Math.sign(sy) * k;
	}
	return { sx, sy, origin };
}
