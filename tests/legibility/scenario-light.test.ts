import { describe, expect, it } from 'vitest';
import { converter } from 'culori';
import { expectWithin } from '../helpers/tolerance';
import { scenarioLight } from '../../src/lib/core/legibility/scenario-light';
import { VISIBLE_5NM_GRID } from '../../src/lib/core/color/spectrum';
import type { Scenario } from '../../src/lib/core/design/legibility-schema';

const flat = (value: number) => new Array(VISIBLE_5NM_GRID.count).fill(value);
const base: Scenario = {
	name: 'test',
	illuminance_lx: 500,
	illuminant: 'D65',
	mirrored_cdm2: 0,
	distance_mm: 600,
	viewAngle_deg: 0,
	age_years: 30
};
/** Spectra include the flat first-surface reflection, as the cell model reports them. */
const lightOf = (options: { rs: number; bg: number; seg: number; scenario: Partial<Scenario> }) =>
	scenarioLight({
		spectra: {
			background: flat(options.bg + options.rs),
			off: flat(options.bg + options.rs),
			on: flat(options.seg + options.rs)
		},
		frontSurfaceReflectance: options.rs,
		scenario: { ...base, ...options.scenario },
		viewAngle_deg: 0,
		observer: 'CIE1931-2deg'
	});

describe('light of a scenario', () => {
	it('gives Lambertian luminances L = ρE/π', () => {
		// CIE 15 / any radiometry text; check values physics notes §6 (500 lx: 39.79 and 159.15
		// cd/m² for ρ 0.25 and 1; 10 000 lx: 795.8, 3183.1; 100 000 lx: 7957.7, 31 831)
		const cases = (
			[
				[500, 0.25, 39.79],
				[500, 1, 159.15],
				[10_000, 0.25, 795.8],
				[10_000, 1, 3183.1],
				[100_000, 0.25, 7957.7],
				[100_000, 1, 31831]
			] as const
		).map(([e, rho, expected]) => ({
			label: `ρ ${rho} at ${e} lx`,
			expected,
			actual: lightOf({ rs: 0, bg: rho, seg: 0.02, scenario: { illuminance_lx: e } }).background
				.luminance_cdm2
		}));
		// half a unit of the last printed place (0.1 cd/m²)
		expectWithin(cases, {
			tolerance: 0.05,
			unit: 'cd/m²',
			source: 'CIE 15 Lambertian L = ρE/π (physics notes §6)'
		});
	});

	it("reproduces the handbook's surface-reflection contrast table under diffuse light", () => {
		// Physics notes §7: CR = (ρ_bg + R_s)/(ρ_seg + R_s), ρ_bg 0.27, ρ_seg 0.02 → 13.5, 11.0,
		// 5.2, 3.5 for R_s 0, 0.005, 0.04, 0.08. A uniform diffuse surround of luminance E/π is
		// what the front surface mirrors.
		const e = 1000;
		const cases = (
			[
				[0, 13.5],
				[0.005, 11.0],
				[0.04, 5.2],
				[0.08, 3.5]
			] as const
		).map(([rs, expected]) => {
			const light = lightOf({
				rs,
				bg: 0.27,
				seg: 0.02,
				scenario: { illuminance_lx: e, mirrored_cdm2: e / Math.PI }
			});
			return {
				label: `R_s ${rs}`,
				expected,
				actual: light.off.luminance_cdm2 / light.on.luminance_cdm2
			};
		});
		// the table prints one decimal
		expectWithin(cases, {
			tolerance: 0.05,
			unit: ':1',
			source: 'physics notes §7 surface-reflection table'
		});
	});

	it("shows on-screen colours equal to culori's conversion of the predicted XYZ", () => {
		// Adaptation stated in the product: Bradford from the illuminant's white to D65, then
		// IEC 61966-2-1 sRGB. culori's own xyz50 → rgb path uses Bradford D50 → D65 with its D50
		// white, an independent implementation of the same chain.
		const toRgb = converter('rgb');
		const light = lightOf({
			rs: 0.04,
			bg: 0.25,
			seg: 0.05,
			scenario: { illuminant: 'D50', mirrored_cdm2: 100 }
		});
		const cases = (['background', 'off', 'on'] as const).flatMap((name) => {
			const state = light[name];
			const scale = 1 / light.adaptedWhite_cdm2;
			const byCulori = toRgb({
				mode: 'xyz50',
				x: state.xyz_cdm2.X * scale,
				y: state.xyz_cdm2.Y * scale,
				z: state.xyz_cdm2.Z * scale
			});
			return (['r', 'g', 'b'] as const).map((c) => ({
				label: `${name}.${c}`,
				expected: byCulori[c],
				actual: state.rgb[c]
			}));
		});
		// 5 nm CIE D50 white vs culori's tabulated D50 (≈ 1e-4 in xy): 2e-3 of full scale
		expectWithin(cases, {
			tolerance: 2e-3,
			unit: 'sRGB (0…1)',
			source: 'culori xyz50 → rgb (Bradford, IEC 61966-2-1)'
		});
	});

	it('adds the veil to every state and lifts the dark state most', () => {
		const dark = lightOf({ rs: 0.04, bg: 0.25, seg: 0.01, scenario: { mirrored_cdm2: 0 } });
		const veiled = lightOf({ rs: 0.04, bg: 0.25, seg: 0.01, scenario: { mirrored_cdm2: 1000 } });
		expect(veiled.veil_cdm2).toBeCloseTo(40, 10);
		expect(veiled.on.luminance_cdm2 - dark.on.luminance_cdm2).toBeCloseTo(40, 8);
		expect(veiled.background.luminance_cdm2 - dark.background.luminance_cdm2).toBeCloseTo(40, 8);
	});
});
