/**
 * The printable design report: one self-contained HTML page set (inline CSS and SVG, no scripts,
 * no external files) for a design review or a glass maker — the drawing to scale with a scale
 * bar, the pin map, the drive table and window plot, the cell figures, the design rules, the
 * electrical load, the legibility table (when the design has scenarios), the glass summary, every
 * finding of every analysis with its code, further sections the caller adds, the model's limits
 * and the cautions. The same string comes from the app and from `sunglyph report`; it is deterministic
 * (no clock inside: pass `generatedOn` to date it).
 */
import type { Design } from '../../design/schema';
import type { DesignReport } from '../../analyze-design';
import type { Finding } from '../../findings/finding';
import { checkGlass, type GlassReport } from '../../glass/check-glass';
import { designToSvg } from '../design-svg';
import { commonColour } from '../common-colours';
import { escapeHtml, fixed, htmlTable } from './html-text';
import { windowPlotSvg } from './window-plot-svg';
import { REPORT_CSS } from './report-css';
import { legibilityModelHtml } from './legibility-model-html';
import { reportFindings } from '../../findings/report-findings';
import { findingsTable } from './findings-table';
import { rulesSection } from './rules-section';
import { loadSection } from './load-section';
import { legibilitySection } from './legibility-section';
import { glassSection } from './glass-section';

export type PaperSize = 'a4' | 'letter';

export interface ReportSection {
	title: string;
	/** Trusted HTML built by the core (escape every design text in it). */
	html: string;
}

export const MODEL_LIMITS = [
	'Drive: RMS multiplexing with an ideal ladder; switching voltages from the entered values or the cell model.',
	'Cell: constant-voltage director statics; Jones optics; CIE colorimetry under the chosen illuminant.',
	'Temperature: order-parameter scaling of the fluid constants; it understates how fast V_th falls near the clearing point.',
	'Response times: Jakeman–Raynes, without backflow.'
];

export const REPORT_CAUTION =
	'These figures are predictions from models and typical material data, not measurements. Where a ' +
	'misreading can hurt someone (medical, gas, electrical, heating or vehicle readouts, for example), ' +
	'confirm legibility and switching with measured samples of the actual glass over the full ' +
	'temperature range, and follow the applicable product standards and local regulations.';

export function designReportHtml(options: {
	design: Design;
	report: DesignReport;
	/** Findings of analyses outside the report to list too (every report finding is listed). */
	findings?: readonly Finding[];
	/** The glass check, when the caller has it; computed here otherwise. */
	glass?: GlassReport;
	sections?: readonly ReportSection[];
	paper?: PaperSize;
	generatedOn?: string;
	version?: string;
	/** Extra limits of models the caller's sections use. */
	limits?: readonly string[];
}): string {
	const { design, report } = options;
	const glass = options.glass ?? checkGlass(design);
	// The glass check joins the findings once the design has a glass drawing, as in `check`.
	const findings = reportFindings(report, options.findings ?? []);
	const byName = new Map(design.electrodes.map((e) => [e.id, e.name || e.id]));
	const body = [
		header(design, report, options),
		section('Drawing', drawing(design)),
		section('Pin map', pinMapTable(design)),
		section('Drive', driveSection(design, report)),
		section('Cell and optics', cellSection(report)),
		section('Design rules', rulesSection({ design, rules: report.rules, names: byName })),
		section('Electrical load', loadSection(report.load)),
		...(design.legibility.scenarios.length > 0
			? [
					section(
						'Legibility',
						report.legibility
							? legibilitySection(report.legibility)
							: '<p>Not evaluated: the cell model gave no optics.</p>'
					)
				]
			: []),
		...(report.legibility && design.legibility.scenarios.length > 0
			? [section('Legibility: optics per scenario', legibilityModelHtml(report.legibility))]
			: []),
		section('Glass', glassSection({ design, glass })),
		section('Findings', findingsTable(findings, byName)),
		...(options.sections ?? []).map((s) => section(s.title, s.html)),
		section(
			'Model limits and cautions',
			`<ul>${[...MODEL_LIMITS, ...(options.limits ?? [])].map((l) => `<li>${escapeHtml(l)}</li>`).join('')}</ul>` +
				`<p class="caution">${escapeHtml(REPORT_CAUTION)}</p>`
		)
	];
	return [
		'<!doctype html>',
		'<html lang="en"><head><meta charset="utf-8">',
		`<title>${escapeHtml(design.name)} — design report</title>`,
		`<style>${REPORT_CSS}\n@page { size: ${options.paper === 'letter' ? 'letter' : 'A4'}; margin: 14mm 12mm; }</style>`,
		'</head><body>',
		...body,
		'</body></html>',
		''
	].join('\n');
}

function section(title: string, html: string): string {
	return `<section><h2>${escapeHtml(title)}</h2>\n${html}\n</section>`;
}

function header(
	design: Design,
	report: DesignReport,
	options: { generatedOn?: string; version?: string }
): string {
	const verdict =
		report.severity === 'fail'
			? 'Fails checks'
			: report.severity === 'warn'
				? 'Passes, with warnings'
				: 'Passes checks';
	const meta = [
		`${design.electrodes.length} electrodes`,
		`${design.commons.length} commons`,
		`${design.segmentLines.length} segment lines`,
		`glass ${fixed(design.glass.width_mm, 1)} × ${fixed(design.glass.height_mm, 1)} mm`
	];
	if (options.generatedOn) meta.push(`generated ${options.generatedOn}`);
	if (options.version) meta.push(`sunglyph ${options.version}`);
	return [
		'<header>',
		`<h1>${escapeHtml(design.name)}</h1>`,
		`<p class="meta">${meta.map(escapeHtml).join(' · ')}</p>`,
		`<p class="verdict ${report.severity}">${verdict}</p>`,
		'</header>'
	].join('\n');
}

