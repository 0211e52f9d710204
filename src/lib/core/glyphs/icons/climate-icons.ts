/**
 * Icons for water, heat and air: droplet, flame, snowflake, thermometer (tube and level as two
 * electrodes), fan and eco leaf. Our own drawings on the 24-unit grid.
 */
import { pathFrom } from '../../geometry/path-builder';
import { roundedRectangleContour } from '../../geometry/primitive-shapes';
import {
	circle,
	joined,
	part,
	placeParts,
	pt,
	rotated,
	shape,
	strokeArc,
	strokeLine
} from './icon-drawing';
import type { IconDefinition } from './icon-types';

export const droplet: IconDefinition = {
	id: 'droplet',
	name: 'Water drop',
	keywords: ['water', 'drop', 'humidity', 'irrigation', 'flow', 'wet'],
	build: (placement) => {
		const drop = pathFrom(pt(12, 1.8))
			.cubicTo(pt(13.6, 5.6), pt(19.2, 10.4), pt(19.2, 15))
			.cubicTo(pt(19.2, 19.1), pt(16, 22.2), pt(12, 22.2))
			.cubicTo(pt(8, 22.2), pt(4.8, 19.1), pt(4.8, 15))
			.cubicTo(pt(4.8, 10.4), pt(10.4, 5.6), pt(12, 1.8))
			.close();
		const glint = strokeArc({ c: pt(12, 15), r: 4.4, from_deg: 105, sweep_deg: 75, width: 1.3 });
		return placeParts([part('drop', 'Water drop', shape(drop, [glint]))], placement);
	}
};

export const flame: IconDefinition = {
	id: 'flame',
	name: 'Flame',
	keywords: ['flame', 'fire', 'heat', 'heating', 'gas', 'burner'],
	build: (placement) => {
		const outer = pathFrom(pt(12, 1.5))
			.cubicTo(pt(14, 6), pt(20, 9), pt(20, 15))
			.cubicTo(pt(20, 19.5), pt(16.5, 22.5), pt(12, 22.5))
			.cubicTo(pt(7.5, 22.5), pt(4, 19.5), pt(4, 15))
			.cubicTo(pt(4, 11.5), pt(6, 9.5), pt(7.5, 8))
			.cubicTo(pt(7.5, 10.5), pt(8.5, 12), pt(10, 12.5))
			.cubicTo(pt(9.5, 8), pt(11, 4.5), pt(12, 1.5))
			.close();
		const tongue = pathFrom(pt(12.4, 13.4))
			.cubicTo(pt(13.2, 15.6), pt(16, 16.6), pt(16, 18.6))
			.cubicTo(pt(16, 20.2), pt(14.2, 21), pt(12, 21))
			.cubicTo(pt(9.8, 21), pt(8, 20.2), pt(8, 18.6))
			.cubicTo(pt(8, 16.8), pt(11.2, 15.6), pt(12.4, 13.4))
			.close();
		return placeParts([part('flame', 'Flame', shape(outer, [tongue]))], placement);
	}
};

export const snowflake: IconDefinition = {
	id: 'snowflake',
	name: 'Frost',
	keywords: ['snow', 'frost', 'cold', 'freeze', 'cooling', 'winter'],
	build: (placement) => {
		const c = pt(12, 12);
		const arm = [
			shape(strokeLine(c, pt(12, 1.4), 1.7)),
			shape(strokeLine(pt(12, 5.4), pt(9, 3), 1.5)),
			shape(strokeLine(pt(12, 5.4), pt(15, 3), 1.5)),
			shape(strokeLine(pt(12, 8.6), pt(10, 7.2), 1.5)),
			shape(strokeLine(pt(12, 8.6), pt(14, 7.2), 1.5))
		];
		const pieces = [0, 60, 120, 180, 240, 300].flatMap((a) =>
			arm.map((s) => shape(rotated(s.outline, a, c)))
		);
		return placeParts(
			[part('flake', 'Frost', joined(shape(circle(c, 1.6)), ...pieces))],
			placement
		);
	}
};

export const thermometer: IconDefinition = {
	id: 'thermometer',
	name: 'Thermometer',
	keywords: ['temperature', 'thermometer', 'heat', 'climate', 'sensor'],
	build: (placement) => {
		const tube = joined(
			shape(
				roundedRectangleContour({
					x_mm: 8.6,
					y_mm: 1.5,
					width_mm: 6.8,
					height_mm: 15,
					radius_mm: 3.4
				})
			),
			shape(circle(pt(12, 17.6), 5.2))
		);
		const bore = joined(
			shape(
				roundedRectangleContour({
					x_mm: 10.1,
					y_mm: 3,
					width_mm: 3.8,
					height_mm: 13,
					radius_mm: 1.9
				})
			),
			shape(circle(pt(12, 17.6), 3.7))
		);
		const level = joined(
			shape(
				roundedRectangleContour({
					x_mm: 11.1,
					y_mm: 8,
					width_mm: 1.8,
					height_mm: 9,
					radius_mm: 0.9
				})
			),
			shape(circle(pt(12, 17.6), 2.7))
		);
		return placeParts(
			[
				part('tube', 'Thermometer', shape(tube.outline, [bore.outline])),
				part('level', 'Temperature level', level)
			],
			placement
		);
	}
};

export const fanBlades: IconDefinition = {
	id: 'fan-blades',
	name: 'Fan',
	keywords: ['fan', 'ventilation', 'air', 'blower', 'cooling'],
	build: (placement) => {
		const c = pt(12, 12);
		const blade = pathFrom(pt(12, 12))
			.cubicTo(pt(10.6, 8.4), pt(11.4, 2.2), pt(15.2, 2.2))
			.cubicTo(pt(18.8, 2.2), pt(19.4, 5.8), pt(17, 8.4))
			.cubicTo(pt(15.6, 9.9), pt(13.8, 11), pt(12, 12))
			.close();
		const fan = joined(
			shape(circle(c, 2.6)),
			...[0, 120, 240].map((a) => shape(rotated(blade, a, c)))
		);
		return placeParts(
			[part('fan', 'Fan', shape(fan.outline, [...fan.holes, circle(c, 1)]))],
			placement
		);
	}
};

export const ecoLeaf: IconDefinition = {
	id: 'eco-leaf',
	name: 'Eco mode',
	keywords: ['eco', 'leaf', 'green', 'saving', 'economy', 'energy saving'],
	build: (placement) => {
		const leaf = pathFrom(pt(4.6, 19.4))
			.cubicTo(pt(4, 9), pt(11, 3.6), pt(21.4, 2.6))
			.cubicTo(pt(20.6, 13.2), pt(15, 19.8), pt(4.6, 19.4))
			.close();
		const vein = pathFrom(pt(8, 16))
			.cubicTo(pt(10.4, 12.8), pt(13.4, 9.6), pt(17.4, 6.6))
			.cubicTo(pt(14.2, 10.6), pt(11.2, 13.8), pt(8, 16))
			.close();
		const stem = shape(strokeLine(pt(6.2, 17.8), pt(2.2, 21.8), 1.6));
		const body = joined(shape(leaf), stem);
		return placeParts(
			[part('leaf', 'Eco mode', shape(body.outline, [...body.holes, vein]))],
			placement
		);
	}
};
