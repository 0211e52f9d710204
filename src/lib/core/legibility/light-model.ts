/**
 * Which optical model lights a scenario: the normal-incidence cell model along the normal, the
 * oblique-incidence model (oblique-views.ts) once the scenario's viewing angle is off it by more
 * than OBLIQUE_FROM_deg. Below that the oblique change is small: first order in θ through the
 * pretilt, about 0.2 % of the contrast ratio at 0.5° for the demo cell, and both models agree
 * exactly at the normal (oblique-views.ts), so the switch-over leaves no step worth a digit. The
 * reader looks from the design's reading azimuth (../viewangle/reading-azimuth.ts) unless a
 * caller names another.
 */
import type { Design } from '../design/schema';
import type { Scenario } from '../design/legibility-schema';
import { clockHour } from '../optics/oblique/view-direction';
import { readingAzimuth_deg } from '../viewangle/reading-azimuth';

export const OBLIQUE_FROM_deg = 0.5;

export type LightModel =
	| { kind: 'normal incidence'; label: string }
	| { kind: 'oblique'; polar_deg: number; azimuth_deg: number; label: string };

export const NORMAL_INCIDENCE: LightModel = { kind: 'normal incidence', label: 'normal incidence' };

export function lightModelOf(options: {
	design: Pick<Design, 'cell' | 'orientation'>;
	scenario: Pick<Scenario, 'viewAngle_deg'>;
	/** Where the reader stands, deg in the display frame; default the reading azimuth. */
	azimuth_deg?: number;
}): LightModel {
	const polar_deg = options.scenario.viewAngle_deg;
	if (!(polar_deg > OBLIQUE_FROM_deg)) return NORMAL_INCIDENCE;
	const azimuth_deg = options.azimuth_deg ?? readingAzimuth_deg(options.design);
	return { kind: 'oblique', polar_deg, azimuth_deg, label: obliqueLabel(polar_deg, azimuth_deg) };
}

/** "oblique, θ = 15° from 6 o'clock", as every output names the model. */
function obliqueLabel(polar_deg: number, azimuth_deg: number): string {
	const polar = Number.isInteger(polar_deg) ? String(polar_deg) : polar_deg.toFixed(1);
	return `oblique, θ = ${polar}° from ${clockHour(azimuth_deg)} o'clock`;
}

/** "normal incidence" or "oblique, θ = 15° from 6 o'clock". */
export function lightModelLabel(model: LightModel): string {
	return model.label;
}
