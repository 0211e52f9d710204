/**
 * Reference-check helper: compares computed values with a published or derived table, prints the
 * worst deviation in the quantity's own unit, and fails naming the offending row.
 */
import { expect } from 'vitest';

export interface ReferenceRow {
	name: string;
	actual: number;
	expected: number;
}

export function expectReference(options: {
	/** What is compared, e.g. 'n_e, E7, Cauchy'. */
	label: string;
	/** Where the expected values come from. */
	source: string;
	/** Unit of the values and the tolerance, e.g. 'V', 'ms', '' for pure numbers. */
	unit: string;
	tolerance: number;
	rows: ReferenceRow[];
}): number {
	const { label, source, unit, tolerance, rows } = options;
	let worst = 0;
	let worstName = '';
	for (const row of rows) {
		expect(Number.isFinite(row.actual), `${label} ${row.name}: not finite`).toBe(true);
		const deviation = Math.abs(row.actual - row.expected);
		if (deviation >= worst) {
			worst = deviation;
			worstName = row.name;
		}
	}
	console.log(
		`${label} [${source}]: worst deviation ${worst.toExponential(3)} ${unit} at ${worstName} ` +
			`(tolerance ${tolerance} ${unit}, ${rows.length} values)`
	);
	for (const row of rows) {
		const deviation = Math.abs(row.actual - row.expected);
		expect(
			deviation,
			`${label} ${row.name}: got ${row.actual}, expected ${row.expected} ± ${tolerance} ${unit}`
		).toBeLessThanOrEqual(tolerance);
	}
	return worst;
}
