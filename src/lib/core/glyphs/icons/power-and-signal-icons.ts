/**
 * Icons for supply and radio status: a battery gauge (frame plus three level cells), signal
 * strength bars and wireless arcs. All drawings are our own, on the 24-unit grid.
 */
import { box, circle, part, placeParts, polygon, pt, shape, strokeArc } from './icon-drawing';
import type { IconDefinition } from './icon-types';

export const batteryGauge: IconDefinition = {
	id: 'battery-gauge',
	name: 'Battery gauge',
	keywords: ['battery', 'charge', 'level', 'power', 'cells'],
	build: (placement) => {
		const frame = shape(
			polygon([
				[1, 6],
				[20.5, 6],
				[20.5, 9.5],
				[23, 9.5],
				[23, 14.5],
				[20.5, 14.5],
				[20.5, 18],
				[1, 18]
			]),
			[box(2.6, 7.6, 18.9, 16.4)]
		);
		const cellWidth = (18.9 - 2.6 - 2 - 2 * 1) / 3;
		const cells = [0, 1, 2].map((k) => {
			const x0 = 2.6 + 1 + k * (cellWidth + 1);
			return part(
				`level${k + 1}`,
				`Battery level ${k + 1}`,
				shape(box(x0, 8.6, x0 + cellWidth, 15.4))
			);
		});
		return placeParts([part('frame', 'Battery frame', frame), ...cells], placement);
	}
};

export const signalBars: IconDefinition = {
	id: 'signal-bars',
	name: 'Signal strength',
	keywords: ['signal', 'reception', 'radio', 'bars', 'strength'],
	build: (placement) => {
		const bars = [0, 1, 2, 3].map((k) => {
			const x0 = 2 + k * 5.3;
			const top = 21 - (6 + 4.5 * k);
			return part(
				`bar${k + 1}`,
				`Signal ${k + 1}`,
				shape(
					polygon([
						[x0, top + 1.2],
						[x0 + 4, top],
						[x0 + 4, 21],
						[x0, 21]
					])
				)
			);
		});
		return placeParts(bars, placement);
	}
};

export const wirelessArcs: IconDefinition = {
	id: 'wireless-arcs',
	name: 'Wireless link',
	keywords: ['wireless', 'radio', 'link', 'connection', 'antenna', 'network'],
	build: (placement) => {
		const c = pt(12, 19.5);
		const arcs = [5, 9.5, 14].map((r, k) =>
			part(
				`arc${k + 1}`,
				`Wireless ${k + 1}`,
				shape(strokeArc({ c, r: r - 0.5, from_deg: 222, sweep_deg: 96, width: 2.2 }))
			)
		);
		return placeParts([part('dot', 'Wireless dot', shape(circle(c, 2))), ...arcs], placement);
	}
};
