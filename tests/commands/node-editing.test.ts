import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deletePoint } from '../../src/lib/core/commands/delete-point';
import { insertPoint } from '../../src/lib/core/commands/insert-point';
import { moveHandle } from '../../src/lib/core/commands/move-handle';
import { movePoint } from '../../src/lib/core/commands/move-point';
import { isSmoothPoint } from '../../src/lib/core/commands/point-ref';
import { togglePointSmooth } from '../../src/lib/core/commands/toggle-point-smooth';
import type { Contour, Design } from '../../src/lib/core/design/schema';
import { flattenContour } from '../../src/lib/core/geometry/flatten';
import { nearestPointOnContour } from '../../src/lib/core/geometry/distance';
import { byId, electrode, run, square, testDesign } from './fixtures';

const blob: Contour = [
	{ x: 0, y: 0, out: [2, -1] },
	{ x: 6, y: 0, in: [-1, -2], out: [1, 2] },
	{ x: 6, y: 5, in: [1, 1] },
	{ x: 0, y: 5 }
];
const design = (): Design => ({
	...testDesign(),
	electrodes: [electrode('b', blob, { holes: [square(2, 2, 1)] })]
});
const ref = (index: number, contour = 0) => ({ electrodeId: 'b', contour, index });

describe('node editing', () => {
	it('moves a point with its handles, on the outline or a hole', () => {
		const d = design();
		const next = run(d, movePoint(d, { ref: ref(1), x_mm: 7, y_mm: 1 }));
		expect(byId(next, 'b').outline[1]).toEqual({ x: 7, y: 1, in: [-1, -2], out: [1, 2] });
		const hole = run(d, movePoint(d, { ref: ref(0, 1), x_mm: 2.5, y_mm: 2.5 }));
		expect(byId(hole, 'b').holes[0][0]).toEqual({ x: 2.5, y: 2.5 });
		expect(() => movePoint(d, { ref: ref(9), x_mm: 0, y_mm: 0 })).toThrow(/no point 9/);
		expect(() => movePoint(d, { ref: ref(0, 5), x_mm: 0, y_mm: 0 })).toThrow(/no contour 5/);
	});

	it('moves a handle freely, aligned or mirrored; zero removes it', () => {
		const d = design();
		const p1 = (x: Design) => byId(x, 'b').outline[1];
		const free = run(
			d,
			moveHandle(d, { ref: ref(1), side: 'out', dx_mm: 3, dy_mm: 0, partner: 'free' })
		);
		expect(p1(free)).toEqual({ x: 6, y: 0, in: [-1, -2], out: [3, 0] });
		const mirrored = run(
			d,
			moveHandle(d, { ref: ref(1), side: 'out', dx_mm: 3, dy_mm: 4, partner: 'mirrored' })
		);
		expect(p1(mirrored).in).toEqual([-3, -4]);
		const aligned = run(
			d,
			moveHandle(d, { ref: ref(1), side: 'out', dx_mm: 0, dy_mm: 2, partner: 'aligned' })
		);
		expect(p1(aligned).in![0]).toBeCloseTo(0, 12);
		expect(p1(aligned).in![1]).toBeCloseTo(-Math.hypot(1, 2), 12);
		expect(isSmoothPoint(p1(aligned))).toBe(true);
		const removed = run(d, moveHandle(d, { ref: ref(0), side: 'out', dx_mm: 0, dy_mm: 0 }));
		expect(byId(removed, 'b').outline[0]).toEqual({ x: 0, y: 0 });
	});

	it('keeps a smooth point smooth by default when one handle moves', () => {
		const d = design();
		const smooth = run(d, togglePointSmooth(d, { ref: ref(2) }));
		const next = run(smooth, moveHandle(smooth, { ref: ref(2), side: 'in', dx_mm: 0, dy_mm: -3 }));
		expect(isSmoothPoint(byId(next, 'b').outline[2])).toBe(true);
	});

	it('splits a Bezier edge without changing the curve (samples within 1e-9 mm)', () => {
		fc.assert(
			fc.property(
				fc.integer({ min: 0, max: 3 }),
				fc.double({ min: 0.01, max: 0.99, noNaN: true }),
				(edge, t) => {
					const d = design();
					const next = run(
						d,
						insertPoint(d, { ref: { electrodeId: 'b', contour: 0 }, edgeIndex: edge, t })
					);
					const after = byId(next, 'b').outline;
					expect(after).toHaveLength(5);
					const samples = flattenContour(after, { tolerance_um: 0.01 });
					let worst = 0;
					for (let i = 0; i < samples.length; i += 2) {
						worst = Math.max(
							worst,
							nearestPointOnContour(blob, { x: samples[i], y: samples[i + 1] }).distance_mm
						);
					}
					expect(worst).toBeLessThan(1e-9);
				}
			),
			{ numRuns: 60 }
		);
	});

	it('adds a plain point on a straight edge', () => {
		const d = testDesign();
		const next = run(
			d,
			insertPoint(d, { ref: { electrodeId: 'e1', contour: 0 }, edgeIndex: 0, t: 0.25 })
		);
		expect(byId(next, 'e1').outline[1]).toEqual({ x: 0.5, y: 0 });
		expect(() =>
			insertPoint(d, { ref: { electrodeId: 'e1', contour: 0 }, edgeIndex: 0, t: 1 })
		).toThrow(/strictly/);
	});

	it('deletes points but keeps at least three', () => {
		const d = design();
		const next = run(d, deletePoint(d, { ref: ref(3) }));
		expect(byId(next, 'b').outline).toHaveLength(3);
		expect(() => deletePoint(next, { ref: ref(0) })).toThrow(/at least 3/);
	});

	it('toggles corner → smooth (collinear handles, a third of the neighbour distance) → corner', () => {
		const d = testDesign();
		const smooth = run(
			d,
			togglePointSmooth(d, { ref: { electrodeId: 'e1', contour: 0, index: 1 } })
		);
		const p = byId(smooth, 'e1').outline[1];
		expect(isSmoothPoint(p)).toBe(true);
		expect(Math.hypot(...p.out!)).toBeCloseTo(2 / 3, 12);
		const corner = run(
			smooth,
			togglePointSmooth(smooth, { ref: { electrodeId: 'e1', contour: 0, index: 1 } })
		);
		expect(byId(corner, 'e1').outline[1]).toEqual({ x: 2, y: 0 });
	});
});
