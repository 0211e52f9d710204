/** Escaping and small builders for the report's HTML: every text from a design is escaped. */

const ENTITIES: Record<string, string> = {
	'<': '&lt;',
	'>': '&gt;',
	'&': '&amp;',
	'"': '&quot;',
	"'": '&#39;'
};

/** Escapes text for HTML and drops C0/C1 control characters (other than tab and newline). */
export function escapeHtml(text: string): string {
	return (
		text
			// eslint-disable-next-line no-control-regex -- removing control characters is the point
			.replace(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/g, '')
			.replace(/[<>&"']/g, (c) => ENTITIES[c])
	);
}

/** A table with a header row; cells are escaped unless given as `{ html }`. */
export function htmlTable(options: {
	head: readonly string[];
	rows: ReadonlyArray<ReadonlyArray<string | number | { html: string }>>;
	className?: string;
	numericFrom?: number;
}): string {
	const numericFrom = options.numericFrom ?? Infinity;
	const cell = (value: string | number | { html: string }, i: number, tag: 'td' | 'th') => {
		const content = typeof value === 'object' ? value.html : escapeHtml(String(value));
		const cls = i >= numericFrom ? ' class="num"' : '';
		return `<${tag}${cls}>${content}</${tag}>`;
	};
	return [
		`<table${options.className ? ` class="${options.className}"` : ''}>`,
		`<thead><tr>${options.head.map((h, i) => cell(h, i, 'th')).join('')}</tr></thead>`,
		'<tbody>',
		...options.rows.map((r) => `<tr>${r.map((v, i) => cell(v, i, 'td')).join('')}</tr>`),
		'</tbody></table>'
	].join('\n');
}

export const fixed = (value: number | null | undefined, digits: number): string =>
	value === null || value === undefined || !Number.isFinite(value) ? '—' : value.toFixed(digits);
