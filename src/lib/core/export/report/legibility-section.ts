/**
 * The report's legibility section: every light scenario with its luminances, contrast, colour
 * differences and verdict, then each character group's size and visibility level. Shown only
 * when the design has scenarios.
 */
import type { LegibilityReport } from '../../legibility/analyze-legibility';
import { escapeHtml, fixed, htmlTable } from './html-text';

const sig = (v: number) =>
	!Number.isFinite(v) ? '—' : v >= 100 ? v.toFixed(0) : v >= 10 ? v.toFixed(1) : v.toPrecision(3);

export function legibilitySection(report: LegibilityReport): string {
	const scenarios = htmlTable({
		head: [
			'Scenario',
			'E (lx)',
			'Light',
			'Background (cd/m²)',
			'Off (cd/m²)',
			'On (cd/m²)',
			'Veil (cd/m²)',
			'Contrast',
			'ΔE00 on',
			'Verdict'
		],
		numericFrom: 1,
		rows: report.scenarios.map((s) => [
			s.scenario.name,
			sig(s.scenario.illuminance_lx),
			s.scenario.illuminant,
			sig(s.light.background.luminance_cdm2),
			sig(s.light.off.luminance_cdm2),
			sig(s.light.on.luminance_cdm2),
			sig(s.light.veil_cdm2),
			`${fixed(s.contrastRatio, 2)} : 1`,
			fixed(s.deltaE00On, 1),
			s.verdict
		])
	});
	const groups = htmlTable({
		head: ['Scenario', 'Group', 'Height (′)', 'Stroke (′)', 'VL', 'Verdict'],
		numericFrom: 2,
		rows: report.scenarios.flatMap((s) =>
			s.groups.map((g) => [
				s.scenario.name,
				g.groupName,
				fixed(g.height_arcmin, 1),
				fixed(g.stroke_arcmin, 2),
				fixed(g.visibilityLevel, 1),
				g.verdict
			])
		)
	});
	return [
		`<p>${escapeHtml(`At ${report.temperature_C} °C; reading asks a visibility level VL ≥ ${report.readableVL} (not readable under ${report.marginalVL}).`)}</p>`,
		scenarios,
		groups
	].join('\n');
}
