/**
 * Pads on the glass follow the pin map: pad k on the ledge is pin k of the pin-map CSV (the wiring
 * module's `pins --csv`, read back as text here), with the same common or segment line and the
 * same place along the edge, for the demo and for designs with a segment line that drives nothing.
 */
import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';
import { glassLayout } from '../../src/lib/core/glass/layout';
import { pinCsv } from '../../src/lib/core/wiring/pin-csv';
import { twoElectrodeGlass } from './fixture';

interface Row {
	pin: number;
	name: string;
	position_mm: number;
}

/** The pin map CSV's rows: pin, function, name, position_mm, … (names here carry no commas). */
function pinMapRows(design: Design): Row[] {
	const [, ...lines] = pinCsv(design).trim().split('\r\n');
	return lines.map((line) => {
		const [pin, , name, position] = line.split(',');
		return { pin: Number(pin), name, position_mm: Number(position) };
	});
}

/** The two-electrode glass with an unused line SEG3 between SEG1 and SEG2. */
function withUnusedLine(pinout: Partial<Design['pinout']>): Design {
	const d = twoElectrodeGlass();
	return {
		...d,
		segmentLines: [d.segmentLines[0], { id: 'seg3', name: 'SEG3' }, d.segmentLines[1]],
		pinout: { ...d.pinout, ...pinout }
	};
}

const cases: [string, () => Design][] = [
	['the demo', demoDesign],
	['an unused line, commons first, bottom edge', () => withUnusedLine({ edge: 'bottom' })],
	[
		'an unused line, commons split, left edge',
		() => withUnusedLine({ edge: 'left', order: 'commons-split' })
	],
	[
		'an unused line, commons last, right edge',
		() => withUnusedLine({ edge: 'right', order: 'commons-last', pitch_mm: 1.8 })
	]
];

describe('pads on the glass', () => {
	it.each(cases)('match the pin map row by row: %s', (_, make) => {
		const design = make();
		const rows = pinMapRows(design);
		const { pads } = glassLayout(design);
		const idOf = new Map(
			[...design.commons, ...design.segmentLines].map((r) => [r.name || r.id, r.id])
		);
		expect(pads.length).toBe(rows.length);
		const horizontal = design.pinout.edge === 'top' || design.pinout.edge === 'bottom';
		pads.forEach((pad, k) => {
			expect(pad.pin).toBe(rows[k].pin);
			expect(pad.net).toBe(idOf.get(rows[k].name));
			const along = horizontal
				? pad.rect.x_mm + pad.rect.width_mm / 2
				: pad.rect.y_mm + pad.rect.height_mm / 2;
			// The CSV prints positions to 3 decimals.
			expect(Math.abs(along - rows[k].position_mm)).toBeLessThanOrEqual(0.0005 + 1e-9);
		});
	});

	it('give an unused segment line its own pad, as the pin map does', () => {
		const design = withUnusedLine({});
		const pad = glassLayout(design).pads.find((p) => p.net === 'seg3');
		expect(pad?.kind).toBe('segment');
		expect(pinMapRows(design).find((r) => r.name === 'SEG3')?.pin).toBe(pad?.pin);
	});
});
