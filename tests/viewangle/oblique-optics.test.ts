import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectWithin, type ReferenceCase } from '../helpers/tolerance';
import { createMatrix, identity } from '../../src/lib/core/optics/complex2x2';
import {
	createOrientedSlabs,
	orientedSlabs
} from '../../src/lib/core/optics/oblique/oriented-slabs';
import { propagateSlabs } from '../../src/lib/core/optics/oblique/uniaxial-slabs';
import { isotropicInterface } from '../../src/lib/core/optics/oblique/isotropic-interface';
import { createObliqueStackEvaluator } from '../../src/lib/core/optics/oblique/oblique-stack';
import { POLARIZER_INDEX } from '../../src/lib/core/optics/oblique/absorbing-polarizer';
import { createStackEvaluator } from '../../src/lib/core/optics/stack-evaluator';
import { reflectiveStackForMode } from '../../src/lib/core/optics/stack-spec';
import { createCellOptics } from '../../src/lib/core/cell/cell-optics';
import { demoDesign } from '../../src/lib/core/design/demo';
import { rmsVoltages } from '../../src/lib/core/drive/rms-drive';
import { fixtureIndicesAt, fixtureOnProfile, visibleGrid_nm } from '../optics/fixtures';

const DEG = Math.PI / 180;

/** det of a slab's Jones matrix = e^{−iΓ} (the ordinary phase is factored out). */
function slabRetardation(options: {
	c: [number, number, number];
	polar_deg: number;
	azimuth_deg: number;
	ne: number;
	no: number;
	thickness_m: number;
	wavelength_m: number;
}): { cos: number; sin: number } {
	const slabs = createOrientedSlabs(1);
	slabs.thickness_m = options.thickness_m;
	[slabs.cx[0], slabs.cy[0], slabs.cz[0]] = options.c;
	const m = identity(createMatrix());
	const beta = Math.sin(options.polar_deg * DEG);
	propagateSlabs(m, {
		slabs,
		betaX: beta * Math.cos(options.azimuth_deg * DEG),
		betaY: beta * Math.sin(options.azimuth_deg * DEG),
		ne: options.ne,
		no: options.no,
		wavelength_m: options.wavelength_m,
		sense: 1
	});
	const re = m[0] * m[6] - m[1] * m[7] - (m[2] * m[4] - m[3] * m[5]);
	const im = m[0] * m[7] + m[1] * m[6] - (m[2] * m[5] + m[3] * m[4]);
	return { cos: re, sin: -im };
}

describe('extended Jones slab against the uniaxial-plate closed forms', () => {
	// Yeh & Gu, Optics of Liquid Crystal Displays (1999), extended-Jones chapter:
	// a-plate (axis in the plate at azimuth φc): N_e = n_e·√(1 − β²sin²ψ/n_e² − β²cos²ψ/n_o²), ψ = φ − φc;
	// c-plate (axis along the normal): N_e = (n_o/n_e)·√(n_e² − β²); ordinary N_o = √(n_o² − β²);
	// Γ = k0·d·(N_e − N_o). Tilted axis at normal incidence: N_e = n_e n_o/√(n_o²cos²θ + n_e²sin²θ).
	it('gives the closed-form retardation for many angles and orientations', () => {
		const ne = 1.62,
			no = 1.5,
			d = 3e-6,
			lambda = 550e-9;
		const k0d = ((2 * Math.PI) / lambda) * d;
		const cases: ReferenceCase[] = [];
		const push = (
			label: string,
			gamma: number,
			c: [number, number, number],
			polar: number,
			az: number
		) => {
			const got = slabRetardation({
				c,
				polar_deg: polar,
				azimuth_deg: az,
				ne,
				no,
				thickness_m: d,
				wavelength_m: lambda
			});
			cases.push({ label: `${label} cos`, expected: Math.cos(gamma), actual: got.cos });
			cases.push({ label: `${label} sin`, expected: Math.sin(gamma), actual: got.sin });
		};
		for (const polar of [0, 10, 25, 40, 55, 70, 85]) {
			for (const az of [0, 30, 75, 140, 220, 300]) {
				const beta = Math.sin(polar * DEG);
				const nO = Math.sqrt(no * no - beta * beta);
				for (const axis of [0, 20, 90, 133]) {
					const psi = (az - axis) * DEG;
					const nE =
						ne *
						Math.sqrt(
							1 -
								(beta * beta * Math.sin(psi) ** 2) / (ne * ne) -
								(beta * beta * Math.cos(psi) ** 2) / (no * no)
						);
					push(
						`a-plate θ=${polar} φ=${az} axis=${axis}`,
						k0d * (nE - nO),
						[Math.cos(axis * DEG), Math.sin(axis * DEG), 0],
						polar,
						az
					);
				}
				const nEc = (no / ne) * Math.sqrt(ne * ne - beta * beta);
				push(`c-plate θ=${polar} φ=${az}`, k0d * (nEc - nO), [0, 0, 1], polar, az);
			}
		}
		for (const tilt of [5, 30, 60, 89]) {
			const t = tilt * DEG;
			const nEff = (ne * no) / Math.sqrt(no * no * Math.cos(t) ** 2 + ne * ne * Math.sin(t) ** 2);
			push(
				`tilted ${tilt}° normal`,
				k0d * (nEff - no),
				[Math.cos(t) * 0.6, Math.cos(t) * 0.8, Math.sin(t)],
				0,
				0
			);
		}
		expectWithin(cases, {
			tolerance: 1e-9,
			unit: '(cos/sin of Γ)',
			source: 'Yeh & Gu 1999, uniaxial plate'
		});
	});
});

