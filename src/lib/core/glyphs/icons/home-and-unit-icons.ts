/**
 * A house (home/away) and the unit labels kWh, m³, °C and %, the labels drawn with our stroke
 * font: each letter is its own electrode; the % sign's rings overlap its slash, so it is one.
 */
import { box, part, placeParts, polygon, shape } from './icon-drawing';
import type { IconDefinition } from './icon-types';
import { strokeLabel } from './stroke-font';

export const house: IconDefinition = {
	id: 'house',
	name: 'Home',
	keywords: ['home', 'house', 'away', 'occupancy', 'building'],
	build: (placement) => {
		const outline = polygon([
			[12, 2],
			[23, 11.4],
			[20.4, 11.4],
			[20.4, 22],
			[3.6, 22],
			[3.6, 11.4],
			[1, 11.4]
		]);
		return placeParts(
			[
				part(
					'house',
					'Home',
					shape(outline, [box(10, 14.4, 14, 22 - 1.8), box(6.2, 12.6, 8.6, 15.2)])
				)
			],
			placement
		);
	}
};

const label = (id: string, text: string, name: string, keywords: string[]): IconDefinition => ({
	id,
	name,
	keywords,
	build: (placement) =>
		placeParts(strokeLabel({ text, stroke: 1.5, spacing: 1.1, name }), placement)
});

export const unitKilowattHour = label('unit-kwh', 'kWh', 'Unit kWh', [
	'kwh',
	'energy',
	'unit',
	'electricity',
	'meter'
]);
export const unitCubicMetre = label('unit-cubic-metre', 'm³', 'Unit m³', [
	'm3',
	'cubic metre',
	'volume',
	'gas',
	'water meter',
	'unit'
]);
export const unitCelsius = label('unit-celsius', '°C', 'Unit °C', [
	'celsius',
	'degree',
	'temperature',
	'unit'
]);
export const unitPercent = label('unit-percent', '%', 'Unit %', [
	'percent',
	'humidity',
	'level',
	'unit'
]);
