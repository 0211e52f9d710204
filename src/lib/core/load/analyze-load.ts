/**
 * The electrical load report of a design: capacitance per electrode, line and common, the drive
 * power and current in a shown pattern at room temperature and the worst over the operating
 * range, battery life, ITO trace settling, and findings. The one entry the app, the CLI and
 * `check` share.
 *
 * Temperatures: the headline figures are at 25 °C, clamped into the design's range; the worst
 * case scans the range (ε∥ grows with the order parameter as the fluid cools). Units at this
 * edge: pF, µW, µA, Ω, µs, hours.
 */
import type { Design } from '../design/schema';
import { finding, overallSeverity, type Finding, type Severity } from '../findings/finding';
import { batteryLife_h, formatDuration } from './battery-life';
import { capacitancePerArea_pF_per_mm2, PF_PER_F } from './capacitance';
import { prepareDriveLoad, type DriveLoad } from './drive-load';
import { electrodeArea_mm2 } from './electrode-capacitance';
import { pixelPermittivity, type PixelPermittivity } from './fluid-permittivity';
import { pinTotals } from './line-totals';
import { loadSettingsOf, type LoadPattern, type LoadSettings } from './load-settings';
import { onProbabilityOf } from './display-patterns';
import { settlingWindow_s } from './trace-rc';
import { traceChecks, type TraceCheck } from './trace-checks';
import { rangeTemperatures_C } from './load-sweeps';

export const ROOM_C = 25;
const UW_PER_W = 1e6;
const UA_PER_A = 1e6;

export interface PinLoadRow {
	id: string;
	name: string;
	electrodes: number;
	area_mm2: number;
	off_pF: number;
	on_pF: number;
	current_uA: number;
}

export interface LoadReport {
	pattern: LoadPattern;
	onProbability: number;
	temperature_C: number;
	permittivity: { off: number; on: number };
	perArea_pF_per_mm2: { off: number; on: number };
	electrodes: (PinLoadRow & { common: string | null; line: string | null; driven: boolean })[];
	lines: PinLoadRow[];
	commons: PinLoadRow[];
	power_uW: number;
	display_uA: number;
	quiescent_uA: number;
	total_uA: number;
	worst: { temperature_C: number; total_uA: number };
	battery: { capacity_mAh: number; life_h: number; worstLife_h: number; text: string } | null;
	settlingWindow_us: number;
	traces: TraceCheck[];
	findings: Finding[];
	severity: Severity;
}

