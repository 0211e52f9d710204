/**
 * The three pixel states (background, off, on) seen from a scenario's direction, for the
 * legibility scenarios read off the normal: the oblique-incidence model (extended Jones through
 * the whole stack, ../viewangle/cell-view.ts; Yeh 1982, Gu & Yeh 1993) at the scenario's polar
 * angle and the design's reading azimuth (../viewangle/reading-azimuth.ts).
 *
 * Anchoring: the spectrum used is the normal-incidence spectrum of the cell report plus the
 * oblique model's change from the normal,
 *   R(θ, φ, λ) = R_normal(λ) + [R_oblique(θ, φ, λ) − R_oblique(0, λ)],
 * so at the normal the two models give the same numbers, a scenario's figures run continuously
 * through the switch-over angle, and what the oblique model adds is its angular change alone.
 * (On its own, the oblique model differs at the normal from the report's by a few per cent of Y:
 * it lights the depolarising reflector from the whole hemisphere where the report uses the
 * mirrored path, and it slices the director into midpoint retarders.) The front surface's
 * R_s(θ) from the Fresnel equations is carried along so the caller can count it as veil.
 *
 * Cost: three hemisphere averages per temperature and cell (and three director solves when the
 * cell report's own profiles are not at hand, state-profiles.ts), then about a millisecond per
 * direction; the prepared states are kept for the last few cells (a pure cache: same inputs,
 * same numbers).
 */
import type { Design } from '../design/schema';
import type { CellReport, TemperatureStates } from '../cell/analyze-cell';
import { createCellView, type CellView, type ViewState } from '../viewangle/cell-view';
import type { ViewDirection } from '../optics/oblique/view-direction';
import { lightModelOf } from './light-model';
import { stateProfilesOf } from '../cell/state-profiles';

export const VIEW_STATE_NAMES = ['background', 'off', 'on'] as const;
type StateName = (typeof VIEW_STATE_NAMES)[number];

/** Anchored reflectance factor spectra (0…1, first surface R_s(θ) included) from one direction. */
export interface ObliqueView extends ViewDirection, Record<StateName, number[]> {
	/** The front surface's reflectance R_s(θ) in this direction, 0…1. */
	surface: number;
}

interface Prepared {
	view: CellView;
	states: Record<StateName, ViewState>;
	/** The oblique model along the normal, per state: the anchor. */
	normal: Record<StateName, Float64Array>;
	/** Views already worked out, by direction (read-only once made). */
	byDirection: Map<string, ObliqueView>;
}

const CACHE_SIZE = 6;
const cache = new Map<string, Prepared>();

function prepared(design: Design, states: TemperatureStates): Prepared {
	const key = JSON.stringify([
		design.cell,
		design.lighting,
		design.orientation,
		states.temperature_C,
		VIEW_STATE_NAMES.map((n) => states[n].voltage_V)
	]);
	const hit = cache.get(key);
	if (hit) return hit;
	const view = createCellView({ design, temperature_C: states.temperature_C });
	const solved = stateProfilesOf(states);
	let background: ViewState, off: ViewState, on: ViewState;
	if (solved) {
		background = view.stateOf(states.background.voltage_V, solved.background);
		off = view.stateOf(states.off.voltage_V, solved.off);
		on = view.stateOf(states.on.voltage_V, solved.on);
	} else {
		background = view.stateAt(states.background.voltage_V);
		off = view.stateAt(states.off.voltage_V, background.profile);
		on = view.stateAt(states.on.voltage_V, off.profile);
	}
	const along = { polar_deg: 0, azimuth_deg: 0 };
	const made: Prepared = {
		view,
		states: { background, off, on },
		normal: {
			background: view.seen(background, along).reflectance,
			off: view.seen(off, along).reflectance,
			on: view.seen(on, along).reflectance
		},
		byDirection: new Map()
	};
	if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value as string);
	cache.set(key, made);
	return made;
}

/** Forgets the prepared states (for speed measurements of a first call). */
export function clearObliqueViewCache(): void {
	cache.clear();
}

/** The three states from each direction, anchored on the states' normal-incidence spectra. */
export function obliqueViews(options: {
	design: Design;
	states: TemperatureStates;
	directions: readonly ViewDirection[];
}): ObliqueView[] {
	const { design, states, directions } = options;
	if (directions.length === 0) return [];
	const p = prepared(design, states);
	return directions.map(({ polar_deg, azimuth_deg }) => {
		const key = `${polar_deg}|${azimuth_deg}`;
		const known = p.byDirection.get(key);
		if (known) return known;
		const out = { polar_deg, azimuth_deg, surface: 0 } as ObliqueView;
		for (const name of VIEW_STATE_NAMES) {
			const seen = p.view.seen(p.states[name], { polar_deg, azimuth_deg });
			const base = states[name].reflectance;
			const anchor = p.normal[name];
			out[name] = Array.from(base, (r, i) => Math.max(0, r + seen.reflectance[i] - anchor[i]));
			out.surface = seen.surface;
		}
		p.byDirection.set(key, out);
		return out;
	});
}

/**
 * The cell report with every temperature's states carrying the views the design's scenarios
 * read off the normal need: done where the cell report is made (the app's worker), so the page
 * only looks them up.
 */
export function withScenarioViews(report: CellReport, design: Design): CellReport {
	const directions: ViewDirection[] = [];
	for (const scenario of design.legibility.scenarios) {
		const model = lightModelOf({ design, scenario });
		if (
			model.kind === 'oblique' &&
			!directions.some(
				(d) => d.polar_deg === model.polar_deg && d.azimuth_deg === model.azimuth_deg
			)
		)
			directions.push({ polar_deg: model.polar_deg, azimuth_deg: model.azimuth_deg });
	}
	if (directions.length === 0) return report;
	return {
		...report,
		statesByTemperature: report.statesByTemperature.map((states) => ({
			...states,
			views: obliqueViews({ design, states, directions })
		}))
	};
}
