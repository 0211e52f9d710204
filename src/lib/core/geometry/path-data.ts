/**
 * SVG path data for contours of the design document: straight edges become `L`, edges with a
 * Bezier handle at either end become cubic `C` segments. Coordinates stay in millimetres.
 */
import type { Contour, Point } from '../design/schema';

const fmt = (v: number, digits: number) => {
	const text = v.toFixed(digits);
	return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
};

function edge(from: Point, to: Point, digits: number): string {
	if (!from.out && !to.in) return `L${fmt(to.x, digits)} ${fmt(to.y, digits)}`;
	const c1x = from.x + (from.out?.[0] ?? 0);
	const c1y = from.y + (from.out?.[1] ?? 0);
	const c2x = to.x + (to.in?.[0] ?? 0);
	const c2y = to.y + (to.in?.[1] ?? 0);
	return `C${[c1x, c1y, c2x, c2y, to.x, to.y].map((v) => fmt(v, digits)).join(' ')}`;
}

export function contourToPathData(contour: Contour, digits = 4): string {
	if (contour.length === 0) return '';
	const parts = [`M${fmt(contour[0].x, digits)} ${fmt(contour[0].y, digits)}`];
	for (let i = 1; i <= contour.length; i++) {
		const from = contour[i - 1];
		const to = contour[i % contour.length];
		if (i === contour.length && !from.out && !to.in) break;
		parts.push(edge(from, to, digits));
	}
	parts.push('Z');
	return parts.join('');
}

/** Outline plus holes as one path, to be filled with the even-odd rule. */
export function shapeToPathData(
	shape: { outline: Contour; holes: readonly Contour[] },
	digits = 4
): string {
	return [shape.outline, ...shape.holes].map((c) => contourToPathData(c, digits)).join('');
}
