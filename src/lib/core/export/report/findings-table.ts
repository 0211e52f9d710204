/**
 * A table of findings for the report: verdict word, stable code, message, fix and electrodes.
 * A code that repeats more than `PER_CODE` times shows its first findings and then one row that
 * counts the rest and names their electrodes, so a page set stays readable while every code and
 * every concerned electrode is still listed.
 */
import { sortFindings, type Finding } from '../../findings/finding';
import { escapeHtml, htmlTable } from './html-text';

const WORD = { pass: 'OK', warn: 'Check', fail: 'Fails' } as const;
export const PER_CODE = 3;
const NAMES_SHOWN = 24;

type Row = ReadonlyArray<string | { html: string }>;

function electrodeList(ids: readonly string[], names: ReadonlyMap<string, string>): string {
	if (ids.length === 0) return '—';
	const shown = ids.slice(0, NAMES_SHOWN).map((id) => names.get(id) ?? id);
	const rest = ids.length - shown.length;
	return shown.join(', ') + (rest > 0 ? ` and ${rest} more` : '');
}

function row(f: Finding, message: string, names: ReadonlyMap<string, string>): Row {
	return [
		{ html: `<b class="${f.severity}">${WORD[f.severity]}</b>` },
		{ html: `<code>${escapeHtml(f.code)}</code><br>${escapeHtml(message)}` },
		f.fix || '—',
		electrodeList(f.electrodes, names)
	];
}

export function findingsTable(
	findings: readonly Finding[],
	names: ReadonlyMap<string, string>
): string {
	if (findings.length === 0) return '<p>No findings.</p>';
	const sorted = sortFindings(findings);
	const byKey = new Map<string, Finding[]>();
	for (const f of sorted) {
		const key = `${f.severity}|${f.code}`;
		byKey.set(key, [...(byKey.get(key) ?? []), f]);
	}
	const rows: Row[] = [];
	for (const group of byKey.values()) {
		for (const f of group.slice(0, PER_CODE)) rows.push(row(f, f.message, names));
		const rest = group.slice(PER_CODE);
		if (rest.length === 0) continue;
		const electrodes = [...new Set(rest.flatMap((f) => f.electrodes))];
		rows.push(
			row(
				{ ...rest[0], electrodes },
				`${rest.length} more finding${rest.length === 1 ? '' : 's'} like the above.`,
				names
			)
		);
	}
	return htmlTable({
		head: ['', 'Code and finding', 'Fix', 'Electrodes'],
		className: 'findings',
		rows
	});
}
