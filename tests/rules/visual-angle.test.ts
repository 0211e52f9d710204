import { describe, it } from 'vitest';
import { sizeForVisualAngle_mm, visualAngle_arcmin } from '../../src/lib/core/rules/visual-angle';
import { expectWithin, type ReferenceCase } from '../helpers/tolerance';

// Character heights for 16′ (ISO 9241-3 minimum), 20′ and 22′ (preferred) at viewing distances
// D, as tabulated from H = 2·D·tan(α/2) (NUREG-0700 Rev. 2 gives the same as H = 6.283·D·α/21600),
// rounded to 0.01 mm.
const TABLE: [number, number, number, number][] = [
	[300, 1.4, 1.75, 1.92],
	[500, 2.33, 2.91, 3.2],
	[700, 3.26, 4.07, 4.48],
	[1000, 4.65, 5.82, 6.4],
	[2000, 9.31, 11.64, 12.8],
	[3000, 13.96, 17.45, 19.2]
];

describe('visual angle', () => {
	it('reproduces the character-height table for 16′, 20′ and 22′ (ISO 9241-3, NUREG-0700)', () => {
		const heights: ReferenceCase[] = [];
		const angles: ReferenceCase[] = [];
		for (const [distance_mm, ...row] of TABLE) {
			[16, 20, 22].forEach((angle_arcmin, k) => {
				heights.push({
					label: `${angle_arcmin}′ at ${distance_mm} mm`,
					expected: row[k],
					actual: sizeForVisualAngle_mm({ angle_arcmin, distance_mm })
				});
				angles.push({
					label: `${row[k]} mm at ${distance_mm} mm`,
					expected: angle_arcmin,
					actual: visualAngle_arcmin({ size_mm: row[k], distance_mm })
				});
			});
		}
		// The table is rounded to 0.01 mm: half a unit in the last place.
		expectWithin(heights, {
			tolerance: 0.005 + 1e-9,
			unit: 'mm',
			source: 'ISO 9241-3 / NUREG-0700 heights'
		});
		// 0.005 mm at 300 mm is 0.057′, the table's own rounding seen as an angle.
		expectWithin(angles, {
			tolerance: 0.06,
			unit: 'arcmin',
			source: 'ISO 9241-3 / NUREG-0700 heights'
		});
	});
});
