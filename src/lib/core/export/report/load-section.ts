/**
 * The report's electrical-load section: the pattern and temperature of the estimate, current and
 * battery life, and the per-line and per-common table (capacitance off/on and current). Units
 * as the load report gives them: pF, µW, µA, hours.
 */
import type { LoadReport, PinLoadRow } from '../../load/analyze-load';
import { formatDuration } from '../../load/battery-life';
import { PATTERN_LABELS } from '../../load/display-patterns';
import { fixed, htmlTable } from './html-text';

function pinTable(title: string, rows: readonly PinLoadRow[]): string {
	return htmlTable({
		head: [title, 'Electrodes', 'Area (mm²)', 'C off (pF)', 'C on (pF)', 'Current (µA)'],
		numericFrom: 1,
		className: 'pins',
		rows: rows.map((r) => [
			r.name,
			String(r.electrodes),
			fixed(r.area_mm2, 2),
			fixed(r.off_pF, 1),
			fixed(r.on_pF, 1),
			fixed(r.current_uA, 3)
		])
	});
}

export function loadSection(load: LoadReport): string {
	const rows: string[][] = [
		[
			'Pattern',
			`${PATTERN_LABELS[load.pattern]} (each on with p = ${fixed(load.onProbability, 2)})`
		],
		['At', `${fixed(load.temperature_C, 0)} °C`],
		['Drive power', `${fixed(load.power_uW, 3)} µW`],
		['Display current', `${fixed(load.display_uA, 3)} µA`],
		['Quiescent current', `${fixed(load.quiescent_uA, 3)} µA`],
		['Total current', `${fixed(load.total_uA, 3)} µA`],
		[
			'Worst in range',
			`${fixed(load.worst.total_uA, 3)} µA at ${fixed(load.worst.temperature_C, 1)} °C`
		]
	];
	if (load.battery)
		rows.push([
			'Battery life',
			`${formatDuration(load.battery.life_h)} on ${load.battery.capacity_mAh} mAh ` +
				`(${formatDuration(load.battery.worstLife_h)} at the worst temperature)`
		]);
	const summary = htmlTable({ head: ['Quantity', 'Value'], numericFrom: 1, rows });
	return [
		`<div class="cols">${summary}</div>`,
		`<div class="cols">${pinTable('Segment line', load.lines)}${pinTable('Common', load.commons)}</div>`
	].join('\n');
}
