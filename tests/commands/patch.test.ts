import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { diffDesigns } from '../../src/lib/core/commands/diff-design';
import {
	applyPatch,
	DOCUMENT_FIELDS,
	PatchConflictError,
	type Patch
} from '../../src/lib/core/commands/patch';
import {
	insertedIds,
	invertPatch,
	isNoopPatch,
	removedIds,
	squashPatches
} from '../../src/lib/core/commands/patch-algebra';
import type { Design } from '../../src/lib/core/design/schema';
import { electrode, ids, square, testDesign } from './fixtures';

/** A random edit of the electrode list: drop some, change some, insert some, shuffle some. */
const listEditArb = fc.record({
	drop: fc.array(fc.nat(), { maxLength: 3 }),
	change: fc.array(fc.nat(), { maxLength: 3 }),
	insert: fc.array(fc.nat(), { maxLength: 3 }),
	swap: fc.array(fc.tuple(fc.nat(), fc.nat()), { maxLength: 2 }),
	rename: fc.boolean()
});

type ListEdit = {
	drop: number[];
	change: number[];
	insert: number[];
	swap: [number, number][];
	rename: boolean;
};

let serial = 0;
function edited(design: Design, edit: ListEdit): Design {
	let list = design.electrodes.slice();
	for (const d of edit.drop) if (list.length > 0) list.splice(d % list.length, 1);
	for (const c of edit.change)
		if (list.length > 0)
			list[c % list.length] = { ...list[c % list.length], name: `changed${serial++}` };
	for (const i of edit.insert)
		list.splice(i % (list.length + 1), 0, electrode(`n${serial++}`, square(i, i)));
	for (const [a, b] of edit.swap) {
		if (list.length < 2) continue;
		const [x, y] = [a % list.length, b % list.length];
		[list[x], list[y]] = [list[y], list[x]];
	}
	list = [...list];
	return { ...design, electrodes: list, name: edit.rename ? `renamed${serial++}` : design.name };
}

describe('patches', () => {
	it('applies inserts, removes and updates at their indices, sharing unchanged records', () => {
		const before = testDesign();
		const after = {
			...before,
			electrodes: [
				electrode('x', square(9, 9)),
				...before.electrodes.slice(1, 3),
				{ ...before.electrodes[3], name: 'four' }
			]
		};
		const patch = diffDesigns(before, after);
		const result = applyPatch(before, patch);
		expect(result).toStrictEqual(after);
		expect(result.electrodes[1]).toBe(before.electrodes[1]);
		expect(result.groups).toBe(before.groups);
		expect(before.electrodes.map((e) => e.id)).toEqual(['e1', 'e2', 'e3', 'e4', 'e5']);
		expect(insertedIds(patch)).toEqual(['x']);
		expect(removedIds(patch).sort()).toEqual(['e1', 'e5']);
	});

	it('records a pure reorder as moves (longest unchanged run stays out of the patch)', () => {
		const before = testDesign();
		const e = before.electrodes;
		const after = { ...before, electrodes: [e[4], e[0], e[1], e[2], e[3]] };
		const patch = diffDesigns(before, after);
		expect(patch.electrodes?.size).toBe(1);
		expect(applyPatch(before, patch)).toStrictEqual(after);
		expect(applyPatch(after, invertPatch(patch))).toStrictEqual(before);
	});

	it('rejects a patch that does not fit the design', () => {
		const design = testDesign();
		const patch = diffDesigns(design, { ...design, electrodes: design.electrodes.slice(1) });
		const other = { ...design, electrodes: design.electrodes.slice(2) };
		expect(() => applyPatch(other, patch)).toThrow(PatchConflictError);
		const insert = diffDesigns(design, {
			...design,
			electrodes: [...design.electrodes, electrode('z', square(0, 0))]
		});
		const twice = applyPatch(design, insert);
		expect(() => applyPatch(twice, insert)).toThrow(/already exists/);
	});

	it('diff, apply and invert round-trip random list edits exactly', () => {
		fc.assert(
			fc.property(listEditArb, (edit) => {
				const before = testDesign();
				const after = edited(before, edit);
				const patch = diffDesigns(before, after);
				expect(applyPatch(before, patch)).toStrictEqual(after);
				expect(applyPatch(after, invertPatch(patch))).toStrictEqual(before);
			}),
			{ numRuns: 300 }
		);
	});

	it('squashing a chain of patches equals applying them one by one', () => {
		fc.assert(
			fc.property(fc.array(listEditArb, { minLength: 1, maxLength: 6 }), (edits) => {
				const designs = [testDesign()];
				const patches: Patch[] = [];
				for (const edit of edits) {
					const next = edited(designs[designs.length - 1], edit);
					patches.push(diffDesigns(designs[designs.length - 1], next));
					designs.push(next);
				}
				const squashed = squashPatches(patches);
				expect(applyPatch(designs[0], squashed)).toStrictEqual(designs[designs.length - 1]);
				expect(applyPatch(designs[designs.length - 1], invertPatch(squashed))).toStrictEqual(
					designs[0]
				);
			}),
			{ numRuns: 300 }
		);
	});

	it('recognises no-op patches, including an edit and its inverse squashed', () => {
		const design = testDesign();
		expect(isNoopPatch({})).toBe(true);
		const patch = diffDesigns(design, {
			...design,
			name: 'x',
			electrodes: design.electrodes.slice(1)
		});
		expect(isNoopPatch(patch)).toBe(false);
		expect(isNoopPatch(squashPatches([patch, invertPatch(patch)]))).toBe(true);
		expect(ids(applyPatch(design, squashPatches([patch, invertPatch(patch)])))).toEqual(
			ids(design)
		);
	});
});

describe('document fields', () => {
	it('covers every whole-value field of the schema, including cell and lighting', () => {
		expect([...DOCUMENT_FIELDS].sort()).toEqual([
			'cell',
			'drive',
			'glass',
			'glassArt',
			'legibility',
			'lighting',
			'load',
			'name',
			'orientation',
			'pinout',
			'rules',
			'thresholds',
			'viewing'
		]);
		const before = testDesign();
		const after = {
			...before,
			cell: { ...before.cell, gap_um: 4 },
			lighting: { ...before.lighting, illuminance_lx: 100 }
		};
		const patch = diffDesigns(before, after);
		expect(Object.keys(patch.fields ?? {}).sort()).toEqual(['cell', 'lighting']);
		expect(applyPatch(after, invertPatch(patch))).toStrictEqual(before);
	});
});
