/** The optical part of `check`: a compact JSON summary and terminal lines. */
import { findingLines } from './finding-text';
import type { DesignReport } from '../lib/core/analyze-design';
import type { PixelAppearance } from '../lib/core/cell/pixel-appearance';
import { fixed, formatTable } from './table';

const colour = (s: PixelAppearance) => ({
	voltage_V: s.voltage_V,
	Y: s.Y,
	x: s.x,
	y: s.y,
	L: s.L,
	a: s.a,
	b: s.b,
	srgbHex: s.srgbHex,
	luminance_cdm2: s.luminance_cdm2
});

export function opticsSummary(report: DesignReport) {
	const cell = report.cell;
	if (!cell) return { error: report.cellError };
	const room = cell.curves.find((c) => c.temperature_C === cell.room_C)!;
	return {
		temperature_C: cell.room_C,
		background: colour(cell.background),
		off: colour(cell.off),
		on: colour(cell.on),
		contrastRatio: cell.contrastRatio,
		backgroundContrastRatio: cell.backgroundContrastRatio,
		deltaE00: cell.deltaE00,
		ghostDeltaE00: cell.ghostDeltaE00,
		v10_V: room.v10_V,
		v50_V: room.v50_V,
		v90_V: room.v90_V,
		switching: cell.curves.map((c) => ({
			temperature_C: c.temperature_C,
			v10_V: c.v10_V,
			v50_V: c.v50_V,
			v90_V: c.v90_V
		})),
		response: cell.response.rows.map((r) => ({
			temperature_C: r.temperature_C,
			tauOn_s: r.times?.tauOn_s ?? null,
			tauOff_s: r.times?.tauOff_s ?? null,
			tooSlow: r.tooSlow
		}))
	};
}

export const PIXEL_TABLE_HEAD = [
	'state',
	'V rms',
	'Y %',
	'x',
	'y',
	'L*',
	'a*',
	'b*',
	'cd/m²',
	'sRGB'
];

/** One table row describing a pixel state. */
export function pixelRow(label: string, s: PixelAppearance): string[] {
	return [
		label,
		fixed(s.voltage_V, 3),
		fixed(s.Y, 2),
		fixed(s.x, 4),
		fixed(s.y, 4),
		fixed(s.L, 1),
		fixed(s.a, 1),
		fixed(s.b, 1),
		fixed(s.luminance_cdm2, 1),
		s.srgbHex
	];
}

export function opticsLines(report: DesignReport): string[] {
	const cell = report.cell;
	if (!cell)
		return report.opticsFindings.length > 0
			? report.opticsFindings.flatMap((f) => findingLines(f))
			: [`FAIL  ${report.cellError ?? 'the cell was not evaluated'}`];
	const lines = [
		`at ${cell.room_C} °C, ${report.drive.isStatic ? 'static' : `1/${report.drive.commons} duty`} drive:`,
		...formatTable([
			PIXEL_TABLE_HEAD,
			pixelRow('background', cell.background),
			pixelRow('off segment', cell.off),
			pixelRow('on segment', cell.on)
		]).split('\n'),
		`contrast off:on ${fixed(cell.contrastRatio, 2)}, background:on ${fixed(cell.backgroundContrastRatio, 2)}, ΔE00 ${fixed(cell.deltaE00, 1)}, ghost ΔE00 ${fixed(cell.ghostDeltaE00, 2)}`,
		'',
		...formatTable([
			['T (°C)', 'V10', 'V50', 'V90', 'τ_on', 'τ_off'],
			...cell.curves.map((c) => {
				const r = cell.response.rows.find((x) => x.temperature_C === c.temperature_C);
				const ms = (v: number | null | undefined) =>
					v === null || v === undefined ? '—' : `${(v * 1000).toFixed(0)} ms`;
				return [
					fixed(c.temperature_C, 1),
					fixed(c.v10_V, 3),
					fixed(c.v50_V, 3),
					fixed(c.v90_V, 3),
					ms(r?.times?.tauOn_s),
					ms(r?.times?.tauOff_s)
				];
			})
		]).split('\n'),
		`switching voltages for the drive check: ${report.thresholdSource}`
	];
	// Every optics finding: the cell's own, fluid limits, orientation, disagreement with the model.
	for (const f of report.opticsFindings) lines.push(...findingLines(f));
	return lines;
}
