/**
 * Findings of the legibility check: one per scenario and reason, naming the groups it binds on
 * and their electrodes, with the fix; one pass per scenario where everything reads; the caution
 * for safety-relevant readouts.
 */
import { finding, type Finding } from '../findings/finding';
import type { ScenarioAssessment } from './assess-scenario';

export const SAFETY_CAUTION =
	'This readout is marked safety-relevant: a misreading can hurt someone. The legibility verdicts ' +
	'are model predictions; confirm them with measured samples of the glass in the real light, and ' +
	'follow the applicable product standards and local regulations.';

export function scenarioFindings(assessment: ScenarioAssessment): Finding[] {
	const name = assessment.scenario.name;
	const byCode = new Map<
		string,
		{
			severity: 'warn' | 'fail';
			texts: string[];
			fix: string;
			groups: string[];
			electrodes: string[];
		}
	>();
	for (const group of assessment.groups) {
		for (const reason of group.reasons) {
			const entry = byCode.get(reason.code) ?? {
				severity: reason.severity,
				texts: [],
				fix: reason.fix,
				groups: [],
				electrodes: []
			};
			if (entry.texts.length === 0) entry.texts.push(reason.text);
			entry.groups.push(group.groupName);
			entry.electrodes.push(...group.members);
			byCode.set(reason.code, entry);
		}
	}
	if (byCode.size === 0) {
		return [
			finding({
				code: 'legibility.readable',
				severity: 'pass',
				message: `${name}: readable (contrast ${assessment.contrastRatio.toFixed(1)}:1, smallest VL ${Math.min(...assessment.groups.map((g) => g.visibilityLevel)).toFixed(1)}).`
			})
		];
	}
	const everyGroup = (groups: string[]) =>
		groups.length > 1 && groups.length === assessment.groups.length
			? `all ${groups.length} character groups`
			: groups.join(', ');
	return [...byCode.entries()].map(([code, e]) =>
		finding({
			code,
			severity: e.severity,
			message: `${name}: ${everyGroup(e.groups)} ${e.severity === 'fail' ? 'not readable' : 'marginal'}, ${e.texts[0]}.`,
			fix: e.fix,
			electrodes: [...new Set(e.electrodes)]
		})
	);
}

/**
 * Ghosting is a property of the cell and drive more than of the light: one finding lists every
 * scenario where off segments stand out, with the range of ΔE00, instead of one per scenario.
 */
export function mergeGhostFindings(
	findings: readonly Finding[],
	assessments: readonly ScenarioAssessment[]
): Finding[] {
	const ghosts = findings.filter((f) => f.code === 'legibility.ghosts-visible');
	if (ghosts.length <= 1) return [...findings];
	const hit = assessments.filter((a) =>
		a.groups.some((g) => g.reasons.some((r) => r.code === 'legibility.ghosts-visible'))
	);
	const values = hit.map((a) => a.deltaE00Ghost);
	const merged = finding({
		code: 'legibility.ghosts-visible',
		severity: 'warn',
		message:
			`Off segments stand out from the background by ΔE00 ${Math.min(...values).toFixed(1)}–${Math.max(...values).toFixed(1)} ` +
			`in ${hit.map((a) => a.scenario.name).join(', ')} (limit 1, common practice: a just-noticeable difference): ghosts visible.`,
		fix: ghosts[0].fix,
		electrodes: [...new Set(ghosts.flatMap((f) => f.electrodes))]
	});
	const first = findings.indexOf(ghosts[0]);
	return findings.flatMap((f, i) =>
		i === first ? [merged] : f.code === 'legibility.ghosts-visible' ? [] : [f]
	);
}

export function safetyCaution(): Finding {
	return finding({
		code: 'legibility.safety-caution',
		severity: 'warn',
		message: SAFETY_CAUTION,
		fix: 'Measure contrast and luminance of samples under the scenarios; have the readout reviewed against its product standard.'
	});
}
