/** The load report as terminal lines: headline figures, per-pin table, traces and findings. */
import type { LoadReport, PinLoadRow } from '../lib/core/load/analyze-load';
import { formatDuration } from '../lib/core/load/battery-life';
import { PATTERN_LABELS } from '../lib/core/load/display-patterns';
import { findingLines } from './finding-text';
import { fixed, formatTable } from './table';

const pinRows = (title: string, rows: readonly PinLoadRow[]) => [
	[title, 'electrodes', 'area mm²', 'C off pF', 'C on pF', 'current µA'],
	...rows.map((r) => [
		r.name,
		String(r.electrodes),
		fixed(r.area_mm2, 2),
		fixed(r.off_pF, 1),
		fixed(r.on_pF, 1),
		fixed(r.current_uA, 3)
	])
];

export function loadSummaryLines(report: LoadReport): string[] {
	const rows: string[][] = [
		[
			'pattern',
			`${PATTERN_LABELS[report.pattern]} (each electrode on with p = ${fixed(report.onProbability, 2)})`
		],
		[
			'εr off / on',
			`${fixed(report.permittivity.off, 2)} / ${fixed(report.permittivity.on, 2)} at ${report.temperature_C} °C`
		],
		[
			'C per area off / on',
			`${fixed(report.perArea_pF_per_mm2.off, 2)} / ${fixed(report.perArea_pF_per_mm2.on, 2)} pF/mm²`
		],
		['drive power', `${fixed(report.power_uW, 3)} µW`],
		[
			'current',
			`${fixed(report.display_uA, 3)} µA display + ${fixed(report.quiescent_uA, 3)} µA quiescent = ${fixed(report.total_uA, 3)} µA`
		],
		[
			'worst in range',
			`${fixed(report.worst.total_uA, 3)} µA at ${fixed(report.worst.temperature_C, 1)} °C`
		]
	];
	if (report.battery)
		rows.push([
			'battery life',
			`${formatDuration(report.battery.life_h)} on ${report.battery.capacity_mAh} mAh (${formatDuration(report.battery.worstLife_h)} at the worst temperature)`
		]);
	return formatTable(rows).split('\n');
}

export function loadReportLines(
	report: LoadReport,
	options: { perElectrode?: boolean } = {}
): string[] {
	const lines = [...loadSummaryLines(report), ''];
	if (options.perElectrode)
		lines.push(...formatTable(pinRows('electrode', report.electrodes)).split('\n'), '');
	lines.push(...formatTable(pinRows('line', report.lines)).split('\n'), '');
	lines.push(...formatTable(pinRows('common', report.commons)).split('\n'), '');
	if (report.traces.length > 0) {
		lines.push(
			...formatTable([
				['trace to', 'L mm', 'W mm', 'R Ω', 'τ µs', 'τ / window'],
				...report.traces.map((t) => [
					t.electrode,
					fixed(t.length_mm, 2),
					fixed(t.width_mm, 3),
					fixed(t.resistance_ohm, 0),
					fixed(t.tau_us, 3),
					`${fixed(t.ratio * 100, 1)} %`
				])
			]).split('\n'),
			`settling window ${fixed(report.settlingWindow_us, 1)} µs`,
			''
		);
	}
	for (const f of report.findings) lines.push(...findingLines(f));
	return lines;
}