function drawing(design: Design): string {
	const index = new Map(design.commons.map((c, i) => [c.id, i]));
	const svg = designToSvg(design, {
		fillOf: (e) => commonColour(e.common === null ? -1 : (index.get(e.common) ?? -1))
	});
	const bar_mm = design.glass.width_mm >= 40 ? 10 : 5;
	const scale = [
		`<svg xmlns="http://www.w3.org/2000/svg" width="${bar_mm + 12}mm" height="6mm" viewBox="0 0 ${bar_mm + 12} 6">`,
		`<rect x="0.5" y="1" width="${bar_mm}" height="1.2" fill="#222"/>`,
		`<text x="${bar_mm + 1.5}" y="2.4" font-size="2.4">${bar_mm} mm</text>`,
		'</svg>'
	].join('');
	const legend = design.commons
		.map(
			(c, i) =>
				`<span class="key"><i style="background:${commonColour(i)}"></i>${escapeHtml(c.name || c.id)}</span>`
		)
		.join(' ');
	return `<figure class="drawing">${svg}<figcaption>${scale}<span>Printed at true size (1:1). Colours: ${legend}</span></figcaption></figure>`;
}

function pinMapTable(design: Design): string {
	const atCrossing = new Map<string, string>();
	for (const e of design.electrodes)
		if (e.common !== null && e.line !== null) {
			const key = `${e.common}|${e.line}`;
			const name = e.name || e.id;
			atCrossing.set(key, atCrossing.has(key) ? `${atCrossing.get(key)}, ${name}` : name);
		}
	const used = design.segmentLines.filter((l) => design.electrodes.some((e) => e.line === l.id));
	return htmlTable({
		head: ['Line', ...design.commons.map((c) => c.name || c.id)],
		rows: used.map((l) => [
			l.name || l.id,
			...design.commons.map((c) => atCrossing.get(`${c.id}|${l.id}`) ?? '—')
		]),
		className: 'pins'
	});
}

function driveSection(design: Design, report: DesignReport): string {
	const d = report.drive;
	const summary = htmlTable({
		head: ['Quantity', 'Value'],
		numericFrom: 1,
		rows: [
			['Commons (duty)', d.isStatic ? 'static' : `${d.commons} (1/${d.commons})`],
			['Bias', d.isStatic ? '—' : `1/${fixed(d.biasDivisor, 2)}`],
			['Amplitude', `${fixed(d.amplitude_V, 2)} V`],
			['Frame rate', `${fixed(design.drive.frameRate_Hz, 0)} Hz`],
			['V_on / V_off (RMS)', `${fixed(d.onRms_V, 3)} / ${fixed(d.offRms_V, 3)} V`],
			['Selection ratio', fixed(d.selectionRatio, 4)],
			['Alt–Pleshko limit', fixed(d.altPleshkoLimit, 4)],
			[
				'Amplitude window',
				d.window.window
					? `${fixed(d.window.window.min_V, 3)}–${fixed(d.window.window.max_V, 3)} V`
					: 'none'
			],
			['Best amplitude', d.window.best_V === null ? '—' : `${fixed(d.window.best_V, 3)} V`],
			['Switching voltages from', report.thresholdSource]
		]
	});
	const perTemperature = htmlTable({
		head: ['T (°C)', 'V10 (V)', 'V90 (V)', 'on margin (V)', 'off margin (V)'],
		numericFrom: 0,
		rows: d.window.perTemperature.map((c) => [
			fixed(c.temperature_C, 1),
			fixed(c.v10_V, 3),
			fixed(c.v90_V, 3),
			fixed(c.onMargin_V, 3),
			fixed(c.offMargin_V, 3)
		])
	});
	return `<div class="cols">${summary}${perTemperature}</div>${windowPlotSvg({ window: d.window, amplitude_V: d.amplitude_V })}`;
}

function cellSection(report: DesignReport): string {
	if (!report.cell) {
		return `<p>${escapeHtml(report.cellError ? `The cell model could not be evaluated: ${report.cellError}` : 'The cell was not evaluated.')}</p>`;
	}
	const c = report.cell;
	const swatch = (label: string, hex: string, y: number, cd: number) =>
		`<span class="swatch"><i style="background:${hex}"></i>${escapeHtml(label)}: Y ${fixed(y, 1)} %, ${fixed(cd, 0)} cd/m²</span>`;
	const curves = htmlTable({
		head: ['T (°C)', 'V10 (V)', 'V50 (V)', 'V90 (V)'],
		numericFrom: 0,
		rows: c.curves.map((k) => [
			fixed(k.temperature_C, 1),
			fixed(k.v10_V, 3),
			fixed(k.v50_V, 3),
			fixed(k.v90_V, 3)
		])
	});
	const figures = htmlTable({
		head: ['Quantity', 'Value'],
		numericFrom: 1,
		rows: [
			['Contrast off : on', `${fixed(c.contrastRatio, 2)} : 1`],
			['Contrast background : on', `${fixed(c.backgroundContrastRatio, 2)} : 1`],
			['ΔE00 on vs off', fixed(c.deltaE00, 1)],
			['ΔE00 off vs background (ghost)', fixed(c.ghostDeltaE00, 2)],
			['Figures at', `${fixed(c.room_C, 0)} °C`]
		]
	});
	return [
		`<div class="cols">${curves}${figures}</div>`,
		`<p class="swatches">${swatch('background', c.background.srgbHex, c.background.Y, c.background.luminance_cdm2)}`,
		swatch('off', c.off.srgbHex, c.off.Y, c.off.luminance_cdm2),
		`${swatch('on', c.on.srgbHex, c.on.Y, c.on.luminance_cdm2)}</p>`
	].join('\n');
}
