/**
 * The report's line on the legibility scenarios' optics: which model gave each scenario's
 * figures (normal incidence along the normal, the oblique-incidence model off it), with the
 * contrast and verdict it led to.
 */
import type { LegibilityReport } from '../../legibility/analyze-legibility';
import { escapeHtml, fixed, htmlTable } from './html-text';

export function legibilityModelHtml(legibility: LegibilityReport): string {
	return (
		`<p>At ${escapeHtml(fixed(legibility.temperature_C, 0))} °C. Off the normal the cell is seen ` +
		"through the oblique-incidence model, from the design's reading direction.</p>\n" +
		htmlTable({
			head: ['Scenario', 'Optical model', 'Verdict', 'Viewing angle (°)', 'Contrast off : on'],
			numericFrom: 3,
			rows: legibility.scenarios.map((s) => [
				s.scenario.name,
				s.light.model.label,
				s.verdict,
				fixed(s.scenario.viewAngle_deg, 1),
				`${fixed(s.contrastRatio, 2)} : 1`
			])
		})
	);
}
