/** The report's design-rule section: the limits the geometry was checked against, and its verdicts. */
import type { Design } from '../../design/schema';
import type { RulesReport } from '../../rules/check-design-rules';
import { escapeHtml, fixed, htmlTable } from './html-text';
import { findingsTable } from './findings-table';

export function rulesSection(options: {
	design: Design;
	rules: RulesReport;
	names: ReadonlyMap<string, string>;
}): string {
	const { design, rules } = options;
	const r = design.rules;
	const limits = htmlTable({
		head: ['Rule', 'Limit'],
		numericFrom: 1,
		rows: [
			['Smallest gap', `${fixed(r.minGap_mm, 3)} mm`],
			['Smallest width', `${fixed(r.minWidth_mm, 3)} mm`],
			['Margin to the glass edge', `${fixed(r.edgeMargin_mm, 2)} mm`],
			['Smallest character height', `${fixed(r.minCharacterHeight_arcmin, 1)} arcmin`],
			['Smallest stroke', `${fixed(r.minStroke_arcmin, 1)} arcmin`]
		]
	});
	return [
		`<p>${escapeHtml(`${rules.electrodes} electrodes checked.`)}</p>`,
		limits,
		findingsTable(rules.findings, options.names)
	].join('\n');
}