describe('crossed ideal polarizers off the normal', () => {
	// Yeh & Gu (1999), polarizer chapter: two ideal O-type polarizers, absorption axes along x and
	// y, light at angle θ (inside the sheets) and azimuth φ leaks
	// T = sin⁴θ·sin²φ·cos²φ / ((cos²θ + sin²θ·sin²φ)·(cos²θ + sin²θ·cos²φ)); worst at φ = 45°.
	it('leaks as the closed form says, including the worst azimuth', () => {
		const grid = Float64Array.of(450, 550, 650);
		const evaluator = createObliqueStackEvaluator({
			wavelengths_nm: grid,
			indices: { ne: new Float64Array(3).fill(1.5), no: new Float64Array(3).fill(1.5) },
			stack: {
				front: { polarizer: { kind: 'ideal' }, axis_deg: 90 },
				rear: { polarizer: { kind: 'ideal' }, axis_deg: 0 },
				reflector: { kind: 'diffuseWhite' },
				frontSurfaceReflectance: 0
			},
			incidentLight: 'mirrored'
		});
		const state = evaluator.prepare(createOrientedSlabs(0));
		const cases: ReferenceCase[] = [];
		for (const polar of [0, 15, 30, 45, 60, 75, 85]) {
			for (const az of [0, 20, 45, 70, 135, 200, 315]) {
				const sinP = Math.sin(polar * DEG) / POLARIZER_INDEX;
				const s2 = sinP * sinP,
					c2 = 1 - s2;
				const sp2 = Math.sin(az * DEG) ** 2,
					cp2 = Math.cos(az * DEG) ** 2;
				const leak = (s2 * s2 * sp2 * cp2) / ((c2 + s2 * sp2) * (c2 + s2 * cp2));
				const got = evaluator.at(state, { polar_deg: polar, azimuth_deg: az }).toReflector;
				for (let i = 0; i < 3; i++)
					cases.push({ label: `θ=${polar} φ=${az} λ${i}`, expected: leak / 2, actual: got[i] });
			}
		}
		const worst = evaluator.at(state, { polar_deg: 85, azimuth_deg: 45 }).toReflector[0];
		expect(worst).toBeGreaterThan(1e-3); // really leaks at the worst azimuth
		expectWithin(cases, {
			tolerance: 1e-12,
			unit: '(flux fraction)',
			source: 'Yeh & Gu 1999, crossed polarizers'
		});
	});
});

