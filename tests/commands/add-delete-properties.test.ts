import { describe, expect, it } from 'vitest';
import { addElectrodes } from '../../src/lib/core/commands/add-electrodes';
import { assignElectrodes } from '../../src/lib/core/commands/assign-electrodes';
import { CommandError } from '../../src/lib/core/commands/command-error';
import { deleteElectrodes } from '../../src/lib/core/commands/delete-electrodes';
import { nextId } from '../../src/lib/core/commands/ids';
import { addLineRef, deleteLineRef, renameLineRef } from '../../src/lib/core/commands/line-refs';
import { insertedIds } from '../../src/lib/core/commands/patch-algebra';
import { setElectrodeProperties } from '../../src/lib/core/commands/set-electrode-properties';
import { byId, ids, run, square, testDesign } from './fixtures';

describe('add and delete electrodes', () => {
	it('adds with deterministic ids at the requested draw position', () => {
		const d = testDesign();
		const patch = addElectrodes(d, {
			electrodes: [{ outline: square(0, 5) }, { id: 'e2', outline: square(3, 5), name: 'Copy' }],
			index: 1
		});
		const next = run(d, patch);
		expect(insertedIds(patch)).toEqual(['e6', 'e2-2']);
		expect(ids(next)).toEqual(['e1', 'e6', 'e2-2', 'e2', 'e3', 'e4', 'e5']);
		expect(byId(next, 'e6')).toMatchObject({
			name: 'e6',
			kind: 'segment',
			holes: [],
			common: null,
			line: null
		});
		expect(nextId(next, 'e')).toBe('e7');
	});

	it('refuses bad outlines and unknown wiring', () => {
		const d = testDesign();
		expect(() => addElectrodes(d, { electrodes: [{ outline: square(0, 0).slice(0, 2) }] })).toThrow(
			CommandError
		);
		expect(() =>
			addElectrodes(d, { electrodes: [{ outline: [{ x: NaN, y: 0 }, ...square(0, 0)] }] })
		).toThrow(/finite/);
		expect(() =>
			addElectrodes(d, { electrodes: [{ outline: square(0, 0), common: 'nope' }] })
		).toThrow(/unknown common/);
	});

	it('deletes electrodes and prunes groups, dropping emptied ones', () => {
		const d = testDesign();
		const one = run(d, deleteElectrodes(d, { ids: ['e1'] }));
		expect(one.groups).toEqual([{ id: 'g1', name: 'Pair', members: ['e2'] }]);
		const both = run(d, deleteElectrodes(d, { ids: ['e1', 'e2', 'e5'] }));
		expect(ids(both)).toEqual(['e3', 'e4']);
		expect(both.groups).toEqual([]);
		expect(() => deleteElectrodes(d, { ids: ['nope'] })).toThrow(/unknown electrode "nope"/);
		expect(() => deleteElectrodes(d, { ids: [] })).toThrow(/nothing is selected/);
	});
});

describe('electrode properties and wiring', () => {
	it('sets name, kind and assignments and leaves untouched records shared', () => {
		const d = testDesign();
		const next = run(
			d,
			setElectrodeProperties(d, { ids: ['e2', 'e3'], kind: 'icon', common: 'com2', line: 'seg2' })
		);
		expect(byId(next, 'e2')).toMatchObject({
			kind: 'icon',
			common: 'com2',
			line: 'seg2',
			name: 'E2'
		});
		expect(byId(next, 'e1')).toBe(byId(d, 'e1'));
		expect(() => setElectrodeProperties(d, { ids: ['e1'], line: 'seg9' })).toThrow(
			/unknown segment line/
		);
	});

	it('assigns the selection and unassigns with null', () => {
		const d = testDesign();
		const wired = run(d, assignElectrodes(d, { ids: ['e4', 'e5'], common: 'com1', line: 'seg2' }));
		expect([byId(wired, 'e4').line, byId(wired, 'e5').common]).toEqual(['seg2', 'com1']);
		const cleared = run(wired, assignElectrodes(wired, { ids: ['e4'], common: null }));
		expect(byId(cleared, 'e4')).toMatchObject({ common: null, line: 'seg2' });
	});

	it('adds, renames and deletes commons and lines; deleting unassigns', () => {
		const d = testDesign();
		const added = run(d, addLineRef(d, { list: 'commons' }));
		expect(added.commons.at(-1)).toEqual({ id: 'com3', name: 'COM3' });
		const renamed = run(
			added,
			renameLineRef(added, { list: 'segmentLines', id: 'seg1', name: 'S-one' })
		);
		expect(renamed.segmentLines[0]).toEqual({ id: 'seg1', name: 'S-one' });
		const removed = run(renamed, deleteLineRef(renamed, { list: 'segmentLines', id: 'seg1' }));
		expect(removed.segmentLines.map((l) => l.id)).toEqual(['seg2']);
		expect(byId(removed, 'e1')).toMatchObject({ common: 'com1', line: null });
		expect(() => deleteLineRef(d, { list: 'commons', id: 'x' })).toThrow(/unknown common "x"/);
	});
});
