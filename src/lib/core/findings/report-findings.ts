/**
 * Every finding a design report carries, once each: the findings of every analysis in the
 * report (wiring, drive, optics, rules, load, legibility and any analysis added later that keeps
 * its findings in a `findings` list) plus those of the caller's extra analyses. A finding seen
 * twice (same code, message and electrodes) is listed once.
 */
import type { DesignReport } from '../analyze-design';
import type { Finding } from './finding';

function isFinding(value: unknown): value is Finding {
	if (typeof value !== 'object' || value === null) return false;
	const f = value as Partial<Finding>;
	return (
		typeof f.code === 'string' && typeof f.severity === 'string' && Array.isArray(f.electrodes)
	);
}

/** The findings lists of the report's analyses; the cell's own are already in `opticsFindings`. */
function analysisFindings(report: DesignReport): Finding[] {
	const out: Finding[] = [...report.opticsFindings];
	for (const [key, part] of Object.entries(report)) {
		if (key === 'cell' || typeof part !== 'object' || part === null) continue;
		const list = (part as { findings?: unknown }).findings;
		if (Array.isArray(list)) out.push(...list.filter(isFinding));
	}
	return out;
}

export function reportFindings(report: DesignReport, extra: readonly Finding[] = []): Finding[] {
	const seen = new Set<string>();
	const out: Finding[] = [];
	for (const f of [...analysisFindings(report), ...extra]) {
		const key = `${f.code}\u0000${f.message}\u0000${f.electrodes.join(',')}`;
		if (seen.has(key)) continue;
		seen.add(key);
		out.push(f);
	}
	return out;
}
