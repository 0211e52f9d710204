import { describe, expect, it } from 'vitest';
import { booleanElectrodes } from '../../src/lib/core/commands/boolean-electrodes';
import type { Design } from '../../src/lib/core/design/schema';
import { shapeArea } from '../../src/lib/core/geometry/polygon';
import { ellipseContour } from '../../src/lib/core/geometry/primitive-shapes';
import { byId, electrode, emptyDesign, ids, run, square } from './fixtures';

const design = (...electrodes: Design['electrodes']): Design => ({
	...emptyDesign(),
	commons: [{ id: 'com1', name: 'COM1' }],
	electrodes,
	groups: [{ id: 'g', name: 'G', members: electrodes.map((e) => e.id) }]
});
const area = (d: Design, id: string) => shapeArea(byId(d, id), { tolerance_um: 0.01 });

describe('boolean electrodes (paper.js kernel)', () => {
	it('unites two overlapping squares: area 4 + 4 − 1 to 1e-9 mm², keeping the base record', () => {
		const d = design(
			electrode('a', square(0, 0), { common: 'com1' }),
			electrode('b', square(1, 1))
		);
		const next = run(d, booleanElectrodes(d, { ids: ['a', 'b'], operation: 'unite' }));
		expect(ids(next)).toEqual(['a']);
		expect(Math.abs(area(next, 'a') - 7)).toBeLessThan(1e-9);
		expect(byId(next, 'a')).toMatchObject({ common: 'com1', name: 'A', holes: [] });
		expect(next.groups[0].members).toEqual(['a']);
	});

	it('subtracts an inner square as a hole', () => {
		const d = design(electrode('a', square(0, 0, 4)), electrode('b', square(1, 1, 2)));
		const next = run(d, booleanElectrodes(d, { ids: ['a', 'b'], operation: 'subtract' }));
		const a = byId(next, 'a');
		expect(a.holes).toHaveLength(1);
		expect(Math.abs(area(next, 'a') - 12)).toBeLessThan(1e-9);
	});

	it('intersects to the overlap area', () => {
		const d = design(electrode('a', square(0, 0, 3)), electrode('b', square(2, 1, 3)));
		const next = run(d, booleanElectrodes(d, { ids: ['a', 'b'], operation: 'intersect' }));
		expect(Math.abs(area(next, 'a') - 2)).toBeLessThan(1e-9);
		expect(() => booleanElectrodes(d, { ids: ['a'], operation: 'unite' })).toThrow(/two or more/);
	});

	it('splits a cut into islands: extra islands become electrodes above the base, in its group', () => {
		const d = design(
			electrode('a', square(0, 0, 6)),
			electrode('b', [
				{ x: 2.5, y: -1 },
				{ x: 3.5, y: -1 },
				{ x: 3.5, y: 7 },
				{ x: 2.5, y: 7 }
			])
		);
		const next = run(d, booleanElectrodes(d, { ids: ['a', 'b'], operation: 'subtract' }));
		expect(ids(next)).toEqual(['a', 'a-2']);
		expect(byId(next, 'a-2').name).toBe('A (2)');
		expect(area(next, 'a') + area(next, 'a-2')).toBeCloseTo(30, 9);
		expect(next.groups[0].members).toEqual(['a', 'a-2']);
	});

	it('keeps curves: a disc minus a square keeps cubic handles', () => {
		const disc = ellipseContour({ cx_mm: 0, cy_mm: 0, rx_mm: 3, ry_mm: 3 });
		const d = design(electrode('a', disc), electrode('b', square(0, -4, 4)));
		const next = run(d, booleanElectrodes(d, { ids: ['a', 'b'], operation: 'subtract' }));
		const outline = byId(next, 'a').outline;
		expect(outline.some((p) => p.in || p.out)).toBe(true);
		const full = shapeArea({ outline: disc, holes: [] }, { tolerance_um: 0.01 });
		expect(area(next, 'a')).toBeCloseTo((full * 3) / 4, 6);
	});
});
