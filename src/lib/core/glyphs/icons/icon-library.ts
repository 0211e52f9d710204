/**
 * The icon library: every icon we ship, looked up by id or searched by name and keywords, and
 * turned into a regenerable group (kind 'icon', params: icon id, x_mm, y_mm, size_mm).
 */
import { z } from 'zod';
import { GlyphError, type GeneratedGroup } from '../glyph-types';
import { alarmBell, padlock, warningTriangle } from './alert-icons';
import { droplet, ecoLeaf, fanBlades, flame, snowflake, thermometer } from './climate-icons';
import {
	house,
	unitCelsius,
	unitCubicMetre,
	unitKilowattHour,
	unitPercent
} from './home-and-unit-icons';
import type { IconDefinition } from './icon-types';
import { batteryGauge, signalBars, wirelessArcs } from './power-and-signal-icons';
import { clockFace, crescentMoon, sunCrown } from './time-and-sky-icons';

// prettier-ignore
export const ICONS: readonly IconDefinition[] = [
	batteryGauge, signalBars, wirelessArcs, alarmBell, warningTriangle, padlock, clockFace, sunCrown, crescentMoon,
	droplet, flame, snowflake, thermometer, fanBlades, ecoLeaf, house, unitKilowattHour, unitCubicMetre, unitCelsius, unitPercent
];

export function iconById(id: string): IconDefinition {
	const icon = ICONS.find((i) => i.id === id);
	if (!icon) throw new GlyphError(`unknown icon "${id}"`);
	return icon;
}

/** Icons whose id, name or keywords contain every word of the query (case-insensitive). */
export function searchIcons(query: string): IconDefinition[] {
	const words = query.toLowerCase().split(/\s+/).filter(Boolean);
	return ICONS.filter((icon) => {
		const text = [icon.id, icon.name, ...icon.keywords].join(' ').toLowerCase();
		return words.every((w) => text.includes(w));
	});
}

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
export const iconParamsSchema = z.object({
	icon: z.string().min(1),
	x_mm: finite().default(0),
	y_mm: finite().default(0),
	size_mm: finite().refine((v) => v > 0, 'expected a size above 0 mm')
});

export function generateIcon(input: z.input<typeof iconParamsSchema>): GeneratedGroup {
	const params = iconParamsSchema.parse(input);
	const icon = iconById(params.icon);
	return { kind: 'icon', params, name: icon.name, idPrefix: 'icon', parts: icon.build(params) };
}
