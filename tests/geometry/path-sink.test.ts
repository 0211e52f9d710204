import { describe, expect, it } from 'vitest';
import { drawShape, type PathSink } from '../../src/lib/core/geometry/path-sink';
import { contourToPathData, shapeToPathData } from '../../src/lib/core/geometry/path-data';
import { ellipseContour, rectangleContour } from '../../src/lib/core/geometry/primitive-shapes';

/** A sink that writes SVG path data at a fixed precision, like path-data.ts does. */
function svgRecorder(): PathSink & { text: string } {
	const f = (v: number) => String(Number(v.toFixed(4)));
	const sink = {
		text: '',
		moveTo: (x: number, y: number) => void (sink.text += `M${f(x)} ${f(y)}`),
		lineTo: (x: number, y: number) => void (sink.text += `L${f(x)} ${f(y)}`),
		bezierCurveTo: (...v: number[]) => void (sink.text += `C${v.map(f).join(' ')}`),
		closePath: () => void (sink.text += 'Z')
	};
	return sink;
}

describe('path sinks', () => {
	it('draw the same outline the SVG path writer produces', () => {
		const shape = {
			outline: ellipseContour({ cx_mm: 3, cy_mm: 3, rx_mm: 2, ry_mm: 1 }),
			holes: [rectangleContour({ x_mm: 2.5, y_mm: 2.5, width_mm: 1, height_mm: 1 })]
		};
		const sink = svgRecorder();
		drawShape(shape, sink);
		expect(sink.text).toBe(shapeToPathData(shape));
		expect(contourToPathData(shape.holes[0])).toBe('M2.5 2.5L3.5 2.5L3.5 3.5L2.5 3.5Z');
	});
});
