/** One finding as terminal lines: mark, stable code, message, then the fix indented beneath. */
import type { Finding } from '../lib/core/findings/finding';

const MARK = { pass: 'ok  ', warn: 'warn', fail: 'FAIL' } as const;

export function findingLines(f: Finding): string[] {
	const lines = [`${MARK[f.severity]}  [${f.code}] ${f.message}`];
	if (f.fix) lines.push(`      fix: ${f.fix}`);
	return lines;
}
