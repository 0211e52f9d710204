/** Moves one point of a contour to (x, y) mm; its handles, being relative, travel with it. */
import type { Design } from '../design/schema';
import { requireThat } from './command-error';
import type { Patch } from './patch';
import { checkPointIndex, editContour, type PointRef } from './point-ref';

export function movePoint(
	design: Design,
	args: { ref: PointRef; x_mm: number; y_mm: number }
): Patch {
	requireThat(
		Number.isFinite(args.x_mm) && Number.isFinite(args.y_mm),
		'expected finite coordinates'
	);
	return editContour(design, args.ref, (contour) => {
		checkPointIndex(contour, args.ref.index);
		return contour.map((p, i) => (i === args.ref.index ? { ...p, x: args.x_mm, y: args.y_mm } : p));
	});
}
