/** CSV text (RFC 4180): fields with a comma, quote or line break are quoted, quotes doubled. */
export function csvField(value: string | number): string {
	const text = String(value);
	return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function csvText(rows: ReadonlyArray<ReadonlyArray<string | number>>): string {
	return rows.map((row) => row.map(csvField).join(',')).join('\r\n') + '\r\n';
}
