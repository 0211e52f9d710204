import { describe, expect, it } from 'vitest';
import { expectWithin, type ReferenceCase } from '../helpers/tolerance';
import { analyzeCell } from '../../src/lib/core/cell/analyze-cell';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';
import {
	analyzeLegibility,
	lightOfScenario,
	statesAt
} from '../../src/lib/core/legibility/analyze-legibility';
import { scenarioLight } from '../../src/lib/core/legibility/scenario-light';
import { obliqueViews, withScenarioViews } from '../../src/lib/core/legibility/oblique-views';
import { lightModelLabel, OBLIQUE_FROM_deg } from '../../src/lib/core/legibility/light-model';
import { observerName } from '../../src/lib/core/cell/cell-optics';
import { readingAzimuth_deg } from '../../src/lib/core/viewangle/reading-azimuth';
import { contrastMap } from '../../src/lib/core/viewangle/contrast-map';
import { createObliqueStackEvaluator } from '../../src/lib/core/optics/oblique/oblique-stack';
import { orientedSlabs } from '../../src/lib/core/optics/oblique/oriented-slabs';
import { uniformTwistProfile } from '../../src/lib/core/optics/director-profile';
import { IDEAL_POLARIZER } from '../../src/lib/core/optics/polarizer-models';
import { fixtureIndicesAt, visibleGrid_nm } from '../optics/fixtures';

const demo = demoDesign();
const cell = analyzeCell(demo);
const room = statesAt(cell, 'room');
const office = demo.legibility.scenarios.find((s) => s.name === 'Office')!;
const ratio = (l: { off: { luminance_cdm2: number }; on: { luminance_cdm2: number } }) =>
	l.off.luminance_cdm2 / l.on.luminance_cdm2;

/** The demo's plates (and with them its reading direction) turned by `turn_deg`. */
function turned(design: Design, turn_deg: number): Design {
	const o = design.orientation;
	return {
		...design,
		orientation: {
			...o,
			frontRubbing_deg: (o.frontRubbing_deg + turn_deg) % 360,
			rearRubbing_deg: (o.rearRubbing_deg + turn_deg) % 360
		}
	};
}

