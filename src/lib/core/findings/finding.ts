/**
 * Findings: what every analysis (drive, wiring, rules, optics, legibility, glass) reports.
 *
 * A finding has a stable code (`area.what`, our own words, listed in README "Finding codes"), a
 * severity, a message in plain words, the fix a designer can make, and the electrodes it concerns
 * (ids; empty when it is about the design as a whole). A location in glass millimetres lets the
 * app zoom to it. Codes never change meaning once released: a hardware team's CI may gate on them.
 */
export type Severity = 'pass' | 'warn' | 'fail';

export interface FindingLocation {
	x_mm: number;
	y_mm: number;
	width_mm: number;
	height_mm: number;
}

export interface Finding {
	/** Stable code, e.g. `drive.window-too-low`. */
	code: string;
	severity: Severity;
	message: string;
	/** What the designer can change; empty for a pass. */
	fix: string;
	/** Ids of the electrodes the finding concerns. */
	electrodes: string[];
	location?: FindingLocation;
}

/** Builds a finding; `electrodes` and `fix` default to none. */
export function finding(options: {
	code: string;
	severity: Severity;
	message: string;
	fix?: string;
	electrodes?: readonly string[];
	location?: FindingLocation;
}): Finding {
	const result: Finding = {
		code: options.code,
		severity: options.severity,
		message: options.message,
		fix: options.fix ?? '',
		electrodes: [...(options.electrodes ?? [])]
	};
	if (options.location) result.location = { ...options.location };
	return result;
}

const RANK: Record<Severity, number> = { pass: 0, warn: 1, fail: 2 };

export function overallSeverity(findings: readonly Finding[]): Severity {
	let worst: Severity = 'pass';
	for (const f of findings) if (RANK[f.severity] > RANK[worst]) worst = f.severity;
	return worst;
}

/** Failures first, then warnings, then passes; stable within a severity. */
export function sortFindings(findings: readonly Finding[]): Finding[] {
	return findings
		.map((f, index) => ({ f, index }))
		.sort((a, b) => RANK[b.f.severity] - RANK[a.f.severity] || a.index - b.index)
		.map(({ f }) => f);
}