describe('isotropic interface and layer against the Fresnel equations', () => {
	// Hecht, Optics (4th ed. 2002), §4.6: r_s = (n1 cos θi − n2 cos θt)/(n1 cos θi + n2 cos θt),
	// r_p = (n2 cos θi − n1 cos θt)/(n2 cos θi + n1 cos θt), T = (n2 cos θt/(n1 cos θi))·|t|²,
	// t_s = 2 n1 cos θi/(n1 cos θi + n2 cos θt), t_p = 2 n1 cos θi/(n2 cos θi + n1 cos θt);
	// Brewster: tan θ_B = n2/n1 gives R_p = 0.
	function fresnel(n1: number, n2: number, theta: number) {
		const ci = Math.cos(theta);
		const st = (n1 / n2) * Math.sin(theta);
		const ct = Math.sqrt(1 - st * st);
		const rs = (n1 * ci - n2 * ct) / (n1 * ci + n2 * ct);
		const rp = (n2 * ci - n1 * ct) / (n2 * ci + n1 * ct);
		const ts = (2 * n1 * ci) / (n1 * ci + n2 * ct);
		const tp = (2 * n1 * ci) / (n2 * ci + n1 * ct);
		const f = (n2 * ct) / (n1 * ci);
		return { Rs: rs * rs, Rp: rp * rp, Ts: f * ts * ts, Tp: f * tp * tp };
	}
	it('gives the Fresnel reflectances and transmittances', () => {
		const cases: ReferenceCase[] = [];
		for (const [n1, n2] of [
			[1, 1.5],
			[1, 1.52],
			[1.5, 1.7],
			[1.7, 1.5]
		]) {
			for (const deg of [0, 10, 30, 45, 56, 60, 75, 85]) {
				const theta = deg * DEG;
				if ((n1 / n2) * Math.sin(theta) >= 1) continue;
				const ref = fresnel(n1, n2, theta);
				const got = isotropicInterface({ n1, n2, sinTheta1: Math.sin(theta) });
				for (const k of ['Rs', 'Rp', 'Ts', 'Tp'] as const)
					cases.push({ label: `${n1}→${n2} ${deg}° ${k}`, expected: ref[k], actual: got[k] });
			}
		}
		const brewster = Math.atan(1.5);
		cases.push({
			label: 'Brewster Rp',
			expected: 0,
			actual: isotropicInterface({ n1: 1, n2: 1.5, sinTheta1: Math.sin(brewster) }).Rp
		});
		expectWithin(cases, {
			tolerance: 1e-14,
			unit: '(power fraction)',
			source: 'Hecht, Optics §4.6'
		});
	});

	it('passes s or p light through an isotropic layer with the Fresnel transmittance of the front surface', () => {
		const grid = Float64Array.of(550);
		const cases: ReferenceCase[] = [];
		for (const [axis, kind] of [
			[0, 's'],
			[90, 'p']
		] as const) {
			for (const deg of [0, 20, 40, 60, 80]) {
				// viewing azimuth 90°: ŝ = (−1, 0) lies along x, β̂ along y
				const evaluator = createObliqueStackEvaluator({
					wavelengths_nm: grid,
					indices: { ne: Float64Array.of(1.55), no: Float64Array.of(1.55) },
					stack: {
						front: { polarizer: { kind: 'ideal' }, axis_deg: axis },
						rear: { polarizer: { kind: 'ideal' }, axis_deg: axis },
						reflector: { kind: 'diffuseWhite' },
						frontSurfaceReflectance: 0.04
					},
					incidentLight: 'mirrored'
				});
				const slabs = orientedSlabs({
					profile: {
						gap_m: 5e-6,
						tilt_rad: Float64Array.of(0.3, 1, 0.2),
						twist_rad: Float64Array.of(0, 0.7, 1.5)
					},
					entrance_deg: 10,
					sense: 1
				});
				const got = evaluator.at(evaluator.prepare(slabs), { polar_deg: deg, azimuth_deg: 90 });
				const ref = fresnel(1, 1.5, deg * DEG); // R_s = 0.04 ⇔ n = 1.5
				cases.push({
					label: `${kind} ${deg}°`,
					expected: (kind === 's' ? ref.Ts : ref.Tp) / 2,
					actual: got.toReflector[0]
				});
				cases.push({
					label: `surface ${deg}°`,
					expected: (ref.Rs + ref.Rp) / 2,
					actual: got.surface
				});
			}
		}
		expectWithin(cases, {
			tolerance: 1e-12,
			unit: '(flux fraction)',
			source: 'Hecht, Optics §4.6'
		});
	});
});

