/**
 * Draws contours onto a minimal path sink, so one outline walk feeds SVG strings, canvas paths
 * (CanvasRenderingContext2D and Path2D satisfy this interface), DXF writers or a test recorder.
 * Straight edges become lineTo, edges with a handle at either end become bezierCurveTo.
 */
import type { Contour } from '../design/schema';
import { isStraightEdge } from './contour-edges';
import { shapeContours, type Shape } from './shape';

export interface PathSink {
	moveTo(x: number, y: number): void;
	lineTo(x: number, y: number): void;
	bezierCurveTo(c1x: number, c1y: number, c2x: number, c2y: number, x: number, y: number): void;
	closePath(): void;
}

export function drawContour(contour: Contour, sink: PathSink): void {
	if (contour.length === 0) return;
	sink.moveTo(contour[0].x, contour[0].y);
	for (let i = 1; i <= contour.length; i++) {
		const from = contour[i - 1];
		const to = contour[i % contour.length];
		if (isStraightEdge(from, to)) {
			if (i < contour.length) sink.lineTo(to.x, to.y);
		} else {
			sink.bezierCurveTo(
				from.x + (from.out?.[0] ?? 0),
				from.y + (from.out?.[1] ?? 0),
				to.x + (to.in?.[0] ?? 0),
				to.y + (to.in?.[1] ?? 0),
				to.x,
				to.y
			);
		}
	}
	sink.closePath();
}

/** Outline and holes as one path; fill it with the even-odd rule. */
export function drawShape(shape: Shape, sink: PathSink): void {
	for (const contour of shapeContours(shape)) drawContour(contour, sink);
}
