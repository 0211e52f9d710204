/**
 * Icons for time and day/night: a clock (ring and hands as two electrodes), a sun (disc and a
 * toothed ray crown) and a crescent moon. Our own drawings on the 24-unit grid.
 */
import { subtractShapes } from '../../geometry/paper-kernel';
import { regularPolygonContour } from '../../geometry/primitive-shapes';
import { circle, joined, part, placeParts, pt, ring, shape, strokeLine } from './icon-drawing';
import type { IconDefinition } from './icon-types';

export const clockFace: IconDefinition = {
	id: 'clock-face',
	name: 'Clock',
	keywords: ['clock', 'time', 'timer', 'schedule', 'hour'],
	build: (placement) => {
		const c = pt(12, 12);
		const hands = joined(
			shape(circle(c, 1.7)),
			shape(strokeLine(pt(12, 12), pt(12, 5.6), 1.8)),
			shape(strokeLine(pt(12, 12), pt(16.6, 14.8), 1.8))
		);
		return placeParts(
			[part('ring', 'Clock ring', ring(c, 10.8, 8.6)), part('hands', 'Clock hands', hands)],
			placement
		);
	}
};

export const sunCrown: IconDefinition = {
	id: 'sun-crown',
	name: 'Sun',
	keywords: ['sun', 'day', 'solar', 'bright', 'light'],
	build: (placement) => {
		const c = pt(12, 12);
		const teeth = regularPolygonContour({
			cx_mm: 12,
			cy_mm: 12,
			radius_mm: 11.4,
			sides: 16,
			rotation_deg: 0
		}).map((p, i) =>
			i % 2 === 0 ? p : { x: 12 + (p.x - 12) * (7.4 / 11.4), y: 12 + (p.y - 12) * (7.4 / 11.4) }
		);
		return placeParts(
			[
				part('disc', 'Sun disc', shape(circle(c, 4.6))),
				part('rays', 'Sun rays', shape(teeth, [circle(c, 6.2)]))
			],
			placement
		);
	}
};

export const crescentMoon: IconDefinition = {
	id: 'crescent-moon',
	name: 'Night',
	keywords: ['moon', 'night', 'sleep', 'eco night', 'dark'],
	build: (placement) => {
		const [crescent] = subtractShapes(shape(circle(pt(11, 12.5), 9)), [
			shape(circle(pt(16.5, 8.5), 7.6))
		]);
		return placeParts([part('moon', 'Night', crescent)], placement);
	}
};
