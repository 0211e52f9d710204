/**
 * Icons for alerts and access: an alarm bell with its clapper and knob joined to the body, a
 * warning triangle with the exclamation mark cut out, and a padlock with a keyhole. Our own
 * drawings on the 24-unit grid.
 */
import { pathFrom } from '../../geometry/path-builder';
import { roundedRectangleContour } from '../../geometry/primitive-shapes';
import { carve, circle, joined, part, placeParts, polygon, pt, shape } from './icon-drawing';
import type { IconDefinition } from './icon-types';

export const alarmBell: IconDefinition = {
	id: 'alarm-bell',
	name: 'Alarm bell',
	keywords: ['alarm', 'bell', 'alert', 'ring', 'notification', 'buzzer'],
	build: (placement) => {
		const body = pathFrom(pt(3, 18.5))
			.lineTo(pt(21, 18.5))
			.lineTo(pt(21, 17.4))
			.cubicTo(pt(19.2, 16.4), pt(18.6, 15), pt(18.6, 12))
			.cubicTo(pt(18.6, 7.6), pt(15.6, 5), pt(12, 5))
			.cubicTo(pt(8.4, 5), pt(5.4, 7.6), pt(5.4, 12))
			.cubicTo(pt(5.4, 15), pt(4.8, 16.4), pt(3, 17.4))
			.close();
		const bell = joined(
			shape(body),
			shape(circle(pt(12, 20.2), 2.2)),
			shape(circle(pt(12, 4.4), 1.6))
		);
		return placeParts([part('bell', 'Alarm bell', bell)], placement);
	}
};

export const warningTriangle: IconDefinition = {
	id: 'warning-triangle',
	name: 'Warning',
	keywords: ['warning', 'caution', 'fault', 'error', 'attention', 'triangle'],
	build: (placement) => {
		const triangle = polygon([
			[12, 1.8],
			[22.8, 21.4],
			[1.2, 21.4]
		]);
		const bar = polygon([
			[10.9, 8.2],
			[13.1, 8.2],
			[12.6, 15.2],
			[11.4, 15.2]
		]);
		const dot = circle(pt(12, 18), 1.3);
		return placeParts([part('sign', 'Warning', shape(triangle, [bar, dot]))], placement);
	}
};

export const padlock: IconDefinition = {
	id: 'padlock',
	name: 'Padlock',
	keywords: ['lock', 'locked', 'keypad lock', 'child lock', 'security', 'padlock'],
	build: (placement) => {
		const body = roundedRectangleContour({
			x_mm: 4.5,
			y_mm: 10.5,
			width_mm: 15,
			height_mm: 11.5,
			radius_mm: 1.6
		});
		const shackle = pathFrom(pt(6.4, 11.5))
			.lineTo(pt(6.4, 8.2))
			.arcAround(pt(12, 8.2), 180)
			.lineTo(pt(17.6, 11.5))
			.lineTo(pt(15.6, 11.5))
			.lineTo(pt(15.6, 8.2))
			.arcAround(pt(12, 8.2), -180)
			.lineTo(pt(8.4, 11.5))
			.close();
		const keyhole = [
			shape(circle(pt(12, 15), 1.7)),
			shape(
				polygon([
					[11.3, 15],
					[12.7, 15],
					[13.1, 19],
					[10.9, 19]
				])
			)
		];
		return placeParts(
			[part('lock', 'Padlock', carve([shape(body), shape(shackle)], keyhole))],
			placement
		);
	}
};
