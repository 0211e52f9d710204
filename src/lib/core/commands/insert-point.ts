/**
 * Adds a point on an edge at Bezier parameter t without changing the shape: a straight edge gets a
 * plain point, a curved edge is split by de Casteljau's construction and the handles of both ends
 * and of the new point are set from the two halves.
 */
import type { Design, Point } from '../design/schema';
import { splitCubic } from '../geometry/bezier';
import { edgeCubic, isStraightEdgeAt } from '../geometry/contour-edges';
import { requireThat } from './command-error';
import type { Patch } from './patch';
import { checkPointIndex, cleanPoint, editContour, type ContourRef } from './point-ref';

export function insertPoint(
	design: Design,
	args: { ref: ContourRef; edgeIndex: number; t: number }
): Patch {
	requireThat(args.t > 0 && args.t < 1, 'expected t strictly between 0 and 1');
	return editContour(design, args.ref, (contour) => {
		checkPointIndex(contour, args.edgeIndex);
		const i = args.edgeIndex;
		const j = (i + 1) % contour.length;
		const from = contour[i];
		const to = contour[j];
		let added: Point;
		let newFrom = from;
		let newTo = to;
		if (isStraightEdgeAt(contour, i)) {
			added = { x: from.x + (to.x - from.x) * args.t, y: from.y + (to.y - from.y) * args.t };
		} else {
			const [left, right] = splitCubic(edgeCubic(contour, i), args.t);
			const [mx, my] = [left[6], left[7]];
			added = cleanPoint({
				x: mx,
				y: my,
				in: [left[4] - mx, left[5] - my],
				out: [right[2] - mx, right[3] - my]
			});
			newFrom = cleanPoint({ ...from, out: [left[2] - from.x, left[3] - from.y] });
			newTo = cleanPoint({ ...to, in: [right[4] - to.x, right[5] - to.y] });
		}
		const next = contour.slice();
		next[i] = newFrom;
		next[j] = newTo;
		next.splice(i + 1, 0, added);
		return next;
	});
}
