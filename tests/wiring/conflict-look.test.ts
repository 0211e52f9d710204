import { describe, expect, it } from 'vitest';
import { electrodeLook, CONFLICT_OUTLINE } from '../../src/lib/editor/electrode-look';
import { conflictingElectrodes } from '../../src/lib/core/wiring/crossing-matrix';
import { electrode, square } from '../commands/fixtures';
import { testDesign } from '../commands/fixtures';

describe('conflicts on the drawing', () => {
	it('finds exactly the electrodes sharing a crossing', () => {
		const base = testDesign();
		const d = {
			...base,
			electrodes: base.electrodes.map((e) =>
				e.id === 'e2' || e.id === 'e3' ? { ...e, common: 'com1', line: 'seg1' } : e
			)
		};
		expect([...conflictingElectrodes(d)].sort()).toEqual(['e1', 'e2', 'e3']);
		expect(conflictingElectrodes(base).size).toBe(0);
	});

	it('outlines them in red in both views, selected or not', () => {
		const e = electrode('x', square(0, 0), { common: 'com1', line: 'seg1' });
		const inputs = {
			commonIndex: new Map([['com1', 0]]),
			colourOfCommon: () => 'blue',
			selection: new Set<string>(),
			hoverId: null,
			appearance: null,
			conflicts: new Set(['x'])
		};
		expect(electrodeLook(e, inputs)).toMatchObject({ fill: 'blue', stroke: CONFLICT_OUTLINE });
		const selected = electrodeLook(e, { ...inputs, selection: new Set(['x']) });
		expect(selected.stroke).toBe(CONFLICT_OUTLINE);
		const painted = { ...inputs, appearance: { background: '#888', segmentOn: '#111' } };
		expect(electrodeLook(e, painted)).toMatchObject({ fill: '#111', stroke: CONFLICT_OUTLINE });
		expect(electrodeLook(e, { ...inputs, conflicts: new Set() }).stroke).toBeNull();
	});
});
