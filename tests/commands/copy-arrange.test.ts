import { describe, expect, it } from 'vitest';
import { alignElectrodes } from '../../src/lib/core/commands/align-electrodes';
import { gridArray, linearArray } from '../../src/lib/core/commands/array-electrodes';
import { distributeElectrodes } from '../../src/lib/core/commands/distribute-electrodes';
import { duplicateElectrodes } from '../../src/lib/core/commands/duplicate-electrodes';
import {
	groupElectrodes,
	renameGroup,
	ungroupElectrodes
} from '../../src/lib/core/commands/group-electrodes';
import { insertGenerated } from '../../src/lib/core/commands/insert-generated';
import { insertedIds } from '../../src/lib/core/commands/patch-algebra';
import { reorderElectrodes } from '../../src/lib/core/commands/reorder-electrodes';
import { selectionBounds } from '../../src/lib/core/commands/selection';
import { generateBarGraph } from '../../src/lib/core/glyphs/bar-graph';
import { byId, ids, run, testDesign } from './fixtures';

describe('duplicate and arrays', () => {
	it('duplicates with fresh ids and an offset, copying whole groups', () => {
		const d = testDesign();
		const patch = duplicateElectrodes(d, { ids: ['e1', 'e2', 'e3'] });
		const next = run(d, patch);
		expect(insertedIds(patch)).toEqual(['e1-2', 'e2-2', 'e3-2']);
		expect(byId(next, 'e1-2').outline[0]).toEqual({ x: 1, y: 1 });
		expect(byId(next, 'e1-2')).toMatchObject({ common: 'com1', line: 'seg1', name: 'E1' });
		expect(next.groups.map((g) => [g.id, g.members])).toEqual([
			['g1', ['e1', 'e2']],
			['g1-2', ['e1-2', 'e2-2']]
		]);
		const again = run(next, duplicateElectrodes(next, { ids: ['e1-2'], dx_mm: 0, dy_mm: 0 }));
		expect(ids(again).at(-1)).toBe('e1-3');
	});

	it('renames generated members with their copied group and moves the generator', () => {
		const d0 = testDesign();
		const d = run(
			d0,
			insertGenerated(d0, {
				generated: generateBarGraph({ count: 3, width_mm: 1, height_mm: 2, x_mm: 30, y_mm: 0 })
			})
		);
		const members = d.groups.at(-1)!.members;
		expect(members).toEqual(['bars1.bar1', 'bars1.bar2', 'bars1.bar3']);
		const next = run(d, duplicateElectrodes(d, { ids: members, dx_mm: 0, dy_mm: 5 }));
		expect(next.groups.at(-1)).toMatchObject({
			id: 'bars1-2',
			members: ['bars1-2.bar1', 'bars1-2.bar2', 'bars1-2.bar3']
		});
		expect(next.groups.at(-1)!.generator!.params).toMatchObject({ x_mm: 30, y_mm: 5 });
	});

	it('makes linear and grid arrays of the selection', () => {
		const d = testDesign();
		const lin = run(d, linearArray(d, { ids: ['e5'], count: 4, dx_mm: 3, dy_mm: 0 }));
		expect(ids(lin).slice(5)).toEqual(['e5-2', 'e5-3', 'e5-4']);
		expect(byId(lin, 'e5-4').outline[0]).toEqual({ x: 25, y: 0 });
		const grid = run(
			d,
			gridArray(d, { ids: ['e3'], rows: 2, cols: 3, pitchX_mm: 2.5, pitchY_mm: 4 })
		);
		expect(grid.electrodes).toHaveLength(10);
		expect(byId(grid, 'e3-6').outline[0]).toEqual({ x: 13, y: 4 });
		expect(() => linearArray(d, { ids: ['e1'], count: 1, dx_mm: 1, dy_mm: 0 })).toThrow(/count/);
	});
});

describe('align, distribute, group, reorder', () => {
	it('aligns edges and centres; a fully selected group moves as one block', () => {
		const d = testDesign();
		const shifted = run(
			d,
			alignElectrodes(d, { ids: ['e3'], edge: 'top', to: { minX: 0, minY: 5, maxX: 1, maxY: 6 } })
		);
		expect(selectionBounds(shifted, ['e3']).minY).toBe(5);
		const staggered = run(
			shifted,
			alignElectrodes(shifted, { ids: ['e1', 'e2', 'e3'], edge: 'bottom' })
		);
		expect(selectionBounds(staggered, ['e1']).maxY).toBe(7);
		expect(selectionBounds(staggered, ['e2']).maxY).toBe(7);
		const centred = run(d, alignElectrodes(d, { ids: ['e1', 'e2', 'e5'], edge: 'centre' }));
		// The group e1+e2 spans x 0…6 and moves as one: both keep their 4 mm spacing.
		expect(byId(centred, 'e2').outline[0].x - byId(centred, 'e1').outline[0].x).toBe(4);
		expect(selectionBounds(centred, ['e5'])).toMatchObject({ minX: 8, maxX: 10 });
	});

	it('distributes with equal gaps, keeping the outer ones', () => {
		const d = testDesign();
		const squeezed = run(
			d,
			alignElectrodes(d, { ids: ['e3'], edge: 'left', to: { minX: 5, minY: 0, maxX: 5, maxY: 0 } })
		);
		const next = run(
			squeezed,
			distributeElectrodes(squeezed, { ids: ['e3', 'e4', 'e5'], axis: 'horizontal' })
		);
		const b = ['e3', 'e4', 'e5'].map((id) => selectionBounds(next, [id]));
		expect(b[1].minX - b[0].maxX).toBeCloseTo(b[2].minX - b[1].maxX, 12);
		expect(b[0].minX).toBe(5);
		expect(b[2].minX).toBe(16);
		expect(() => distributeElectrodes(d, { ids: ['e1', 'e3'], axis: 'vertical' })).toThrow(/three/);
	});

	it('groups (taking members out of old groups), renames and ungroups', () => {
		const d = testDesign();
		const grouped = run(d, groupElectrodes(d, { ids: ['e2', 'e3'], name: 'Two' }));
		expect(grouped.groups).toEqual([
			{ id: 'g1', name: 'Pair', members: ['e1'] },
			{ id: 'group1', name: 'Two', members: ['e2', 'e3'] }
		]);
		const renamed = run(grouped, renameGroup(grouped, { groupId: 'group1', name: 'Duo' }));
		expect(renamed.groups[1].name).toBe('Duo');
		const ungrouped = run(renamed, ungroupElectrodes(renamed, { groupId: 'group1' }));
		expect(ungrouped.groups.map((g) => g.id)).toEqual(['g1']);
		expect(ungrouped.electrodes).toBe(renamed.electrodes);
	});

	it('reorders to front, back, forward and backward', () => {
		const d = testDesign();
		expect(ids(run(d, reorderElectrodes(d, { ids: ['e2', 'e4'], to: 'front' })))).toEqual([
			'e1',
			'e3',
			'e5',
			'e2',
			'e4'
		]);
		expect(ids(run(d, reorderElectrodes(d, { ids: ['e4'], to: 'back' })))).toEqual([
			'e4',
			'e1',
			'e2',
			'e3',
			'e5'
		]);
		expect(ids(run(d, reorderElectrodes(d, { ids: ['e2'], to: 'forward' })))).toEqual([
			'e1',
			'e3',
			'e2',
			'e4',
			'e5'
		]);
		expect(ids(run(d, reorderElectrodes(d, { ids: ['e3', 'e4'], to: 'backward' })))).toEqual([
			'e1',
			'e3',
			'e4',
			'e2',
			'e5'
		]);
	});
});
