import { describe, expect, it } from 'vitest';
import { shapeToPathData } from '../../src/lib/core/geometry/path-data';
import { shapesTightBounds } from '../../src/lib/core/geometry/tight-bounds';
import {
	generateIcon,
	iconById,
	ICONS,
	searchIcons
} from '../../src/lib/core/glyphs/icons/icon-library';
import { closestPair } from './measure';

describe('icon library', () => {
	it('has at least 15 icons with unique ids, names and keywords', () => {
		expect(ICONS.length).toBeGreaterThanOrEqual(15);
		expect(new Set(ICONS.map((i) => i.id)).size).toBe(ICONS.length);
		expect(new Set(ICONS.map((i) => i.name)).size).toBe(ICONS.length);
		for (const icon of ICONS) expect(icon.keywords.length, icon.id).toBeGreaterThan(2);
		for (const id of [
			'battery-gauge',
			'signal-bars',
			'alarm-bell',
			'clock-face',
			'droplet',
			'flame',
			'snowflake',
			'padlock',
			'wireless-arcs',
			'warning-triangle',
			'unit-kwh',
			'unit-cubic-metre',
			'unit-celsius',
			'unit-percent'
		]) {
			expect(iconById(id).id).toBe(id);
		}
	});

	it('every icon builds valid, separate electrodes inside its box, scaling with the size', () => {
		for (const icon of ICONS) {
			const parts = icon.build({ x_mm: 10, y_mm: 20, size_mm: 8 });
			expect(parts.length, icon.id).toBeGreaterThan(0);
			expect(new Set(parts.map((p) => p.key)).size).toBe(parts.length);
			for (const p of parts) {
				for (const c of [p.outline, ...p.holes]) {
					expect(c.length, `${icon.id} ${p.key}`).toBeGreaterThanOrEqual(3);
					expect(
						c.every((pt) =>
							[pt.x, pt.y, ...(pt.in ?? []), ...(pt.out ?? [])].every(Number.isFinite)
						)
					).toBe(true);
				}
				expect(p.kind).toBe('icon');
			}
			const b = shapesTightBounds(parts);
			expect(b.minX, icon.id).toBeGreaterThanOrEqual(10 - 1e-9);
			expect(b.minY, icon.id).toBeGreaterThanOrEqual(20 - 1e-9);
			expect(b.maxX, icon.id).toBeLessThanOrEqual(18 + 1e-9);
			expect(b.maxY, icon.id).toBeLessThanOrEqual(28 + 1e-9);
			if (parts.length > 1)
				expect(closestPair(parts).gap, icon.id).toBeGreaterThanOrEqual(8 / 24 / 2);
			const big = shapesTightBounds(icon.build({ x_mm: 0, y_mm: 0, size_mm: 16 }));
			expect(big.maxX - big.minX).toBeCloseTo(2 * (b.maxX - b.minX), 6);
		}
	});

	it('are found by keyword and become a regenerable group', () => {
		expect(searchIcons('temperature').map((i) => i.id)).toEqual(
			expect.arrayContaining(['thermometer', 'unit-celsius'])
		);
		expect(searchIcons('battery level').map((i) => i.id)).toEqual(['battery-gauge']);
		const g = generateIcon({ icon: 'unit-kwh', x_mm: 1, y_mm: 1, size_mm: 6 });
		expect(g).toMatchObject({
			kind: 'icon',
			params: { icon: 'unit-kwh', x_mm: 1, y_mm: 1, size_mm: 6 },
			name: 'Unit kWh'
		});
		expect(g.parts.map((p) => p.key)).toEqual(['letter1', 'letter2', 'letter3']);
		expect(generateIcon({ icon: 'unit-percent', size_mm: 6 }).parts).toHaveLength(1);
		expect(() => generateIcon({ icon: 'nope', size_mm: 6 })).toThrow(/unknown icon/);
	});

	it('regression guard: golden SVG paths (battery gauge, warning sign; 24 mm box, 3 decimals)', () => {
		const battery = iconById('battery-gauge').build({ x_mm: 0, y_mm: 0, size_mm: 24 });
		expect(battery.map((p) => `${p.key}: ${shapeToPathData(p, 3)}`)).toMatchInlineSnapshot(`
			[
			  "frame: M1 6L20.5 6L20.5 9.5L23 9.5L23 14.5L20.5 14.5L20.5 18L1 18ZM2.6 7.6L18.9 7.6L18.9 16.4L2.6 16.4Z",
			  "level1: M3.6 8.6L7.7 8.6L7.7 15.4L3.6 15.4Z",
			  "level2: M8.7 8.6L12.8 8.6L12.8 15.4L8.7 15.4Z",
			  "level3: M13.8 8.6L17.9 8.6L17.9 15.4L13.8 15.4Z",
			]
		`);
		const warning = iconById('warning-triangle').build({ x_mm: 0, y_mm: 0, size_mm: 24 });
		expect(shapeToPathData(warning[0], 3)).toMatchInlineSnapshot(
			`"M12 1.8L22.8 21.4L1.2 21.4ZM10.9 8.2L13.1 8.2L12.6 15.2L11.4 15.2ZM12 16.7C12.718 16.7 13.3 17.282 13.3 18C13.3 18.718 12.718 19.3 12 19.3C11.282 19.3 10.7 18.718 10.7 18C10.7 17.282 11.282 16.7 12 16.7Z"`
		);
	});
});
