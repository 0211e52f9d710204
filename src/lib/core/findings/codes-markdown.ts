/**
 * The README's table of finding codes, generated from the registry so the two cannot drift:
 * `npx tsx scripts/finding-codes-readme.ts` rewrites the part between the markers below.
 */
import { FINDING_CODES, type FindingCode } from './codes';

export const CODES_START =
	'<!-- finding-codes:start (generated: npx tsx scripts/finding-codes-readme.ts) -->';
export const CODES_END = '<!-- finding-codes:end -->';

export function findingCodesMarkdown(codes: readonly FindingCode[] = FINDING_CODES): string {
	const sorted = [...codes].sort((a, b) => a.code.localeCompare(b.code));
	const rows = sorted.map((c) => `| \`${c.code}\` | ${c.meaning.replace(/\|/g, '\\|')} |`);
	return ['| code | meaning |', '|---|---|', ...rows].join('\n');
}

/** The document with the table between the markers replaced; null when a marker is missing. */
export function withFindingCodes(document: string, table = findingCodesMarkdown()): string | null {
	const start = document.indexOf(CODES_START);
	const end = document.indexOf(CODES_END);
	if (start < 0 || end < start) return null;
	return `${document.slice(0, start + CODES_START.length)}\n${table}\n${document.slice(end)}`;
}
