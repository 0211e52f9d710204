/**
 * Deletes one point of a contour; its neighbours keep their handles, so the new edge between them
 * is drawn from those. A contour keeps at least 3 points.
 */
import type { Design } from '../design/schema';
import { requireThat } from './command-error';
import type { Patch } from './patch';
import { checkPointIndex, editContour, type PointRef } from './point-ref';

export function deletePoint(design: Design, args: { ref: PointRef }): Patch {
	return editContour(design, args.ref, (contour) => {
		checkPointIndex(contour, args.ref.index);
		requireThat(contour.length > 3, 'a contour keeps at least 3 points');
		return contour.filter((_, i) => i !== args.ref.index);
	});
}
