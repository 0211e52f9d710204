/** The legibility report as terminal lines: the scenario table, the per-group table, the verdicts. */
import type { LegibilityReport } from '../lib/core/legibility/analyze-legibility';
import { findingLines } from './finding-text';
import { fixed, formatTable } from './table';

const sig = (v: number) => (v >= 100 ? v.toFixed(0) : v >= 10 ? v.toFixed(1) : v.toPrecision(3));

export function scenarioTableLines(report: LegibilityReport): string[] {
	const head = [
		'scenario',
		'E lx',
		'illum.',
		'mirrored cd/m²',
		'bg cd/m²',
		'off cd/m²',
		'on cd/m²',
		'veil cd/m²',
		'CR',
		'ΔE00 on',
		'ΔE00 ghost',
		'verdict',
		'optical model'
	];
	const rows = report.scenarios.map((s) => [
		s.scenario.name,
		sig(s.scenario.illuminance_lx),
		s.scenario.illuminant,
		sig(s.scenario.mirrored_cdm2),
		sig(s.light.background.luminance_cdm2),
		sig(s.light.off.luminance_cdm2),
		sig(s.light.on.luminance_cdm2),
		sig(s.light.veil_cdm2),
		`${fixed(s.contrastRatio, 2)}:1`,
		fixed(s.deltaE00On, 1),
		fixed(s.deltaE00Ghost, 1),
		s.verdict,
		s.light.model.label
	]);
	return formatTable([head, ...rows]).split('\n');
}

export function groupTableLines(report: LegibilityReport): string[] {
	const head = [
		'scenario',
		'group',
		'D mm',
		'view °',
		'age',
		'height ′',
		'stroke ′',
		'ΔL cd/m²',
		'ΔL_th cd/m²',
		'VL',
		'verdict'
	];
	const rows = report.scenarios.flatMap((s) =>
		s.groups.map((g) => [
			s.scenario.name,
			g.groupName,
			String(s.scenario.distance_mm),
			String(s.scenario.viewAngle_deg),
			String(s.scenario.age_years),
			fixed(g.height_arcmin, 1),
			fixed(g.stroke_arcmin, 2),
			sig(g.deltaL_cdm2),
			sig(g.threshold_cdm2),
			fixed(g.visibilityLevel, 1),
			g.verdict
		])
	);
	return formatTable([head, ...rows]).split('\n');
}

export function legibilityLines(report: LegibilityReport): string[] {
	const lines = [
		`At ${report.temperature_C} °C. Cell reflectance × E/π plus the front-surface veil R_s × mirrored luminance.`,
		'Off the normal the cell is seen through the oblique-incidence model (extended Jones), from the',
		"design's reading direction, and R_s follows the Fresnel equations at that angle.",
		...scenarioTableLines(report),
		'',
		...groupTableLines(report),
		'',
		`Threshold: Adrian (1989), positive-contrast form, field factor 1; reading asks VL ≥ ${report.readableVL} ` +
			`(not readable under ${report.marginalVL}) [from memory: 8–10 quoted in lighting practice].`,
		`Published minimums: ${report.limits.map((l) => `${l.value}${l.unit === 'arcmin' ? '′' : l.unit === ':1' ? ':1' : ' ' + l.unit} (${l.source})`).join('; ')}.`,
		''
	];
	for (const f of report.findings) lines.push(...findingLines(f));
	return lines;
}
