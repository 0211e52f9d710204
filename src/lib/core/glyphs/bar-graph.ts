/**
 * Bar graphs: `count` bars in a row growing in `direction`. Each bar's box is width_mm × height_mm
 * (x × y on the glass); bars follow each other along the direction with `spacing_mm` between
 * boxes. (x_mm, y_mm) is the top-left of the whole graph. Shapes:
 *   rectangle — plain boxes;   rounded — corner radius `radius_mm` (default a quarter of the
 *   shorter side);   chevron — arrow-shaped bars pointing along the direction, each nested in
 *   the notch of the next (notch depth `point_mm`, default 30 % of the bar's length along the
 *   direction);   steps — rising boxes, bar k having (k + 1)/count of the full size across the
 *   direction, sitting on the graph's bottom (or left, for vertical graphs).
 * Part keys: bar1 … barN in the order they light.
 */
import { z } from 'zod';
import type { Contour } from '../design/schema';
import { rectangleContour, roundedRectangleContour } from '../geometry/primitive-shapes';
import type { ElectrodeDraft, GeneratedGroup } from './glyph-types';

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
const positive = () => finite().refine((v) => v > 0, 'expected a number above 0');

export const barGraphSchema = z.object({
	count: z.number().int('expected a whole number of bars').min(1).max(200),
	x_mm: finite().default(0),
	y_mm: finite().default(0),
	width_mm: positive(),
	height_mm: positive(),
	spacing_mm: finite()
		.refine((v) => v > 0, 'expected a spacing above 0')
		.default(0.3),
	direction: z.enum(['right', 'left', 'up', 'down']).default('right'),
	shape: z.enum(['rectangle', 'rounded', 'chevron', 'steps']).default('rectangle'),
	radius_mm: finite()
		.refine((v) => v >= 0, 'expected a radius of 0 or more')
		.optional(),
	point_mm: finite()
		.refine((v) => v >= 0, 'expected a point depth of 0 or more')
		.optional()
});
export type BarGraphParams = z.output<typeof barGraphSchema>;

/** A chevron in a box of `along` × `across` pointing to +x, in local coordinates (x along, y across). */
function chevronLocal(along: number, across: number, depth: number): [number, number][] {
	return [
		[0, 0],
		[along - depth, 0],
		[along, across / 2],
		[along - depth, across],
		[0, across],
		[depth, across / 2]
	];
}

export function generateBarGraph(input: z.input<typeof barGraphSchema>): GeneratedGroup {
	const p = barGraphSchema.parse(input);
	const horizontal = p.direction === 'right' || p.direction === 'left';
	const along = horizontal ? p.width_mm : p.height_mm;
	const across = horizontal ? p.height_mm : p.width_mm;
	const depth = Math.min(p.point_mm ?? 0.3 * along, along * 0.9);
	const totalAlong =
		p.count * along + (p.count - 1) * p.spacing_mm + (p.shape === 'chevron' ? 0 : 0);
	const parts: ElectrodeDraft[] = [];
	for (let k = 0; k < p.count; k++) {
		// s: distance along the growth direction from the graph's start edge.
		const s = k * (along + p.spacing_mm);
		const reversed = p.direction === 'left' || p.direction === 'up';
		const start = reversed ? totalAlong - s - along : s;
		const size = p.shape === 'steps' ? (across * (k + 1)) / p.count : across;
		// Map local (a along, c across) to glass coordinates.
		const toGlass = (a: number, c: number) => {
			const alongCoord = reversed ? start + along - a : start + a;
			return horizontal
				? { x: p.x_mm + alongCoord, y: p.y_mm + c }
				: { x: p.x_mm + c, y: p.y_mm + alongCoord };
		};
		let outline: Contour;
		if (p.shape === 'chevron') {
			outline = chevronLocal(along, across, depth).map(([a, c]) => toGlass(a, c));
		} else {
			const offsetAcross = horizontal ? across - size : 0;
			const a0 = toGlass(0, offsetAcross);
			const a1 = toGlass(along, offsetAcross + size);
			const box = {
				x_mm: Math.min(a0.x, a1.x),
				y_mm: Math.min(a0.y, a1.y),
				width_mm: Math.abs(a1.x - a0.x),
				height_mm: Math.abs(a1.y - a0.y)
			};
			const radius = p.radius_mm ?? Math.min(box.width_mm, box.height_mm) / 4;
			outline =
				p.shape === 'rounded'
					? roundedRectangleContour({ ...box, radius_mm: radius })
					: rectangleContour(box);
		}
		parts.push({ key: `bar${k + 1}`, name: `BAR${k + 1}`, kind: 'segment', outline, holes: [] });
	}
	return { kind: 'bar-graph', params: p, name: `Bar graph (${p.count})`, idPrefix: 'bars', parts };
}
