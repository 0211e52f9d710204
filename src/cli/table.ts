/** Plain-text tables for terminal output: left-aligned labels, right-aligned figures. */
export function formatTable(rows: readonly (readonly string[])[]): string {
	const widths: number[] = [];
	for (const row of rows)
		row.forEach((cell, i) => (widths[i] = Math.max(widths[i] ?? 0, cell.length)));
	return rows
		.map((row) =>
			row.map((cell, i) => (i === 0 ? cell.padEnd(widths[i]) : cell.padStart(widths[i]))).join('  ')
		)
		.join('\n');
}

export const fixed = (value: number | null, digits = 3) =>
	value === null ? '—' : Number.isFinite(value) ? value.toFixed(digits) : '∞';
