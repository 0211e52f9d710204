/**
 * Design in, full report out: the one entry the web app, the command line and the tests share.
 *
 * The drive check is instant; the cell's optics take a few hundred milliseconds, so callers may
 * pass a cell report computed elsewhere (the app does it in a worker). When the design takes its
 * switching voltages from the cell model, the drive check uses the cell report's V10/V90 at the
 * cold, room and hot temperatures instead of the entered values.
 */
import type { Design } from './design/schema';
import {
	analyzeDrive,
	analyzeWiring,
	type DriveReport,
	type WiringReport
} from './drive/analyze-drive';
import { opticsTimeoutFinding } from './cell/optics-timeout';
import { finding, overallSeverity, type Finding, type Severity } from './findings/finding';
import { analyzeCell, type CellReport } from './cell/analyze-cell';
import { checkDesignRules, type RulesReport } from './rules/check-design-rules';
import { analyzeLegibility, type LegibilityReport } from './legibility/analyze-legibility';
import { orientationFindings } from './viewangle/orientation-findings';
import { analyzeLoad, type LoadReport } from './load/analyze-load';
import { fluidLimitFindings } from './cell/fluid-limits';
import { glassInCheck, type GlassCheckSummary } from './glass/glass-in-check';

export interface DesignReport {
	design: { name: string; electrodes: number; commons: number; segmentLines: number };
	wiring: WiringReport;
	drive: DriveReport;
	/** Null when the cell was not evaluated (yet) or could not be. */
	cell: CellReport | null;
	cellError: string | null;
	/** Findings about the optics: the cell's own, a failed model, entered values the model disputes. */
	opticsFindings: Finding[];
	/** The design-rule check of the geometry and of what the design uses. */
	rules: RulesReport;
	/** Where the drive check's V10/V90 came from. */
	thresholdSource: 'entered' | 'cell model';
	/** Every light scenario judged; null until the cell report exists. */
	legibility: LegibilityReport | null;
	/** Electrical load: capacitance, current, battery life, trace settling. */
	load: LoadReport;
	/** The glass check of the stored glass drawing; null while the design has none. */
	glass: GlassCheckSummary | null;
	severity: Severity;
}

export function analyzeDesign(
	design: Design,
	options: {
		cell?: CellReport | null;
		cellError?: string | null;
		/** Set when the optical model was stopped at its time limit (seconds). */
		cellTimeLimit_s?: number | null;
		/** The glass check computed elsewhere (e.g. in a worker); computed here when left out. */
		glass?: GlassCheckSummary | null;
	} = {}
): DesignReport {
	const cell = options.cell ?? null;
	const cellError = options.cellError ?? null;
	const wiring = analyzeWiring(design);
	const useModel = design.thresholds.source === 'computed' && cell !== null;
	const drive = analyzeDrive({
		drive: design.drive,
		thresholds: useModel ? cell.thresholds : design.thresholds
	});
	const rules = checkDesignRules(design);
	const load = analyzeLoad(design);
	const cellFindings: Finding[] = cell ? [...cell.findings] : [];
	if (cell && design.thresholds.source === 'manual')
		cellFindings.push(...thresholdAgreement(design, cell));
	cellFindings.push(...orientationFindings(design));
	if (options.cellTimeLimit_s) cellFindings.push(opticsTimeoutFinding(options.cellTimeLimit_s));
	cellFindings.push(...fluidLimitFindings(design));
	if (cellError)
		cellFindings.push(
			finding({
				code: 'optics.model-failed',
				severity: 'fail',
				message: cellError,
				fix: "Check the cell's fluid, gap and temperature range."
			})
		);
	const legibility = cell ? analyzeLegibility({ design, cell }) : null;
	const glass = options.glass !== undefined ? options.glass : glassInCheck(design);
	return {
		design: {
			name: design.name,
			electrodes: design.electrodes.length,
			commons: design.commons.length,
			segmentLines: design.segmentLines.length
		},
		wiring,
		drive,
		cell,
		cellError,
		opticsFindings: cellFindings,
		rules,
		thresholdSource: useModel ? 'cell model' : 'entered',
		legibility,
		load,
		glass,
		severity: overallSeverity([
			...wiring.findings,
			...drive.findings,
			...cellFindings,
			...rules.findings,
			...(legibility?.findings ?? []),
			...load.findings,
			...(glass?.findings ?? [])
		])
	};
}

/** Evaluates the cell too, turning a model failure into a finding rather than a crash. */
export function analyzeDesignWithCell(design: Design): DesignReport {
	try {
		return analyzeDesign(design, { cell: analyzeCell(design) });
	} catch (error) {
		return analyzeDesign(design, {
			cellError: error instanceof Error ? error.message : String(error)
		});
	}
}

/** Entered V10/V90 that disagree with the cell model by more than this fraction are flagged. */
export const THRESHOLD_AGREEMENT = 0.1;

function thresholdAgreement(design: Design, cell: CellReport): Finding[] {
	const room = cell.curves.find((c) => c.temperature_C === cell.room_C);
	if (!room) return [];
	const t = design.thresholds;
	const shift_V = (t.tempCoeff_mV_per_K / 1000) * (cell.room_C - t.reference_C);
	const entered = { v10: t.v10_V + shift_V, v90: t.v90_V + shift_V };
	const off10 = Math.abs(entered.v10 / room.v10_V - 1);
	const off90 = Math.abs(entered.v90 / room.v90_V - 1);
	if (off10 <= THRESHOLD_AGREEMENT && off90 <= THRESHOLD_AGREEMENT) return [];
	return [
		finding({
			code: 'optics.thresholds-disagree',
			severity: 'warn',
			message:
				`The entered V10/V90 (${entered.v10.toFixed(2)}/${entered.v90.toFixed(2)} V at ${cell.room_C} °C) differ from ` +
				`the cell model's ${room.v10_V.toFixed(2)}/${room.v90_V.toFixed(2)} V.`,
			fix: "Use measured fluid data, or switch the drive check to the model's values."
		})
	];
}
