/**
 * The legibility report of a design: every light scenario judged for every character group at
 * one temperature of the cell report (room by default; the cold and hot ends for the preview).
 * A scenario read along the normal reuses the cell report's state spectra; one read off the
 * normal takes them from the oblique-incidence model (light-model.ts, oblique-views.ts), from the
 * views the cell report already carries when it has them (the app's worker adds them), else
 * computed here (three director solves per temperature, kept for the next call).
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
import { lightModelOf, type LightModel } from './light-model';
import { obliqueViews, type ObliqueView } from './oblique-views';
import type { ViewDirection } from '../optics/oblique/view-direction';

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

const sameDirection = (v: ViewDirection, m: Extract<LightModel, { kind: 'oblique' }>) =>
	Math.abs(v.polar_deg - m.polar_deg) < 1e-9 && Math.abs(v.azimuth_deg - m.azimuth_deg) < 1e-9;

/** The oblique views the scenarios need: those the states carry, the rest computed in one go. */
function viewsFor(options: {
	design: Design;
	states: TemperatureStates;
	models: readonly LightModel[];
}): ObliqueView[] {
	const { design, states } = options;
	const known = states.views ?? [];
	const missing: Extract<LightModel, { kind: 'oblique' }>[] = [];
	for (const m of options.models) {
		const have = (v: ViewDirection) => m.kind === 'oblique' && sameDirection(v, m);
		if (m.kind === 'oblique' && !known.some(have) && !missing.some(have)) missing.push(m);
	}
	return [...known, ...obliqueViews({ design, states, directions: missing })];
}

/** The optics of one scenario at one temperature, at the scenario's viewing angle. */
export function lightOfScenario(options: {
	design: Design;
	states: TemperatureStates;
	scenario: Scenario;
	/** Where the reader stands, deg in the display frame; default the design's reading azimuth. */
	azimuth_deg?: number;
	/** Views already computed for these states (else taken from the states or computed). */
	views?: readonly ObliqueView[];
}): ScenarioLight {
	const { design, states, scenario } = options;
	const model = lightModelOf({ design, scenario, azimuth_deg: options.azimuth_deg });
	const common = {
		scenario,
		viewAngle_deg: scenario.viewAngle_deg,
		observer: observerName(design.lighting.observer),
		model
	};
	if (model.kind === 'normal incidence')
		return scenarioLight({
			...common,
			spectra: {
				background: states.background.reflectance,
				off: states.off.reflectance,
				on: states.on.reflectance
			},
			frontSurfaceReflectance: design.cell.frontSurfaceReflectance
		});
	const views = options.views ?? viewsFor({ design, states, models: [model] });
	const view = views.find((v) => sameDirection(v, model));
	if (!view) throw new Error(`no oblique view at θ = ${model.polar_deg}°`);
	return scenarioLight({ ...common, spectra: view, frontSurfaceReflectance: view.surface });
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
	const chosen = settings.scenarios.filter((s) => !wanted || wanted.has(s.name));
	const views = viewsFor({
		design,
		states,
		models: chosen.map((scenario) => lightModelOf({ design, scenario }))
	});
	const scenarios = chosen.map((scenario) =>
		assessScenario({
			scenario,
			light: lightOfScenario({ design, states, scenario, views }),
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
