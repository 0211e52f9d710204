/**
 * Reference-check helpers: compare many values against published ones with a tolerance stated in
 * the quantity's unit, and print the worst deviation so a reader sees how close we are.
 */
import { expect } from 'vitest';

export interface ReferenceCase {
	label: string;
	expected: number;
	actual: number;
}

export function expectWithin(
	cases: readonly ReferenceCase[],
	options: { tolerance: number; unit: string; source: string }
) {
	let worst = cases[0];
	let worstError = -1;
	for (const c of cases) {
		const error = Math.abs(c.actual - c.expected);
		if (!(error <= worstError)) {
			worst = c;
			worstError = Number.isNaN(error) ? Infinity : error;
		}
	}
	console.log(
		`[${options.source}] ${cases.length} values, worst |Δ| = ${worstError.toExponential(2)} ${options.unit} at ${worst.label} (tolerance ${options.tolerance} ${options.unit})`
	);
	for (const c of cases) {
		expect(
			Math.abs(c.actual - c.expected),
			`${c.label}: expected ${c.expected}, got ${c.actual}`
		).toBeLessThanOrEqual(options.tolerance);
	}
}
