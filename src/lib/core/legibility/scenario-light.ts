/**
 * The light a reader gets from the three pixel states (background, off, on) in one scenario:
 * the optics per scenario behind one function of the viewing angle.
 *
 * Model (the spectra come from the normal- or the oblique-incidence model, light-model.ts; the
 * caller passes the front surface's reflectance at the scenario's angle):
 * - the cell's diffuse part: its reflectance factor minus the flat first-surface reflection R_s,
 *   lit by the scenario's illuminance E: L = ρ·E/π (Lambertian; CIE 15, any radiometry text);
 * - the front-surface veil: L_veil = R_s·L_mirrored, added to every state, of the illuminant's
 *   chromaticity (the mirrored surroundings are lit by the same light);
 * - a backlight (transflective night case): `backlight_cdm2` is what the background shows; a
 *   state passes the square root of its double-pass (reflective) fraction of the background's,
 *   since backlight crosses the polariser–LC–polariser stack once where ambient light crosses it
 *   twice (first-order; a measured transmissive contrast overrides it in practice). Backlight
 *   chromaticity is taken as the illuminant's white.
 * Colours: XYZ in cd/m² (Y = luminance) from the 5 nm CIE weights of the scenario's illuminant;
 * CIELAB and the sRGB preview relative to the adapted white, the brighter of a perfect white
 * diffuser (E/π) and the background.
 */
import { tristimulusWeights } from '../color/tristimulus-weights';
import { reflectanceToXyz } from '../color/spectrum-to-xyz';
import { illuminantByName } from '../color/illuminant-by-name';
import { xyzToLab } from '../color/cielab';
import { sceneColourPreview } from '../color/culori-bridge';
import { VISIBLE_5NM_GRID } from '../color/spectrum';
import type { ObserverName } from '../color/observers';
import type { Lab, Xyz } from '../color/types';
import type { Scenario } from '../design/legibility-schema';
import { NORMAL_INCIDENCE, type LightModel } from './light-model';

export const STATE_NAMES = ['background', 'off', 'on'] as const;
export type StateName = (typeof STATE_NAMES)[number];

/** Reflectance factor spectra (first surface included) on the 5 nm visible grid. */
export type StateSpectra = Record<StateName, ArrayLike<number>>;

export interface LitState {
	luminance_cdm2: number;
	/** Absolute tristimulus values, Y in cd/m². */
	xyz_cdm2: Xyz;
	lab: Lab;
	hex: string;
	inGamut: boolean;
	/** Encoded sRGB before clamping (0…1 in gamut). */
	rgb: { r: number; g: number; b: number };
}

export interface ScenarioLight extends Record<StateName, LitState> {
	/** Diffuse luminance factor of each state without the first surface (ρ in L = ρE/π). */
	diffuse: Record<StateName, number>;
	/** Backlight luminance each state passes, cd/m². */
	backlit_cdm2: Record<StateName, number>;
	veil_cdm2: number;
	adaptedWhite_cdm2: number;
	white: Xyz;
	/** The optical model the spectra came from. */
	model: LightModel;
}

export function scenarioLight(options: {
	spectra: StateSpectra;
	frontSurfaceReflectance: number;
	scenario: Scenario;
	/** Off the display normal, deg: sets the reading geometry; the spectra already include it. */
	viewAngle_deg: number;
	observer: ObserverName;
	/** Which model gave the spectra; default normal incidence. */
	model?: LightModel;
}): ScenarioLight {
	const { spectra, scenario } = options;
	const rs = options.frontSurfaceReflectance;
	const weights = tristimulusWeights({
		illuminant: illuminantByName(scenario.illuminant),
		observer: options.observer,
		grid: VISIBLE_5NM_GRID
	});
	const { white } = weights;
	const perLux = scenario.illuminance_lx / Math.PI / 100;
	const veil_cdm2 = rs * scenario.mirrored_cdm2;
	const body = {} as Record<StateName, Xyz>;
	for (const name of STATE_NAMES) {
		const full = reflectanceToXyz(weights, spectra[name]);
		body[name] = {
			X: Math.max(0, full.X - rs * white.X),
			Y: Math.max(0, full.Y - rs * white.Y),
			Z: Math.max(0, full.Z - rs * white.Z)
		};
	}
	const backlight = scenario.backlight_cdm2 ?? 0;
	const absolute = {} as Record<StateName, Xyz>;
	const diffuse = {} as Record<StateName, number>;
	const backlit_cdm2 = {} as Record<StateName, number>;
	for (const name of STATE_NAMES) {
		const share = body.background.Y > 0 ? Math.sqrt(body[name].Y / body.background.Y) : 0;
		diffuse[name] = body[name].Y / 100;
		backlit_cdm2[name] = backlight * share;
		const flat = (veil_cdm2 + backlit_cdm2[name]) / 100;
		absolute[name] = {
			X: body[name].X * perLux + flat * white.X,
			Y: body[name].Y * perLux + flat * white.Y,
			Z: body[name].Z * perLux + flat * white.Z
		};
	}
	const adaptedWhite_cdm2 = Math.max(scenario.illuminance_lx / Math.PI, absolute.background.Y);
	const lit = (name: StateName): LitState => {
		const xyz_cdm2 = absolute[name];
		const scale = 100 / adaptedWhite_cdm2;
		const relative = { X: xyz_cdm2.X * scale, Y: xyz_cdm2.Y * scale, Z: xyz_cdm2.Z * scale };
		const preview = sceneColourPreview({ xyz_cdm2, white, adaptedWhite_cdm2 });
		return {
			luminance_cdm2: xyz_cdm2.Y,
			xyz_cdm2,
			lab: xyzToLab(relative, white),
			hex: preview.hex,
			inGamut: preview.inGamut,
			rgb: { r: preview.r, g: preview.g, b: preview.b }
		};
	};
	return {
		background: lit('background'),
		off: lit('off'),
		on: lit('on'),
		diffuse,
		backlit_cdm2,
		veil_cdm2,
		adaptedWhite_cdm2,
		white,
		model: options.model ?? NORMAL_INCIDENCE
	};
}