describe('legibility scenarios off the normal', () => {
	it('give the normal-incidence figures at the normal, both paths alike to 1e-9', () => {
		const along = { ...office, viewAngle_deg: 0 };
		const normal = lightOfScenario({ design: demo, states: room, scenario: along });
		expect(normal.model.kind).toBe('normal incidence');
		// the oblique path forced at θ = 0
		const [view] = obliqueViews({
			design: demo,
			states: room,
			directions: [{ polar_deg: 0, azimuth_deg: 37 }]
		});
		const oblique = scenarioLight({
			spectra: view,
			frontSurfaceReflectance: view.surface,
			scenario: along,
			viewAngle_deg: 0,
			observer: observerName(demo.lighting.observer)
		});
		const cases: ReferenceCase[] = [];
		for (const state of ['background', 'off', 'on'] as const) {
			for (const k of ['X', 'Y', 'Z'] as const)
				cases.push({
					label: `${state} ${k}`,
					expected: normal[state].xyz_cdm2[k],
					actual: oblique[state].xyz_cdm2[k]
				});
			for (const k of ['L', 'a', 'b'] as const)
				cases.push({
					label: `${state} ${k}*`,
					expected: normal[state].lab[k],
					actual: oblique[state].lab[k]
				});
		}
		cases.push({ label: 'veil', expected: normal.veil_cdm2, actual: oblique.veil_cdm2 });
		expectWithin(cases, {
			tolerance: 1e-9,
			unit: 'cd/m² or CIELAB unit',
			source: 'normal-incidence path of the same scenario'
		});
	});

	it('run on continuously through the switch-over angle', () => {
		const normal = lightOfScenario({
			design: demo,
			states: room,
			scenario: { ...office, viewAngle_deg: OBLIQUE_FROM_deg }
		});
		const just = lightOfScenario({
			design: demo,
			states: room,
			scenario: { ...office, viewAngle_deg: OBLIQUE_FROM_deg + 0.05 }
		});
		expect(normal.model.kind).toBe('normal incidence');
		expect(just.model.kind).toBe('oblique');
		expect(Math.abs(ratio(just) / ratio(normal) - 1)).toBeLessThan(5e-3);
		expect(
			Math.abs(just.background.luminance_cdm2 / normal.background.luminance_cdm2 - 1)
		).toBeLessThan(5e-3);
	});

	it('lose contrast toward the side opposite the viewing direction, and off the normal', () => {
		const reading = readingAzimuth_deg(demo);
		for (const polar of [30, 40, 50]) {
			const scenario = { ...office, viewAngle_deg: polar };
			const from = (azimuth_deg: number) =>
				lightOfScenario({ design: demo, states: room, scenario, azimuth_deg });
			const normal = ratio(lightOfScenario({ design: demo, states: room, scenario: office }));
			const good = ratio(from(reading));
			const opposite = ratio(from((reading + 180) % 360));
			// twisted nematic: contrast falls with the angle and faster on the far side
			// [common practice: a TN cell's iso-contrast lobe leans toward its viewing direction]
			expect(good).toBeLessThan(normal);
			expect(opposite).toBeLessThan(good);
		}
	});

	it('count the front surface at its Fresnel reflectance for the angle as veil', () => {
		// Fresnel equations for an air–glass surface whose normal reflectance is R_s (Hecht,
		// Optics, 4th ed., §4.6): n = (1 + √R_s)/(1 − √R_s); unpolarised R = (R_s + R_p)/2.
		const rs = demo.cell.frontSurfaceReflectance;
		const n = (1 + Math.sqrt(rs)) / (1 - Math.sqrt(rs));
		const cases: ReferenceCase[] = [20, 40, 60, 75].map((polar) => {
			const t = (polar * Math.PI) / 180;
			const cosT = Math.sqrt(1 - (Math.sin(t) / n) ** 2);
			const s = (Math.cos(t) - n * cosT) / (Math.cos(t) + n * cosT);
			const p = (cosT - n * Math.cos(t)) / (cosT + n * Math.cos(t));
			const scenario = { ...office, viewAngle_deg: polar };
			const light = lightOfScenario({ design: demo, states: room, scenario });
			return {
				label: `θ ${polar}°`,
				expected: ((s * s + p * p) / 2) * office.mirrored_cdm2,
				actual: light.veil_cdm2
			};
		});
		expectWithin(cases, { tolerance: 1e-9, unit: 'cd/m²', source: 'Hecht, Optics §4.6' });
	});

	it('read the same when the plates and the reader turn together', () => {
		const scenario = { ...office, viewAngle_deg: 35 };
		const a = lightOfScenario({ design: demo, states: room, scenario });
		const b = lightOfScenario({ design: turned(demo, 180), states: room, scenario });
		if (a.model.kind !== 'oblique' || b.model.kind !== 'oblique') throw new Error('not oblique');
		expect(Math.abs(b.model.azimuth_deg - a.model.azimuth_deg)).toBeCloseTo(180, 9);
		for (const state of ['background', 'off', 'on'] as const)
			expect(b[state].luminance_cdm2).toBeCloseTo(a[state].luminance_cdm2, 9);
	});

	it('look from the direction the viewing-angle map finds best', () => {
		for (const [turn, sense] of [
			[0, 'right-handed'],
			[90, 'right-handed'],
			[0, 'left-handed']
		] as const) {
			const base = turned(demo, turn);
			const design: Design =
				sense === 'left-handed'
					? {
							...base,
							orientation: {
								...base.orientation,
								twistSense: sense,
								rearRubbing_deg: (base.orientation.frontRubbing_deg - 90 + 180 + 360) % 360
							}
						}
					: base;
			const best = contrastMap({ design, polarStep_deg: 10, azimuthStep_deg: 15 }).best;
			const d = Math.abs(((readingAzimuth_deg(design) - best.azimuth_deg + 540) % 360) - 180);
			expect(d, `${turn}° ${sense}`).toBeLessThan(20);
		}
	});

	it('name the model of every scenario, and use the views the worker attaches', () => {
		const report = analyzeLegibility({ design: demo, cell });
		for (const s of report.scenarios) {
			expect(s.light.model.kind).toBe(
				s.scenario.viewAngle_deg > 0.5 ? 'oblique' : 'normal incidence'
			);
			expect(lightModelLabel(s.light.model)).toMatch(
				/^(normal incidence|oblique, θ = [\d.]+° from \d+ o'clock)$/
			);
		}
		expect(lightModelLabel(report.scenarios[0].light.model)).toBe(
			"oblique, θ = 15° from 6 o'clock"
		);
		const attached = withScenarioViews(cell, demo);
		expect(attached.statesByTemperature.every((s) => s.views?.length === 1)).toBe(true);
		const again = analyzeLegibility({ design: demo, cell: attached });
		again.scenarios.forEach((s, i) =>
			expect(s.contrastRatio).toBeCloseTo(report.scenarios[i].contrastRatio, 12)
		);
		// a scenario along the normal needs no view
		const flat: Design = {
			...demo,
			legibility: {
				...demo.legibility,
				scenarios: demo.legibility.scenarios.map((s) => ({ ...s, viewAngle_deg: 0 }))
			}
		};
		expect(withScenarioViews(cell, flat)).toBe(cell);
	});
});

describe('the oblique model along the normal', () => {
	it('passes the Gooch–Tarry fraction of a 90° twisted layer between parallel polarizers', () => {
		// Gooch & Tarry, J. Phys. D 8:1575 (1975): a uniformly twisted layer (twist Φ, retardation
		// Γ = 2πdΔn/λ, u = Γ/2Φ) between polarizers parallel to the entrance director passes
		// T = sin²(Φ√(1 + u²))/(1 + u²); unpolarised light through an ideal polarizer keeps ½ of it.
		const grid = visibleGrid_nm();
		const ne = new Float64Array(grid.length),
			no = new Float64Array(grid.length);
		grid.forEach((w, i) => ({ ne: ne[i], no: no[i] } = fixtureIndicesAt(w)));
		const twist_rad = Math.PI / 2;
		const cases: ReferenceCase[] = [];
		for (const gap_um of [2, 5, 8]) {
			const evaluator = createObliqueStackEvaluator({
				wavelengths_nm: grid,
				indices: { ne, no },
				stack: {
					front: { polarizer: IDEAL_POLARIZER, axis_deg: 20 },
					rear: { polarizer: IDEAL_POLARIZER, axis_deg: 20 },
					reflector: { kind: 'brushedMetal', reflectance: 1, depolarizedFraction: 0 },
					frontSurfaceReflectance: 0
				},
				incidentLight: 'mirrored'
			});
			const profile = uniformTwistProfile({ gap_m: gap_um * 1e-6, twist_rad, nodes: 401 });
			const slabs = orientedSlabs({ profile, entrance_deg: 20, sense: 1 });
			const parts = evaluator.at(evaluator.prepare(slabs), { polar_deg: 0, azimuth_deg: 0 });
			grid.forEach((w, i) => {
				const u = (Math.PI * gap_um * 1e3 * (ne[i] - no[i])) / w / twist_rad;
				const s = Math.sin(twist_rad * Math.sqrt(1 + u * u));
				cases.push({
					label: `d ${gap_um} µm λ ${w} nm`,
					expected: (0.5 * s * s) / (1 + u * u),
					actual: parts.toReflector[i]
				});
			});
		}
		// midpoint-retarder slabs: the error falls as 1/N², ≈ 1e-6 at 400 slabs for these gaps
		expectWithin(cases, {
			tolerance: 2e-5,
			unit: '(transmittance)',
			source: 'Gooch & Tarry, J. Phys. D 8:1575 (1975)'
		});
	});
});
