/**
 * Test helper: a tolerance check that states its source, tolerance and unit, prints the worst
 * deviation and names the failing index (fixtures live in fixtures.ts).
 */

import { expect } from 'vitest';

export interface ReferenceCheck {
	/** What is compared, e.g. "T_NB, parallel ideal polarizers". */
	label: string;
	/** Where the expected values come from, e.g. "Gooch & Tarry, J. Phys. D 8:1575 (1975)". */
	source: string;
	actual: ArrayLike<number>;
	expected: ArrayLike<number>;
	tolerance: number;
	/** The quantity's unit, e.g. "transmittance (0…1)". */
	unit: string;
}

/** Compare element-wise; log the worst |Δ|; fail naming the worst index. Returns the worst |Δ|. */
export function checkAgainstReference(check: ReferenceCheck): number {
	const { actual, expected, tolerance } = check;
	expect(actual.length).toBe(expected.length);
	let worst = 0;
	let worstIndex = -1;
	for (let i = 0; i < actual.length; i++) {
		const deviation = Math.abs(actual[i] - expected[i]);
		if (Number.isNaN(deviation)) {
			worst = NaN;
			worstIndex = i;
			break;
		}
		if (deviation > worst || worstIndex < 0) {
			worst = deviation;
			worstIndex = i;
		}
	}
	console.log(
		`[${check.source}] ${check.label}: worst |Δ| = ${worst.toExponential(2)} ${check.unit} ` +
			`at index ${worstIndex} of ${actual.length} (tolerance ${tolerance.toExponential(1)})`
	);
	expect(
		worst,
		`${check.label}: index ${worstIndex}: ${actual[worstIndex]} vs ${expected[worstIndex]}`
	).toBeLessThanOrEqual(tolerance);
	return worst;
}
