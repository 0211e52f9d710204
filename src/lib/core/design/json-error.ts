/**
 * Says where JSON text breaks, by line and column (both counted from 1, columns in characters),
 * and why, in the parser's own words without its character offset.
 */
export interface JsonErrorPlace {
	line: number;
	column: number;
	reason: string;
}

/** Line and column of a character offset in the text. */
export function lineAndColumn(text: string, offset: number): { line: number; column: number } {
	const end = Math.max(0, Math.min(offset, text.length));
	let line = 1;
	let lineStart = 0;
	for (let i = 0; i < end; i++) {
		if (text.charCodeAt(i) === 10) {
			line++;
			lineStart = i + 1;
		}
	}
	return { line, column: end - lineStart + 1 };
}

/** The place and reason of a JSON.parse error on the given text. */
export function describeJsonError(text: string, error: unknown): JsonErrorPlace {
	const message = error instanceof Error ? error.message : String(error);
	const at = /\bat position (\d+)/.exec(message);
	const offset = at ? Number(at[1]) : text.length;
	const reason = message
		.replace(/\s*\(line \d+ column \d+\)/, '')
		.replace(/\s*in JSON at position \d+/, '')
		.replace(/^Unexpected end of JSON input$/, 'the text ends before the JSON does')
		.replace(/^JSON\.parse: /, '');
	const first = reason.charAt(0).toLowerCase() + reason.slice(1);
	return { ...lineAndColumn(text, offset), reason: first };
}

/** "line 3, column 5: expected ',' or '}' after property value". */
export function formatJsonError(place: JsonErrorPlace): string {
	return `line ${place.line}, column ${place.column}: ${place.reason}`;
}
