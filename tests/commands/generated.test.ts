import { describe, expect, it } from 'vitest';
import { assignElectrodes } from '../../src/lib/core/commands/assign-electrodes';
import { deleteElectrodes } from '../../src/lib/core/commands/delete-electrodes';
import { insertGenerated } from '../../src/lib/core/commands/insert-generated';
import { regenerateGroup } from '../../src/lib/core/commands/regenerate-group';
import { setElectrodeProperties } from '../../src/lib/core/commands/set-electrode-properties';
import { demoDesign } from '../../src/lib/core/design/demo';
import { parseDesignValue } from '../../src/lib/core/design/parse-design';
import type { Design } from '../../src/lib/core/design/schema';
import { shapesTightBounds } from '../../src/lib/core/geometry/tight-bounds';
import { generateBarGraph } from '../../src/lib/core/glyphs/bar-graph';
import { layoutText } from '../../src/lib/core/glyphs/text-layout';
import { generateSevenSegment } from '../../src/lib/core/glyphs/seven-segment';
import { generateIcon } from '../../src/lib/core/glyphs/icons/icon-library';
import { byId, ids, run, testDesign } from './fixtures';

const digit = { x_mm: 30, y_mm: 2, height_mm: 10, width_mm: 6, stroke_mm: 1, gap_mm: 0.1 };
const valid = (d: Design) => {
	const result = parseDesignValue(JSON.parse(JSON.stringify(d)));
	expect(result.ok ? [] : result.issues).toEqual([]);
};

describe('generated groups', () => {
	it('inserts parts as <group>.<part> electrodes with a regenerable group', () => {
		const d = testDesign();
		const next = run(
			d,
			insertGenerated(d, { generated: generateSevenSegment(digit), namePrefix: '1' })
		);
		expect(ids(next).slice(5)).toEqual([
			'digit1.a',
			'digit1.b',
			'digit1.c',
			'digit1.d',
			'digit1.e',
			'digit1.f',
			'digit1.g'
		]);
		expect(byId(next, 'digit1.a').name).toBe('1A');
		expect(next.groups.at(-1)).toMatchObject({
			id: 'digit1',
			name: '7-segment digit',
			generator: { kind: 'seven-segment' }
		});
		expect(next.groups.at(-1)!.generator!.params).toMatchObject({
			style: 'pointed',
			slant_deg: 0,
			decimalPoint: false
		});
		valid(next);
	});

	it('regenerates keeping ids, names and wiring; adds and removes parts as the parameters ask', () => {
		const d0 = testDesign();
		let d = run(d0, insertGenerated(d0, { generated: generateSevenSegment(digit) }));
		d = run(d, assignElectrodes(d, { ids: ['digit1.a'], common: 'com2', line: 'seg2' }));
		d = run(d, setElectrodeProperties(d, { ids: ['digit1.g'], name: 'middle' }));
		const taller = run(
			d,
			regenerateGroup(d, {
				groupId: 'digit1',
				params: { height_mm: 14, decimalPoint: true, style: 'round' }
			})
		);
		expect(byId(taller, 'digit1.a')).toMatchObject({ common: 'com2', line: 'seg2' });
		expect(byId(taller, 'digit1.g').name).toBe('middle');
		expect(ids(taller).slice(5)).toEqual([
			'digit1.a',
			'digit1.b',
			'digit1.c',
			'digit1.d',
			'digit1.e',
			'digit1.f',
			'digit1.g',
			'digit1.dp'
		]);
		const b = shapesTightBounds(
			['a', 'b', 'c', 'd', 'e', 'f', 'g'].map((s) => byId(taller, `digit1.${s}`))
		);
		expect(b.maxY - b.minY).toBeCloseTo(14, 9);
		const back = run(
			taller,
			regenerateGroup(taller, { groupId: 'digit1', params: { decimalPoint: false } })
		);
		expect(ids(back)).not.toContain('digit1.dp');
		expect(back.groups.at(-1)!.members).toHaveLength(7);
		valid(back);
	});

	it('recreates a deleted part and grows or shrinks a bar graph', () => {
		const d0 = testDesign();
		let d = run(
			d0,
			insertGenerated(d0, {
				generated: generateBarGraph({ count: 4, width_mm: 1, height_mm: 2, x_mm: 0, y_mm: 10 })
			})
		);
		d = run(d, deleteElectrodes(d, { ids: ['bars1.bar2'] }));
		const fixed = run(d, regenerateGroup(d, { groupId: 'bars1', params: {} }));
		expect(fixed.groups.at(-1)!.members).toEqual([
			'bars1.bar1',
			'bars1.bar2',
			'bars1.bar3',
			'bars1.bar4'
		]);
		const six = run(fixed, regenerateGroup(fixed, { groupId: 'bars1', params: { count: 6 } }));
		expect(six.groups.at(-1)!.members).toHaveLength(6);
		const two = run(six, regenerateGroup(six, { groupId: 'bars1', params: { count: 2 } }));
		expect(ids(two).filter((id) => id.startsWith('bars1.'))).toEqual(['bars1.bar1', 'bars1.bar2']);
	});

	it('regenerates text and icons; keeps parts that still exist', () => {
		const d0 = testDesign();
		const d = run(
			d0,
			insertGenerated(d0, {
				generated: layoutText({
					text: '12.3',
					height_mm: 8,
					width_mm: 4.5,
					stroke_mm: 0.8,
					gap_mm: 0.1,
					x_mm: 0,
					y_mm: 10
				})
			})
		);
		const next = run(d, regenerateGroup(d, { groupId: 'text1', params: { text: '12.34' } }));
		expect(byId(next, 'text1.c1.dp').name).toBe('DP2');
		expect(byId(next, 'text1.c0.a')).toBe(byId(d, 'text1.c0.a'));
		expect(next.groups.at(-1)!.members.filter((m) => m.startsWith('text1.c3.'))).toHaveLength(7);
		const withIcon = run(
			d0,
			insertGenerated(d0, { generated: generateIcon({ icon: 'battery-gauge', size_mm: 6 }) })
		);
		const bigger = run(
			withIcon,
			regenerateGroup(withIcon, { groupId: 'icon1', params: { size_mm: 12 } })
		);
		expect(shapesTightBounds([byId(bigger, 'icon1.frame')]).maxX).toBeCloseTo(11.5, 9);
		expect(() => regenerateGroup(d0, { groupId: 'g1', params: {} })).toThrow(
			/not made by a generator/
		);
		expect(() => regenerateGroup(d, { groupId: 'text1', params: { height_mm: -1 } })).toThrow(
			/height_mm/
		);
	});

	it('regenerates the demo digits, whose members follow the older positional naming', () => {
		const d = demoDesign();
		const next = run(d, regenerateGroup(d, { groupId: 'digit2', params: { slant_deg: 0 } }));
		expect(next.groups.find((g) => g.id === 'digit2')!.members).toEqual(
			d.groups.find((g) => g.id === 'digit2')!.members
		);
		expect(byId(next, 'd2a')).toMatchObject({
			name: '2A',
			common: byId(d, 'd2a').common,
			line: byId(d, 'd2a').line
		});
		expect(next.electrodes).toHaveLength(d.electrodes.length);
		const bars = run(d, regenerateGroup(d, { groupId: 'moisture', params: { shape: 'chevron' } }));
		expect(bars.electrodes).toHaveLength(d.electrodes.length);
		valid(bars);
	});
});
