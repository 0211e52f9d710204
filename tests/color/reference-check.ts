/*
 * Reference-check helper for tests/color: compares computed values with published ones,
 * prints the worst deviation in the quantity's own unit, and fails naming the offending row.
 */
import { expect } from 'vitest';

export interface ReferenceRow {
	/** What the row is, e.g. 'D65 x' or 'pair 17'. */
	readonly label: string;
	readonly computed: number;
	readonly published: number;
}

export interface ReferenceCheck {
	/** Quantity and its unit, e.g. 'chromaticity x, y' and 'xy'. */
	readonly quantity: string;
	readonly unit: string;
	/** Largest accepted |computed − published|, in `unit`. */
	readonly tolerance: number;
	/** Where the published values come from. */
	readonly source: string;
	readonly rows: readonly ReferenceRow[];
}

/** Assert every row within tolerance; log and return the worst absolute deviation. */
export function expectWithinReference(check: ReferenceCheck): number {
	expect(check.rows.length, `${check.quantity}: no rows to check`).toBeGreaterThan(0);
	let worst = check.rows[0];
	for (const row of check.rows)
		if (Math.abs(row.computed - row.published) > Math.abs(worst.computed - worst.published))
			worst = row;
	const worstDeviation = Math.abs(worst.computed - worst.published);
	console.log(
		`${check.quantity}: worst deviation ${worstDeviation.toExponential(2)} ${check.unit} ` +
			`at ${worst.label} (tolerance ${check.tolerance} ${check.unit}; ${check.source})`
	);
	for (const row of check.rows) {
		const deviation = Math.abs(row.computed - row.published);
		expect(
			deviation,
			`${check.quantity}, ${row.label}: computed ${row.computed}, published ${row.published}`
		).toBeLessThanOrEqual(check.tolerance);
	}
	return worstDeviation;
}