describe('normal incidence', () => {
	it("equals the normal-incidence Jones stack for the demo's on and off profiles", () => {
		const design = demoDesign();
		const optics = createCellOptics({
			cell: design.cell,
			lighting: design.lighting,
			temperature_C: 25
		});
		const rms = rmsVoltages({
			commons: design.drive.commons,
			biasDivisor: design.drive.biasDivisor,
			amplitude_V: design.drive.amplitude_V
		});
		const grid = optics.wavelengths_nm;
		const ne = new Float64Array(grid.length),
			no = new Float64Array(grid.length);
		grid.forEach((w, i) => ({ ne: ne[i], no: no[i] } = fixtureIndicesAt(w)));
		const spec = reflectiveStackForMode({ mode: 'positive', twist_deg: design.cell.twist_deg });
		const reference = createStackEvaluator({
			wavelengths_nm: grid,
			indicesAt: { ne, no },
			stack: spec,
			slabModel: 'retarder'
		});
		const cases: ReferenceCase[] = [];
		for (const voltage_V of [0, rms.off_V, rms.on_V]) {
			const profile = optics.stateAt(voltage_V).solution;
			const expected = reference.evaluate(profile).reflectance;
			for (const entrance_deg of [0, 37, 250]) {
				const oblique = createObliqueStackEvaluator({
					wavelengths_nm: grid,
					indices: { ne, no },
					stack: {
						front: {
							polarizer: spec.front.polarizer,
							axis_deg: entrance_deg + spec.front.axis_deg
						},
						rear: { polarizer: spec.rear.polarizer, axis_deg: entrance_deg + spec.rear.axis_deg },
						reflector: spec.reflector,
						frontSurfaceReflectance: spec.frontSurfaceReflectance
					},
					incidentLight: 'mirrored'
				});
				const slabs = orientedSlabs({ profile, entrance_deg, sense: 1 });
				const got = oblique.at(oblique.prepare(slabs), {
					polar_deg: 0,
					azimuth_deg: 123
				}).reflectance;
				got.forEach((r, i) =>
					cases.push({
						label: `${voltage_V.toFixed(2)} V entrance ${entrance_deg}° λ${grid[i]}`,
						expected: expected[i],
						actual: r
					})
				);
			}
		}
		expectWithin(cases, {
			tolerance: 1e-12,
			unit: '(reflectance factor)',
			source: 'normal-incidence Jones model (optics/stack-evaluator.ts)'
		});
	});
});

