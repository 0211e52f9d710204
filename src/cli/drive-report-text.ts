/** Terminal text for a drive report, shared by `drive` and `check`. */
import { findingLines } from './finding-text';
import type { DriveReport } from '../lib/core/drive/analyze-drive';
import { fixed, formatTable } from './table';

export function driveReportLines(report: DriveReport, options: { withCell: boolean }): string[] {
	const duty = report.isStatic ? 'static' : `1/${report.commons}`;
	const bias = report.isStatic ? '—' : `1/${Number(report.biasDivisor.toFixed(4))}`;
	const rows: string[][] = [
		['duty', duty],
		['bias', bias],
		['amplitude', `${fixed(report.amplitude_V, 3)} V`],
		['V_on (RMS)', `${fixed(report.onRms_V, 4)} V`],
		['V_off (RMS)', `${fixed(report.offRms_V, 4)} V`],
		['selection ratio V_on/V_off', fixed(report.selectionRatio, 4)],
		['Alt–Pleshko limit', fixed(report.altPleshkoLimit, 4)],
		['optimal bias', report.optimalBias === null ? '—' : `1/${report.optimalBias.toFixed(3)}`]
	];
	const lines = [formatTable(rows)];
	if (!options.withCell) return lines;
	const window = report.window;
	lines.push('');
	lines.push(
		formatTable([
			['T (°C)', 'V10', 'V90', 'V_on', 'V_off', 'on margin', 'off margin', 'window'],
			...window.perTemperature.map((t) => [
				fixed(t.temperature_C, 1),
				fixed(t.v10_V, 3),
				fixed(t.v90_V, 3),
				fixed(t.on_V, 3),
				fixed(t.off_V, 3),
				fixed(t.onMargin_V, 3),
				fixed(t.offMargin_V, 3),
				t.window ? `${fixed(t.window.min_V, 2)}–${fixed(t.window.max_V, 2)} V` : 'none'
			])
		])
	);
	lines.push('');
	if (window.window) {
		lines.push(
			`amplitude window ${fixed(window.window.min_V, 3)}–${fixed(window.window.max_V, 3)} V, best ${fixed(window.best_V, 3)} V`
		);
	}
	for (const finding of report.findings) lines.push(...findingLines(finding));
	return lines;
}
