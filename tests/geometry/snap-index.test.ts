import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Electrode } from '../../src/lib/core/design/schema';
import { hitTest, hitTestAll, queryRect } from '../../src/lib/core/geometry/hit-test';
import { flattenContour } from '../../src/lib/core/geometry/flatten';
import { rectangleContour, ellipseContour } from '../../src/lib/core/geometry/primitive-shapes';
import { snapPoint } from '../../src/lib/core/geometry/snap';
import { snapCandidatesNear } from '../../src/lib/core/geometry/snap-candidates';
import { buildSpatialIndex } from '../../src/lib/core/geometry/spatial-index';

const rect = (x: number, y: number, w: number, h: number) =>
	rectangleContour({ x_mm: x, y_mm: y, width_mm: w, height_mm: h });
const el = (
	id: string,
	outline: Electrode['outline'],
	holes: Electrode['holes'] = []
): Electrode => ({
	id,
	name: id,
	kind: 'segment',
	outline,
	holes,
	common: null,
	line: null,
	locked: false
});

describe('snapPoint', () => {
	const candidates = {
		vertices: [{ x: 10, y: 10, electrodeId: 'a' }],
		edges: [{ electrodeId: 'b', ring: flattenContour(rect(20, 0, 5, 5)) }]
	};

	it('prefers a vertex, then an edge, within the tolerance', () => {
		expect(
			snapPoint({ point: { x: 10.2, y: 9.9 }, tolerance_mm: 0.5, candidates, gridPitch_mm: 1 })
		).toEqual({
			point: { x: 10, y: 10 },
			kind: 'vertex',
			target: { electrodeId: 'a' }
		});
		const edge = snapPoint({ point: { x: 19.7, y: 2.2 }, tolerance_mm: 0.5, candidates });
		expect(edge).toMatchObject({
			point: { x: 20, y: expect.closeTo(2.2, 12) },
			kind: 'edge',
			target: { electrodeId: 'b' }
		});
	});

	it('snaps directions to 15° steps from an anchor, then to the grid, else nothing', () => {
		const angle = snapPoint({
			point: { x: 10, y: 0.2 },
			tolerance_mm: 0.5,
			angleFrom: { x: 0, y: 0 },
			gridPitch_mm: 3
		});
		expect(angle.kind).toBe('angle');
		expect(angle.point.y).toBeCloseTo(0, 15);
		const thirty = snapPoint({
			point: { x: 8.7, y: 5.1 },
			tolerance_mm: 0.3,
			angleFrom: { x: 0, y: 0 }
		});
		expect(Math.atan2(thirty.point.y, thirty.point.x) * (180 / Math.PI)).toBeCloseTo(30, 12);
		expect(snapPoint({ point: { x: 4.4, y: 7.6 }, tolerance_mm: 0.1, gridPitch_mm: 0.5 })).toEqual({
			point: { x: 4.5, y: 7.5 },
			kind: 'grid'
		});
		expect(snapPoint({ point: { x: 4.4, y: 7.6 }, tolerance_mm: 0.1 })).toEqual({
			point: { x: 4.4, y: 7.6 },
			kind: 'none'
		});
	});
});

describe('spatial index', () => {
	const electrodes = [
		el('under', rect(0, 0, 10, 10)),
		el('ring', rect(2, 2, 6, 6), [rect(4, 4, 2, 2)]),
		el('disc', ellipseContour({ cx_mm: 20, cy_mm: 5, rx_mm: 3, ry_mm: 3 }))
	];
	const index = buildSpatialIndex(electrodes);

	it('hits the topmost electrode, sees through holes, and catches near edges', () => {
		expect(hitTest(index, { x: 3, y: 3 }, 0.1)).toMatchObject({ id: 'ring', part: 'fill' });
		expect(hitTest(index, { x: 5, y: 5 }, 0.1)).toMatchObject({ id: 'under', part: 'fill' });
		expect(hitTestAll(index, { x: 3, y: 3 }, 0.1).map((h) => h.id)).toEqual(['ring', 'under']);
		expect(hitTest(index, { x: 23.05, y: 5 }, 0.1)).toMatchObject({ id: 'disc', part: 'edge' });
		expect(hitTest(index, { x: 30, y: 30 }, 0.1)).toBeNull();
	});

	it('selects by marquee: wholly inside, or touching', () => {
		expect(queryRect(index, { minX: 1, minY: 1, maxX: 24, maxY: 9 })).toEqual(['ring', 'disc']);
		expect(queryRect(index, { minX: 9, minY: 4, maxX: 17.5, maxY: 6 }, 'intersects')).toEqual([
			'under',
			'disc'
		]);
		expect(queryRect(index, { minX: 4.5, minY: 4.5, maxX: 5, maxY: 5 }, 'intersects')).toEqual([
			'under'
		]);
	});

	it('collects snap candidates near a point, leaving out the edited electrode', () => {
		const near = snapCandidatesNear(index, {
			point: { x: 20, y: 5 },
			radius_mm: 4,
			excludeIds: ['under']
		});
		expect(new Set(near.vertices.map((v) => v.electrodeId))).toEqual(new Set(['disc']));
		expect(near.edges).toHaveLength(1);
	});

	it('agrees with brute force on 400 random electrodes and answers 1000 hits quickly', () => {
		fc.assert(
			fc.property(
				fc.array(
					fc.tuple(
						fc.double({ min: 0, max: 100, noNaN: true }),
						fc.double({ min: 0, max: 60, noNaN: true }),
						fc.double({ min: 0.2, max: 6, noNaN: true })
					),
					{ minLength: 400, maxLength: 400 }
				),
				fc.array(
					fc.tuple(
						fc.double({ min: 0, max: 100, noNaN: true }),
						fc.double({ min: 0, max: 60, noNaN: true })
					),
					{ minLength: 50, maxLength: 50 }
				),
				(boxes, probes) => {
					const many = boxes.map(([x, y, s], i) => el(`r${i}`, rect(x, y, s, s * 0.6)));
					const idx = buildSpatialIndex(many);
					for (const [x, y] of probes) {
						const inside = many.filter(
							(e) =>
								x >= e.outline[0].x &&
								x <= e.outline[1].x &&
								y >= e.outline[0].y &&
								y <= e.outline[2].y
						);
						const top = inside.at(-1)?.id ?? null;
						expect(hitTest(idx, { x, y }, 0)?.id ?? null).toBe(top);
					}
				}
			),
			{ numRuns: 60 }
		);
		const many = Array.from({ length: 320 }, (_, i) =>
			el(
				`d${i}`,
				ellipseContour({ cx_mm: (i % 20) * 5, cy_mm: Math.floor(i / 20) * 5, rx_mm: 2, ry_mm: 1.5 })
			)
		);
		const idx = buildSpatialIndex(many);
		for (let k = 0; k < 1000; k++) hitTest(idx, { x: (k * 7.3) % 100, y: (k * 3.1) % 80 }, 0.2);
		const rebuilt = buildSpatialIndex([...many.slice(1), many[0]], { previous: idx });
		expect(rebuilt.entries[0].rings).toBe(idx.entries[1].rings);
	});
});