describe('symmetry and energy', () => {
	const grid = visibleGrid_nm().filter((_, i) => i % 8 === 0);
	const ne = grid.map((w) => fixtureIndicesAt(w).ne),
		no = grid.map((w) => fixtureIndicesAt(w).no);
	function evaluatorFor(frontAxis: number, rearAxis: number) {
		return createObliqueStackEvaluator({
			wavelengths_nm: grid,
			indices: { ne, no },
			stack: {
				front: { polarizer: { kind: 'iodinePva' }, axis_deg: frontAxis },
				rear: { polarizer: { kind: 'iodinePva' }, axis_deg: rearAxis },
				reflector: { kind: 'brushedMetal' }
			}
		});
	}

	it('an untwisted cell without pretilt reflects symmetrically about its rubbing plane', () => {
		// mirror symmetry: the director stays in the plane through the rubbing direction and the normal
		const rubbing = 30;
		const evaluator = evaluatorFor(rubbing, rubbing + 90);
		const nodes = 21;
		const tilt = Float64Array.from(
			{ length: nodes },
			(_, k) => 1.2 * Math.sin((Math.PI * k) / (nodes - 1))
		);
		const state = evaluator.prepare(
			orientedSlabs({
				profile: { gap_m: 5e-6, tilt_rad: tilt, twist_rad: new Float64Array(nodes) },
				entrance_deg: rubbing,
				sense: 1
			})
		);
		const cases: ReferenceCase[] = [];
		for (const polar of [20, 45, 60]) {
			for (const off of [15, 50, 100, 170]) {
				const a = evaluator.at(state, { polar_deg: polar, azimuth_deg: rubbing + off }).reflectance;
				const b = evaluator.at(state, { polar_deg: polar, azimuth_deg: rubbing - off }).reflectance;
				a.forEach((v, i) =>
					cases.push({ label: `θ=${polar} ±${off} λ${i}`, expected: v, actual: b[i] })
				);
			}
		}
		const fore = evaluator.at(state, { polar_deg: 45, azimuth_deg: rubbing + 40 }).reflectance;
		const aft = evaluator.at(state, { polar_deg: 45, azimuth_deg: rubbing + 140 }).reflectance;
		const asym = Math.max(...fore.map((v, i) => Math.abs(v - aft[i])));
		expect(Math.abs(asym)).toBeGreaterThan(1e-4); // tilt does break the fore-and-aft symmetry
		expectWithin(cases, {
			tolerance: 1e-12,
			unit: '(reflectance factor)',
			source: 'mirror symmetry'
		});
	});

	it('reversing the twist sense mirrors the reflectance about the front rubbing plane', () => {
		const rubbing = 45;
		const profile = fixtureOnProfile(31);
		const right = evaluatorFor(rubbing, rubbing + 90);
		const left = evaluatorFor(rubbing, rubbing - 90);
		const r = right.prepare(orientedSlabs({ profile, entrance_deg: rubbing, sense: 1 }));
		const l = left.prepare(orientedSlabs({ profile, entrance_deg: rubbing, sense: -1 }));
		const cases: ReferenceCase[] = [];
		for (const polar of [10, 35, 60]) {
			for (const off of [0, 40, 90, 135, 200]) {
				const a = right.at(r, { polar_deg: polar, azimuth_deg: rubbing + off }).reflectance;
				const b = left.at(l, { polar_deg: polar, azimuth_deg: rubbing - off }).reflectance;
				a.forEach((v, i) =>
					cases.push({ label: `θ=${polar} ${off} λ${i}`, expected: v, actual: b[i] })
				);
			}
		}
		expectWithin(cases, {
			tolerance: 1e-12,
			unit: '(reflectance factor)',
			source: 'mirror symmetry'
		});
	});

	it('no stack reflects more than it receives (random directions and profiles)', () => {
		const angle = fc.double({ min: -3, max: 3, noNaN: true });
		fc.assert(
			fc.property(
				fc.array(fc.tuple(angle, angle), { minLength: 2, maxLength: 12 }),
				fc.double({ min: 0, max: 89, noNaN: true }),
				fc.double({ min: 0, max: 360, noNaN: true }),
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.double({ min: 0, max: 0.2, noNaN: true }),
				fc.double({ min: 0, max: 180, noNaN: true }),
				(nodes, polar_deg, azimuth_deg, delta, rs, axis) => {
					const evaluator = createObliqueStackEvaluator({
						wavelengths_nm: grid,
						indices: { ne, no },
						stack: {
							front: { polarizer: { kind: 'principal', k1: 1, k2: 1 }, axis_deg: axis },
							rear: { polarizer: { kind: 'ideal' }, axis_deg: axis + 70 },
							reflector: { kind: 'brushedMetal', reflectance: 1, depolarizedFraction: delta },
							frontSurfaceReflectance: rs
						}
					});
					const profile = {
						gap_m: 6e-6,
						tilt_rad: Float64Array.from(nodes, (n) => n[0]),
						twist_rad: Float64Array.from(nodes, (n) => n[1])
					};
					const state = evaluator.prepare(orientedSlabs({ profile, entrance_deg: 0, sense: 1 }));
					const { reflectance } = evaluator.at(state, { polar_deg, azimuth_deg });
					for (const v of reflectance) {
						expect(v).toBeGreaterThanOrEqual(0);
						expect(v).toBeLessThanOrEqual(1 + 1e-12);
					}
				}
			),
			{ numRuns: 150 }
		);
	});
});
