/**
 * Toggles a point between smooth and corner. Smooth → corner removes both handles. Corner →
 * smooth gives it collinear handles along the direction from the previous to the next point,
 * each a third of the distance to its neighbour (or keeping an existing handle's length).
 */
import type { Design, Point } from '../design/schema';
import type { Patch } from './patch';
import { checkPointIndex, editContour, isSmoothPoint, type PointRef } from './point-ref';

function smoothed(prev: Point, p: Point, next: Point): Point {
	let dx = next.x - prev.x;
	let dy = next.y - prev.y;
	const len = Math.hypot(dx, dy) || 1;
	[dx, dy] = [dx / len, dy / len];
	const lin = p.in ? Math.hypot(...p.in) : Math.hypot(p.x - prev.x, p.y - prev.y) / 3;
	const lout = p.out ? Math.hypot(...p.out) : Math.hypot(next.x - p.x, next.y - p.y) / 3;
	return { x: p.x, y: p.y, in: [-dx * lin, -dy * lin], out: [dx * lout, dy * lout] };
}

export function togglePointSmooth(design: Design, args: { ref: PointRef }): Patch {
	return editContour(design, args.ref, (contour) => {
		checkPointIndex(contour, args.ref.index);
		const n = contour.length;
		const i = args.ref.index;
		const p = contour[i];
		const next = isSmoothPoint(p)
			? { x: p.x, y: p.y }
			: smoothed(contour[(i + n - 1) % n], p, contour[(i + 1) % n]);
		return contour.map((q, k) => (k === i ? next : q));
	});
}
