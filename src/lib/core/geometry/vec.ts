/**
 * Plane vectors in glass coordinates (millimetres, x to the right, y downwards). Small pure helpers
 * shared by the geometry kernels; a "left" normal is the direction turned by −90° on screen.
 */
export interface XY {
	readonly x: number;
	readonly y: number;
}

export const xy = (x: number, y: number): XY => ({ x, y });
export const add = (a: XY, b: XY): XY => ({ x: a.x + b.x, y: a.y + b.y });
export const sub = (a: XY, b: XY): XY => ({ x: a.x - b.x, y: a.y - b.y });
export const scale = (a: XY, k: number): XY => ({ x: a.x * k, y: a.y * k });
export const dot = (a: XY, b: XY): number => a.x * b.x + a.y * b.y;
export const cross = (a: XY, b: XY): number => a.x * b.y - a.y * b.x;
export const length = (a: XY): number => Math.hypot(a.x, a.y);
export const distance = (a: XY, b: XY): number => Math.hypot(a.x - b.x, a.y - b.y);

export function normalize(a: XY): XY {
	const n = Math.hypot(a.x, a.y);
	if (n === 0) throw new RangeError('cannot normalise a zero vector');
	return { x: a.x / n, y: a.y / n };
}

/** The unit normal of a direction, turned a quarter turn: (−y, x). */
export const perpendicular = (a: XY): XY => ({ x: -a.y, y: a.x });

/** a + (b − a)·t */
export const lerp = (a: XY, b: XY, t: number): XY => ({
	x: a.x + (b.x - a.x) * t,
	y: a.y + (b.y - a.y) * t
});

export const degToRad = (deg: number): number => (deg * Math.PI) / 180;
export const radToDeg = (rad: number): number => (rad * 180) / Math.PI;
