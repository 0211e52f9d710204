/**
 * Sets one Bezier handle of a point to the vector (dx, dy) mm relative to the point; a zero vector
 * removes the handle. The opposite handle follows `partner`: 'free' leaves it, 'aligned' keeps its
 * length but points it the opposite way, 'mirrored' makes it the exact opposite. By default a
 * smooth point stays smooth ('aligned') and a corner stays free.
 */
import type { Design, Point } from '../design/schema';
import { requireThat } from './command-error';
import type { Patch } from './patch';
import {
	checkPointIndex,
	cleanPoint,
	editContour,
	isSmoothPoint,
	type PointRef
} from './point-ref';

export type HandlePartner = 'free' | 'aligned' | 'mirrored';

export function moveHandle(
	design: Design,
	args: { ref: PointRef; side: 'in' | 'out'; dx_mm: number; dy_mm: number; partner?: HandlePartner }
): Patch {
	requireThat(
		Number.isFinite(args.dx_mm) && Number.isFinite(args.dy_mm),
		'expected a finite handle vector'
	);
	return editContour(design, args.ref, (contour) => {
		checkPointIndex(contour, args.ref.index);
		return contour.map((p, i) => (i === args.ref.index ? withHandle(p, args) : p));
	});
}

function withHandle(
	p: Point,
	args: { side: 'in' | 'out'; dx_mm: number; dy_mm: number; partner?: HandlePartner }
): Point {
	const partner = args.partner ?? (isSmoothPoint(p) ? 'aligned' : 'free');
	const other = args.side === 'in' ? 'out' : 'in';
	const next: Point = { ...p, [args.side]: [args.dx_mm, args.dy_mm] };
	const length = Math.hypot(args.dx_mm, args.dy_mm);
	if (length > 0 && partner === 'mirrored') next[other] = [-args.dx_mm, -args.dy_mm];
	if (length > 0 && partner === 'aligned' && p[other]) {
		const keep = Math.hypot(...p[other]!);
		next[other] = [(-args.dx_mm / length) * keep, (-args.dy_mm / length) * keep];
	}
	return cleanPoint(next);
}
