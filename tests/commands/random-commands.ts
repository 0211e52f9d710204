/**
 * Random command sequences for property tests: each step is a few random numbers that are turned
 * into a command against the *current* design (picking existing ids by index), so every step is
 * meaningful however the design has changed. A step is only generated for a command whose
 * preconditions the design meets (ids to pick from exist); a command may still refuse with a
 * CommandError (an edit the geometry does not allow), and every other error fails the test.
 */
import fc from 'fast-check';
import { addElectrodes } from '../../src/lib/core/commands/add-electrodes';
import { alignElectrodes } from '../../src/lib/core/commands/align-electrodes';
import { duplicateElectrodes } from '../../src/lib/core/commands/duplicate-electrodes';
import { deleteElectrodes } from '../../src/lib/core/commands/delete-electrodes';
import { distributeElectrodes } from '../../src/lib/core/commands/distribute-electrodes';
import { groupElectrodes, ungroupElectrodes } from '../../src/lib/core/commands/group-electrodes';
import { addLineRef, deleteLineRef, renameLineRef } from '../../src/lib/core/commands/line-refs';
import { linearArray } from '../../src/lib/core/commands/array-electrodes';
import { mirrorElectrodes } from '../../src/lib/core/commands/mirror-electrodes';
import { moveElectrodes } from '../../src/lib/core/commands/move-electrodes';
import { movePoint } from '../../src/lib/core/commands/move-point';
import { moveHandle } from '../../src/lib/core/commands/move-handle';
import { insertPoint } from '../../src/lib/core/commands/insert-point';
import { deletePoint } from '../../src/lib/core/commands/delete-point';
import { togglePointSmooth } from '../../src/lib/core/commands/toggle-point-smooth';
import { reorderElectrodes } from '../../src/lib/core/commands/reorder-electrodes';
import { rotateElectrodes } from '../../src/lib/core/commands/rotate-electrodes';
import { scaleElectrodes } from '../../src/lib/core/commands/scale-electrodes';
import { setElectrodeProperties } from '../../src/lib/core/commands/set-electrode-properties';
import { setSelectionBounds } from '../../src/lib/core/commands/set-selection-bounds';
import { insertGenerated } from '../../src/lib/core/commands/insert-generated';
import { regenerateGroup } from '../../src/lib/core/commands/regenerate-group';
import { copySelection } from '../../src/lib/core/commands/clipboard';
import { pasteClipboard } from '../../src/lib/core/commands/paste-clipboard';
import { booleanElectrodes } from '../../src/lib/core/commands/boolean-electrodes';
import { editDesign } from '../../src/lib/core/commands/design-draft';
import { CommandError } from '../../src/lib/core/commands/command-error';
import type { Patch } from '../../src/lib/core/commands/patch';
import type { Design } from '../../src/lib/core/design/schema';
import { generateBarGraph } from '../../src/lib/core/glyphs/bar-graph';
import { generateSevenSegment } from '../../src/lib/core/glyphs/seven-segment';
import { square } from './fixtures';

export interface Step {
	kind: number;
	a: number;
	b: number;
	c: number;
	x: number;
	y: number;
}

export const stepArb: fc.Arbitrary<Step> = fc.record({
	kind: fc.nat(),
	a: fc.nat(),
	b: fc.nat(),
	c: fc.nat(),
	x: fc
		.double({ min: -5, max: 5, noNaN: true })
		.map((v) => (v === 0 ? 0 : Math.round(v * 1000) / 1000)),
	y: fc
		.double({ min: -5, max: 5, noNaN: true })
		.map((v) => (v === 0 ? 0 : Math.round(v * 1000) / 1000))
});

const pick = <T>(list: readonly T[], n: number): T => list[n % list.length];

function selection(design: Design, s: Step): string[] {
	const ids = design.electrodes.map((e) => e.id);
	const count = 1 + (s.b % Math.min(3, ids.length));
	return Array.from(new Set(Array.from({ length: count }, (_, k) => pick(ids, s.a + k * 7))));
}

type Maker = (design: Design, s: Step) => Patch;
/** What a maker needs from the design to be applicable. */
type Needs = 'commons' | 'groups' | 'generated';

/** Makers (by index in MAKERS) that pick a common, a group or a generated group. */
const NEEDS: Partial<Record<number, Needs>> = {
	14: 'groups',
	22: 'commons',
	23: 'commons',
	25: 'generated'
};

function meets(design: Design, needs: Needs | undefined): boolean {
	if (needs === 'commons') return design.commons.length > 0;
	if (needs === 'groups') return design.groups.length > 0;
	if (needs === 'generated') return design.groups.some((g) => g.generator);
	return true;
}

