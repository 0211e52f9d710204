/**
 * Rules on what the design uses: an empty design has nothing to check and must not pass; a
 * common or segment line that no electrode uses costs a driver pin and a connector contact for
 * nothing (and an unused common still needs its back plate driven). Electrodes without a common
 * or line are reported by the wiring check (`wiring.unassigned`), not repeated here.
 */
import { finding, type Finding } from '../findings/finding';
import type { RuleContext } from './rule-context';

export function usageFindings(ctx: RuleContext): Finding[] {
	const { design } = ctx;
	if (design.electrodes.length === 0) {
		return [
			finding({
				code: 'rule.empty-design',
				severity: 'fail',
				message: 'The design has no electrodes: there is nothing to check.',
				fix: 'Draw or generate the segments and icons of the display.'
			})
		];
	}
	const findings: Finding[] = [];
	const usedCommons = new Set(design.electrodes.map((e) => e.common));
	const usedLines = new Set(design.electrodes.map((e) => e.line));
	const idleCommons = design.commons.filter((c) => !usedCommons.has(c.id)).map((c) => c.name);
	const idleLines = design.segmentLines.filter((l) => !usedLines.has(l.id)).map((l) => l.name);
	if (idleCommons.length > 0) {
		findings.push(
			finding({
				code: 'rule.unused-common',
				severity: 'warn',
				message: `No electrode uses ${idleCommons.join(', ')}.`,
				fix: 'Assign electrodes to it, or remove it and scan fewer commons.'
			})
		);
	}
	if (idleLines.length > 0) {
		findings.push(
			finding({
				code: 'rule.unused-line',
				severity: 'warn',
				message: `No electrode uses segment line ${idleLines.join(', ')}.`,
				fix: 'Assign electrodes to it, or remove it to save a pin.'
			})
		);
	}
	return findings;
}
