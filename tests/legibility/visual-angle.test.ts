import { describe, expect, it } from 'vitest';
import { expectWithin } from '../helpers/tolerance';
import { sizeForAngle_mm, visualAngle_arcmin } from '../../src/lib/core/legibility/visual-angle';

// Heights in mm for 16′/20′/22′ at 300–3000 mm: physics notes §8 height table, from
// H = 2·D·tan(α/2) (ISO 9241-3 16′ minimum, 20–22′ preferred; NUREG-0700 Rev. 2/3).
const HEIGHTS: [number, number, number, number][] = [
	[300, 1.4, 1.75, 1.92],
	[500, 2.33, 2.91, 3.2],
	[700, 3.26, 4.07, 4.48],
	[1000, 4.65, 5.82, 6.4],
	[2000, 9.31, 11.64, 12.8],
	[3000, 13.96, 17.45, 19.2]
];

describe('visual angle of characters', () => {
	it("gives the handbook's character heights for 16′, 20′ and 22′", () => {
		const cases = HEIGHTS.flatMap(([d, h16, h20, h22]) =>
			(
				[
					[16, h16],
					[20, h20],
					[22, h22]
				] as const
			).map(([angle, h]) => ({
				label: `${angle}′ at ${d} mm`,
				expected: h,
				actual: sizeForAngle_mm({ angle_arcmin: angle, distance_mm: d })
			}))
		);
		// the table prints two decimals: half a unit of the last place
		expectWithin(cases, {
			tolerance: 0.005,
			unit: 'mm',
			source: 'physics notes §8 height table (ISO 9241-3, NUREG-0700)'
		});
	});

	it('inverts to the angle, matches the NUREG small-angle form and foreshortens off axis', () => {
		// NUREG-0700: Height = 6.283·D·MA/21600, so 4.65 mm at 1000 mm ≈ 16′
		const nuregHeight = (6.283 * 1000 * 16) / 21600;
		expectWithin(
			[
				{
					label: 'NUREG 16′ at 1 m',
					expected: 16,
					actual: visualAngle_arcmin({ size_mm: nuregHeight, distance_mm: 1000 })
				},
				// FAA rule of thumb H ≈ D/200 is ≈ 17.2′ (physics notes §8)
				{
					label: 'D/200',
					expected: 17.19,
					actual: visualAngle_arcmin({ size_mm: 5, distance_mm: 1000 })
				}
			],
			{
				tolerance: 0.01,
				unit: 'arcmin',
				source: 'NUREG-0700 Rev. 3; FAA human-factors rule of thumb'
			}
		);
		const face = visualAngle_arcmin({ size_mm: 12, distance_mm: 600 });
		const tilted = visualAngle_arcmin({ size_mm: 12, distance_mm: 600, viewAngle_deg: 60 });
		expect(tilted / face).toBeCloseTo(0.5, 3);
		expect(() => visualAngle_arcmin({ size_mm: 1, distance_mm: 0 })).toThrow(/distance/);
	});
});
