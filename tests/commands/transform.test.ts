import { describe, expect, it } from 'vitest';
import { insertGenerated } from '../../src/lib/core/commands/insert-generated';
import { mirrorElectrodes } from '../../src/lib/core/commands/mirror-electrodes';
import { moveElectrodes } from '../../src/lib/core/commands/move-electrodes';
import { rotateElectrodes } from '../../src/lib/core/commands/rotate-electrodes';
import { scaleElectrodes } from '../../src/lib/core/commands/scale-electrodes';
import { setSelectionBounds } from '../../src/lib/core/commands/set-selection-bounds';
import { selectionBounds } from '../../src/lib/core/commands/selection';
import { transformElectrodes } from '../../src/lib/core/commands/transform-electrodes';
import type { Design } from '../../src/lib/core/design/schema';
import { generateSevenSegment } from '../../src/lib/core/glyphs/seven-segment';
import { byId, electrode, run, testDesign } from './fixtures';

const curved = (): Design => ({
	...testDesign(),
	electrodes: [
		electrode('c', [
			{ x: 0, y: 0, out: [1, 0] },
			{ x: 4, y: 0, in: [0, -1] },
			{ x: 4, y: 4 }
		])
	]
});

describe('transform commands', () => {
	it('moves outlines, holes and nothing else', () => {
		const d = testDesign();
		const next = run(d, moveElectrodes(d, { ids: ['e2'], dx_mm: 1.5, dy_mm: -2 }));
		expect(byId(next, 'e2').outline[0]).toEqual({ x: 5.5, y: -2 });
		expect(byId(next, 'e3')).toBe(byId(d, 'e3'));
	});

	it('moves a generated group together with its generator position', () => {
		const d0 = testDesign();
		const d = run(
			d0,
			insertGenerated(d0, {
				generated: generateSevenSegment({
					x_mm: 10,
					y_mm: 5,
					height_mm: 10,
					width_mm: 6,
					stroke_mm: 1,
					gap_mm: 0.1
				})
			})
		);
		const group = d.groups.at(-1)!;
		const next = run(d, moveElectrodes(d, { ids: group.members, dx_mm: 2, dy_mm: 3 }));
		expect(next.groups.at(-1)!.generator!.params).toMatchObject({ x_mm: 12, y_mm: 8 });
		const partly = run(d, moveElectrodes(d, { ids: group.members.slice(1), dx_mm: 2, dy_mm: 3 }));
		expect(partly.groups.at(-1)!.generator!.params).toMatchObject({ x_mm: 10, y_mm: 5 });
	});

	it('rotates exactly by quarter turns about the selection centre (clockwise on screen)', () => {
		const d = testDesign();
		const next = run(d, rotateElectrodes(d, { ids: ['e1'], angle_deg: 90 }));
		expect(byId(next, 'e1').outline).toEqual([
			{ x: 2, y: 0 },
			{ x: 2, y: 2 },
			{ x: 0, y: 2 },
			{ x: 0, y: 0 }
		]);
		const c = curved();
		const turned = run(
			c,
			rotateElectrodes(c, { ids: ['c'], angle_deg: 90, centre: { x: 0, y: 0 } })
		);
		expect(byId(turned, 'c').outline[0].out).toEqual([0, 1]);
	});

	it('scales non-uniformly about an origin, handles included, and refuses zero', () => {
		const c = curved();
		const next = run(c, scaleElectrodes(c, { ids: ['c'], sx: 2, sy: 0.5, origin: { x: 0, y: 0 } }));
		expect(byId(next, 'c').outline).toEqual([
			{ x: 0, y: 0, out: [2, 0] },
			{ x: 8, y: 0, in: [0, -0.5] },
			{ x: 8, y: 2 }
		]);
		expect(() => scaleElectrodes(c, { ids: ['c'], sx: 0, sy: 1 })).toThrow(/non-zero/);
	});

	it('mirrors in place, horizontally and vertically', () => {
		const c = curved();
		const h = run(c, mirrorElectrodes(c, { ids: ['c'], direction: 'horizontal' }));
		expect(byId(h, 'c').outline.map((p) => [p.x, p.y])).toEqual([
			[4, 0],
			[0, 0],
			[0, 4]
		]);
		expect(byId(h, 'c').outline[0].out).toEqual([-1, 0]);
		const v = run(c, mirrorElectrodes(c, { ids: ['c'], direction: 'vertical' }));
		expect(byId(v, 'c').outline[1].in).toEqual([0, 1]);
		const [before, after] = [selectionBounds(c, ['c']), selectionBounds(v, ['c'])];
		for (const k of ['minX', 'minY', 'maxX', 'maxY'] as const)
			expect(after[k]).toBeCloseTo(before[k], 12);
	});

	it('sets a selection box numerically from exact curve bounds', () => {
		const d = testDesign();
		const next = run(
			d,
			setSelectionBounds(d, { ids: ['e1', 'e2'], x_mm: 10, y_mm: 20, width_mm: 12, height_mm: 4 })
		);
		expect(selectionBounds(next, ['e1', 'e2'])).toEqual({ minX: 10, minY: 20, maxX: 22, maxY: 24 });
		const moved = run(d, setSelectionBounds(d, { ids: ['e3'], y_mm: 7 }));
		expect(selectionBounds(moved, ['e3'])).toEqual({ minX: 8, minY: 7, maxX: 10, maxY: 9 });
		expect(() => setSelectionBounds(d, { ids: ['e3'], width_mm: 0 })).toThrow(/above 0/);
	});

	it('applies any affine matrix through transformElectrodes', () => {
		const d = testDesign();
		const next = run(d, transformElectrodes(d, { ids: ['e1'], matrix: [1, 0, 1, 1, 0, 0] }));
		expect(byId(next, 'e1').outline[2]).toEqual({ x: 4, y: 2 });
	});
});
