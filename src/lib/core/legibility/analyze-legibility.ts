/**
 * The legibility report of a design: every light scenario judged for every character group at
 * one temperature of the cell report (room by default; the cold and hot ends for the preview).
 * Pure and fast (no director solves): it reuses the cell report's state spectra.
 */
import type { Design } from '../design/schema';
import type { CellReport, TemperatureStates } from '../cell/analyze-cell';
import { observerName } from '../cell/cell-optics';
import { finding, overallSeverity, type Finding, type Severity } from '../findings/finding';
import { assessScenario, type ScenarioAssessment } from './assess-scenario';
import { characterGroups, type CharacterGroup } from './character-groups';
import { mergeGhostFindings, safetyCaution, scenarioFindings } from './legibility-findings';
import { PUBLISHED_LIMITS, type PublishedLimit } from './legibility-limits';
import { scenarioLight, type ScenarioLight } from './scenario-light';
import type { Scenario } from '../design/legibility-schema';

export type TemperatureEnd = 'cold' | 'room' | 'hot';

export interface LegibilityReport {
	temperature_C: number;
	groups: CharacterGroup[];
	scenarios: ScenarioAssessment[];
	limits: readonly PublishedLimit[];
	readableVL: number;
	marginalVL: number;
	safetyRelevant: boolean;
	findings: Finding[];
	severity: Severity;
}

export function statesAt(cell: CellReport, end: TemperatureEnd): TemperatureStates {
	const list = cell.statesByTemperature;
	if (end === 'cold') return list[0];
	if (end === 'hot') return list[list.length - 1];
	return list.find((s) => s.temperature_C === cell.room_C) ?? list[0];
}

/** The optics of one scenario at one temperature, at the scenario's viewing angle. */
export function lightOfScenario(options: {
	design: Design;
	states: TemperatureStates;
	scenario: Scenario;
}): ScenarioLight {
	const { design, states, scenario } = options;
	return scenarioLight({
		spectra: {
			background: states.background.reflectance,
			off: states.off.reflectance,
			on: states.on.reflectance
		},
		frontSurfaceReflectance: design.cell.frontSurfaceReflectance,
		scenario,
		viewAngle_deg: scenario.viewAngle_deg,
		observer: observerName(design.lighting.observer)
	});
}

export function analyzeLegibility(options: {
	design: Design;
	cell: CellReport;
	end?: TemperatureEnd;
	scenarioNames?: readonly string[];
}): LegibilityReport {
	const { design, cell } = options;
	const settings = design.legibility;
	const states = statesAt(cell, options.end ?? 'room');
	const groups = characterGroups(design);
	const wanted = options.scenarioNames ? new Set(options.scenarioNames) : null;
	const scenarios = settings.scenarios
		.filter((s) => !wanted || wanted.has(s.name))
		.map((scenario) =>
			assessScenario({
				scenario,
				light: lightOfScenario({ design, states, scenario }),
				groups,
				settings
			})
		);
	let findings: Finding[] = [];
	if (groups.length === 0) {
		findings.push(
			finding({
				code: 'legibility.no-characters',
				severity: 'warn',
				message: 'No character group (7, 14 or 16 segments) to judge legibility on.',
				fix: 'Place digits with the character generator so their height and stroke are known.'
			})
		);
	} else {
		findings = mergeGhostFindings(scenarios.flatMap(scenarioFindings), scenarios);
	}
	if (settings.safetyRelevant) findings.push(safetyCaution());
	return {
		temperature_C: states.temperature_C,
		groups,
		scenarios,
		limits: PUBLISHED_LIMITS,
		readableVL: settings.readableVL,
		marginalVL: settings.marginalVL,
		safetyRelevant: settings.safetyRelevant,
		findings,
		severity: overallSeverity(findings)
	};
}