const MAKERS: readonly Maker[] = [
	(d, s) => moveElectrodes(d, { ids: selection(d, s), dx_mm: s.x, dy_mm: s.y }),
	(d, s) => rotateElectrodes(d, { ids: selection(d, s), angle_deg: s.x * 30 }),
	(d, s) => scaleElectrodes(d, { ids: selection(d, s), sx: 1 + s.x / 10, sy: 1 - s.y / 10 }),
	(d, s) =>
		mirrorElectrodes(d, { ids: selection(d, s), direction: s.c % 2 ? 'horizontal' : 'vertical' }),
	(d, s) => setSelectionBounds(d, { ids: selection(d, s), x_mm: s.x, width_mm: 1 + Math.abs(s.y) }),
	(d, s) =>
		setElectrodeProperties(d, {
			ids: selection(d, s),
			name: `n${s.c % 10}`,
			kind: s.c % 2 ? 'icon' : 'segment'
		}),
	(d, s) =>
		setElectrodeProperties(d, {
			ids: selection(d, s),
			common: d.commons.length ? pick(d.commons, s.c).id : null,
			line: null
		}),
	(d, s) =>
		addElectrodes(d, {
			electrodes: [{ outline: square(s.x, s.y, 1 + (s.c % 3)) }],
			index: s.a % (d.electrodes.length + 1)
		}),
	(d, s) => deleteElectrodes(d, { ids: selection(d, s) }),
	(d, s) => duplicateElectrodes(d, { ids: selection(d, s), dx_mm: s.x, dy_mm: s.y }),
	(d, s) => linearArray(d, { ids: selection(d, s), count: 2 + (s.c % 2), dx_mm: 3, dy_mm: s.y }),
	(d, s) =>
		alignElectrodes(d, {
			ids: selection(d, s),
			edge: pick(['left', 'centre', 'right', 'top', 'middle', 'bottom'] as const, s.c)
		}),
	(d, s) =>
		distributeElectrodes(d, {
			ids: selection(d, { ...s, b: 2 }),
			axis: s.c % 2 ? 'horizontal' : 'vertical'
		}),
	(d, s) => groupElectrodes(d, { ids: selection(d, s) }),
	(d, s) => ungroupElectrodes(d, { groupId: pick(d.groups, s.a).id }),
	(d, s) =>
		reorderElectrodes(d, {
			ids: selection(d, s),
			to: pick(['front', 'back', 'forward', 'backward'] as const, s.c)
		}),
	(d, s) => {
		const e = pick(d.electrodes, s.a);
		return movePoint(d, {
			ref: { electrodeId: e.id, contour: 0, index: s.b % e.outline.length },
			x_mm: s.x,
			y_mm: s.y
		});
	},
	(d, s) => {
		const e = pick(d.electrodes, s.a);
		const ref = { electrodeId: e.id, contour: 0, index: s.b % e.outline.length };
		return moveHandle(d, {
			ref,
			side: s.c % 2 ? 'in' : 'out',
			dx_mm: s.x,
			dy_mm: s.y,
			partner: pick(['free', 'aligned', 'mirrored'] as const, s.c)
		});
	},
	(d, s) => {
		const e = pick(d.electrodes, s.a);
		return insertPoint(d, {
			ref: { electrodeId: e.id, contour: 0 },
			edgeIndex: s.b % e.outline.length,
			t: 0.25 + (s.c % 3) * 0.25
		});
	},
	(d, s) => {
		const e = pick(d.electrodes, s.a);
		return deletePoint(d, {
			ref: { electrodeId: e.id, contour: 0, index: s.b % e.outline.length }
		});
	},
	(d, s) => {
		const e = pick(d.electrodes, s.a);
		return togglePointSmooth(d, {
			ref: { electrodeId: e.id, contour: 0, index: s.b % e.outline.length }
		});
	},
	(d, s) => addLineRef(d, { list: s.c % 2 ? 'commons' : 'segmentLines' }),
	(d, s) => renameLineRef(d, { list: 'commons', id: pick(d.commons, s.a).id, name: `C${s.b % 9}` }),
	(d, s) => deleteLineRef(d, { list: 'commons', id: pick(d.commons, s.a).id }),
	(d, s) =>
		insertGenerated(d, {
			generated:
				s.c % 2
					? generateSevenSegment({
							x_mm: s.x,
							y_mm: s.y,
							height_mm: 8,
							width_mm: 5,
							stroke_mm: 1,
							gap_mm: 0.1,
							decimalPoint: s.b % 2 === 0
						})
					: generateBarGraph({
							count: 2 + (s.b % 5),
							width_mm: 1,
							height_mm: 2,
							x_mm: s.x,
							y_mm: s.y
						})
		}),
	(d, s) => {
		const generated = d.groups.filter((g) => g.generator);
		const g = pick(generated, s.a);
		const params =
			g.generator!.kind === 'bar-graph'
				? { count: 1 + (s.b % 6) }
				: { slant_deg: s.x, decimalPoint: s.b % 2 === 0 };
		return regenerateGroup(d, { groupId: g.id, params });
	},
	(d, s) =>
		pasteClipboard(d, {
			payload: copySelection(d, { ids: selection(d, s) }),
			dx_mm: s.x,
			dy_mm: s.y
		}),
	(d, s) =>
		booleanElectrodes(d, {
			ids: selection(d, { ...s, b: 1 }),
			operation: pick(['unite', 'subtract', 'intersect'] as const, s.c)
		}),
	(d, s) => editDesign(d, (draft) => draft.setField('name', `design ${s.a % 5}`)),
	(d, s) =>
		editDesign(d, (draft) =>
			draft.setField('lighting', { ...d.lighting, illuminance_lx: 100 + (s.a % 5) * 100 })
		)
];

/** The patch for a step, or null when the step does not apply to this design. */
export function patchForStep(design: Design, step: Step): Patch | null {
	try {
		if (design.electrodes.length === 0)
			return addElectrodes(design, { electrodes: [{ outline: square(step.x, step.y) }] });
		const applicable = MAKERS.filter((_, index) => meets(design, NEEDS[index]));
		return applicable[step.kind % applicable.length](design, step);
	} catch (error) {
		if (
			error instanceof CommandError ||
			(error instanceof Error &&
				/islands|vanishes|no room|too (narrow|short)|empty/.test(error.message))
		)
			return null;
		throw error;
	}
}