export function analyzeLoad(
	design: Design,
	options: { pattern?: LoadPattern; battery_mAh?: number } = {}
): LoadReport {
	const settings: LoadSettings = loadSettingsOf(design);
	const pattern = options.pattern ?? settings.pattern;
	const capacity_mAh = options.battery_mAh ?? settings.battery_mAh;
	const onProbability = onProbabilityOf(pattern);
	const range = design.drive.temperature;
	const temperature_C = Math.min(range.max_C, Math.max(range.min_C, ROOM_C));
	const areas_mm2 = design.electrodes.map(electrodeArea_mm2);
	const findings: Finding[] = [];
	let permittivity: PixelPermittivity = { off: 1, on: 1, nematic: false };
	let room: DriveLoad;
	let worst = { temperature_C, load: null as DriveLoad | null, maxOn_F: new Map<string, number>() };
	try {
		permittivity = pixelPermittivity({ cell: design.cell, temperature_C });
		const prepared = prepareDriveLoad({ design, onProbability, areas_mm2 });
		room = prepared.at({ permittivity });
		worst.load = room;
		for (const t of rangeTemperatures_C(range)) {
			const eps = pixelPermittivity({ cell: design.cell, temperature_C: t });
			const load = prepared.at({ permittivity: eps });
			if (load.current_A > (worst.load?.current_A ?? 0))
				worst = { ...worst, temperature_C: t, load };
			for (const e of load.electrodes)
				worst.maxOn_F.set(e.id, Math.max(worst.maxOn_F.get(e.id) ?? 0, e.on_F));
		}
	} catch (error) {
		const message = error instanceof Error ? error.message : String(error);
		findings.push(
			finding({
				code: 'load.model-failed',
				severity: 'fail',
				message: `The load could not be estimated: ${message}`,
				fix: "Check the cell's fluid and the temperature range."
			})
		);
		room = { electrodes: [], power_W: 0, current_A: 0 };
		worst.load = room;
	}
	const amplitude_V = design.drive.amplitude_V;
	const row = (t: { off_F: number; on_F: number; area_mm2: number; current_A: number }) => ({
		area_mm2: t.area_mm2,
		off_pF: t.off_F * PF_PER_F,
		on_pF: t.on_F * PF_PER_F,
		current_uA: t.current_A * UA_PER_A
	});
	const totalsOf = (
		pins: Design['commons'],
		pinOf: (e: { common: string | null; line: string | null }) => string | null
	) =>
		pinTotals({ pins, electrodes: room.electrodes, pinOf, amplitude_V }).map((t) => ({
			id: t.id,
			name: t.name,
			electrodes: t.electrodes,
			...row(t)
		}));
	const display_uA = room.current_A * UA_PER_A;
	const total_uA = display_uA + settings.quiescent_uA;
	const worstTotal_uA = (worst.load?.current_A ?? 0) * UA_PER_A + settings.quiescent_uA;
	const window_s = settlingWindow_s({ ...design.drive });
	const traces = traceChecks({ design, settings, maxOn_F: worst.maxOn_F, window_s });
	findings.push(...traces.flatMap((t) => t.findings));
	const battery =
		capacity_mAh === undefined
			? null
			: {
					capacity_mAh,
					life_h: batteryLife_h({ capacity_mAh, current_uA: total_uA }),
					worstLife_h: batteryLife_h({ capacity_mAh, current_uA: worstTotal_uA }),
					text: formatDuration(batteryLife_h({ capacity_mAh, current_uA: total_uA }))
				};
	findings.push(
		...currentFindings({
			design,
			settings,
			total_uA,
			worst: { temperature_C: worst.temperature_C, total_uA: worstTotal_uA },
			driven: room.electrodes.filter((e) => e.driven).map((e) => e.id),
			failed: findings.length > 0 && findings.some((f) => f.code === 'load.model-failed'),
			pattern
		})
	);
	if (findings.every((f) => f.severity === 'pass'))
		findings.push(
			finding({
				code: 'load.ok',
				severity: 'pass',
				message: `The display draws ${total_uA.toPrecision(3)} µA at ${temperature_C} °C (${pattern})${battery ? `; battery life ${battery.text}` : ''}.`
			})
		);
	return {
		pattern,
		onProbability,
		temperature_C,
		permittivity: { off: permittivity.off, on: permittivity.on },
		perArea_pF_per_mm2: {
			off: capacitancePerArea_pF_per_mm2({
				gap_um: design.cell.gap_um,
				permittivity: permittivity.off
			}),
			on: capacitancePerArea_pF_per_mm2({
				gap_um: design.cell.gap_um,
				permittivity: permittivity.on
			})
		},
		electrodes: room.electrodes.map((e) => ({
			id: e.id,
			name: e.name,
			common: e.common,
			line: e.line,
			driven: e.driven,
			electrodes: 1,
			...row({ ...e, current_A: e.power_W / amplitude_V })
		})),
		lines: totalsOf(design.segmentLines, (e) => e.line),
		commons: totalsOf(design.commons, (e) => e.common),
		power_uW: room.power_W * UW_PER_W,
		display_uA,
		quiescent_uA: settings.quiescent_uA,
		total_uA,
		worst: { temperature_C: worst.temperature_C, total_uA: worstTotal_uA },
		battery,
		settlingWindow_us: window_s * 1e6,
		traces,
		findings,
		severity: overallSeverity(findings)
	};
}

function currentFindings(options: {
	design: Design;
	settings: LoadSettings;
	total_uA: number;
	worst: { temperature_C: number; total_uA: number };
	driven: string[];
	failed: boolean;
	pattern: LoadPattern;
}): Finding[] {
	const { settings, worst } = options;
	if (options.failed) return [];
	const out: Finding[] = [];
	if (options.driven.length === 0)
		out.push(
			finding({
				code: 'load.nothing-driven',
				severity: 'warn',
				message: 'No electrode has both a common and a segment line: the load is zero, not rated.',
				fix: 'Assign the electrodes to commons and segment lines.'
			})
		);
	const budget = settings.budget_uA;
	if (budget !== undefined && worst.total_uA > budget)
		out.push(
			finding({
				code: 'load.current-over-budget',
				severity: 'fail',
				message:
					`The display and driver draw ${worst.total_uA.toPrecision(3)} µA at ${worst.temperature_C} °C ` +
					`(${options.pattern}), over the ${budget} µA budget.`,
				fix: 'Lower the frame rate or the amplitude, use fewer commons with a lower bias, shrink large icons, or raise the budget.',
				electrodes: options.driven
			})
		);
	return out;
}
