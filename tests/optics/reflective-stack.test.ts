import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { uniformTwistProfile } from '../../src/lib/core/optics/director-profile';
import {
	FRONT_SURFACE_REFLECTANCE_DEFAULT,
	fresnelNormalReflectance
} from '../../src/lib/core/optics/fresnel';
import {
	IDEAL_POLARIZER,
	NEUTRAL_GREY_POLARIZER
} from '../../src/lib/core/optics/polarizer-models';
import {
	singlePassTransmittance,
	stackReflectance,
	stackSpectra
} from '../../src/lib/core/optics/reflective-stack';
import {
	createStackEvaluator,
	createStackSpectra
} from '../../src/lib/core/optics/stack-evaluator';
import {
	reflectiveStackForMode,
	type ReflectiveStackSpec
} from '../../src/lib/core/optics/stack-spec';
import { fixtureIndicesAt, fixtureOnProfile, goochTarryLeak, visibleGrid_nm } from './fixtures';
import { checkAgainstReference } from './reference-check';
import { propertySeed } from '../helpers/seed';

const QUARTER_TURN_rad = Math.PI / 2;
const DN = 0.1;
const CONSTANT_INDICES = () => ({ ne: 1.6, no: 1.5 }); // Δn = 0.1, no dispersion (fixture)
const AT_550 = Float64Array.of(550);
/** A 90° TN at the first Gooch–Tarry minimum for 550 nm: exact guiding there (T_NW = 1). */
const GUIDING_OFF = uniformTwistProfile({
	gap_m: (Math.sqrt(3) * 550e-9) / (2 * DN),
	twist_rad: QUARTER_TURN_rad,
	nodes: 61
});
const HOMEOTROPIC_ON = uniformTwistProfile({
	gap_m: 5e-6,
	twist_rad: QUARTER_TURN_rad,
	nodes: 61,
	tilt_rad: QUARTER_TURN_rad
});

/** Derived by Jones calculus (Jones 1941): R ≈ (k1/2)·(k1·T_NW)·ρ·k1·[(1−δ)+δ/2]·(k1·T_NW). */
function derivedBrightReflectance({
	k1,
	rho,
	delta
}: {
	k1: number;
	rho: number;
	delta: number;
}): number {
	return (k1 / 2) * k1 * rho * k1 * (1 - delta + delta / 2) * k1;
}

function positiveStack(options: {
	k1: number;
	rho: number;
	delta: number;
	rs: number;
}): ReflectiveStackSpec {
	return reflectiveStackForMode({
		mode: 'positive',
		twist_deg: 90,
		polarizer: { kind: 'principal', k1: options.k1, k2: 0 },
		reflector: {
			kind: 'brushedMetal',
			reflectance: options.rho,
			depolarizedFraction: options.delta
		},
		frontSurfaceReflectance: options.rs
	});
}

describe('reflective stack', () => {
	it('bright state: positive mode, 0 V, k1 = 0.88, ideal guiding, ρ = 0.8, no depolarisation', () => {
		const stack = positiveStack({ k1: 0.88, rho: 0.8, delta: 0, rs: 0 });
		const r = stackReflectance({
			profile: GUIDING_OFF,
			indicesAt: CONSTANT_INDICES,
			wavelengths_nm: AT_550,
			stack
		});
		// By hand: unpolarised light keeps k1/2 through the front polarizer, k1 through the rear one,
		// ρ at the reflector, then k1 and k1 on the way back: 0.44·0.88·0.8·0.88·0.88 = 0.23987814.
		checkAgainstReference({
			label: 'bright reflectance, R_s = 0',
			source: 'Jones calculus (Jones, JOSA 31:488 (1941)), evaluated by hand',
			actual: r,
			expected: [0.23987814],
			tolerance: 1e-8,
			unit: 'reflectance (0…1)'
		});
		checkAgainstReference({
			label: 'bright reflectance vs derived formula',
			source: 'derived by Jones calculus (Jones, JOSA 31:488 (1941))',
			actual: r,
			expected: [derivedBrightReflectance({ k1: 0.88, rho: 0.8, delta: 0 })],
			tolerance: 1e-12,
			unit: 'reflectance (0…1)'
		});
	});

	it('depolarised fraction δ and first surface follow R = R_s + (1 − R_s)²·R_inner', () => {
		const actual: number[] = [];
		const expected: number[] = [];
		for (const delta of [0, 0.3, 0.5, 1]) {
			for (const rs of [0, 0.005, FRONT_SURFACE_REFLECTANCE_DEFAULT]) {
				const stack = positiveStack({ k1: 0.86, rho: 0.85, delta, rs });
				actual.push(
					stackReflectance({
						profile: GUIDING_OFF,
						indicesAt: CONSTANT_INDICES,
						wavelengths_nm: AT_550,
						stack
					})[0]
				);
				expected.push(
					rs + (1 - rs) ** 2 * derivedBrightReflectance({ k1: 0.86, rho: 0.85, delta })
				);
			}
		}
		checkAgainstReference({
			label: 'bright reflectance over δ, R_s',
			source: 'derived by Jones calculus, first surface added incoherently',
			actual,
			expected,
			tolerance: 1e-12,
			unit: 'reflectance (0…1)'
		});
	});

	it('default first surface is Fresnel for n = 1.5: 0.0400', () => {
		checkAgainstReference({
			label: 'R_s',
			source: 'Fresnel equations at normal incidence',
			actual: [
				FRONT_SURFACE_REFLECTANCE_DEFAULT,
				fresnelNormalReflectance(1.52),
				fresnelNormalReflectance(1.49)
			],
			expected: [0.04, 0.0426, 0.0387],
			tolerance: 5e-5,
			unit: 'reflectance (0…1)'
		});
	});

	it('negative mode (parallel) at 0 V with ideal guiding is black apart from R_s', () => {
		const stack = reflectiveStackForMode({
			mode: 'negative',
			twist_deg: 90,
			polarizer: IDEAL_POLARIZER,
			reflector: { kind: 'diffuseWhite' }
		});
		expect(stack.rear.axis_deg).toBe(0);
		const r = stackReflectance({
			profile: GUIDING_OFF,
			indicesAt: CONSTANT_INDICES,
			wavelengths_nm: AT_550,
			stack
		});
		checkAgainstReference({
			label: 'negative-mode dark',
			source: 'Gooch–Tarry minimum: T_NB = 0',
			actual: r,
			expected: [FRONT_SURFACE_REFLECTANCE_DEFAULT],
			tolerance: 1e-12,
			unit: 'reflectance (0…1)'
		});
	});

	it('homeotropic on-state between crossed polarizers: R_s plus a small leakage', () => {
		const stack = reflectiveStackForMode({
			mode: 'positive',
			twist_deg: 90,
			polarizer: NEUTRAL_GREY_POLARIZER
		});
		expect(stack.rear.axis_deg).toBe(90);
		const r = stackReflectance({
			profile: HOMEOTROPIC_ON,
			indicesAt: fixtureIndicesAt,
			wavelengths_nm: visibleGrid_nm(),
			stack
		});
		const leak = r.map((x) => x - FRONT_SURFACE_REFLECTANCE_DEFAULT);
		const worst = Math.max(...leak);
		console.log(
			`[crossed pair, T_c = k1·k2 ≈ 1e-4] homeotropic on-state leakage above R_s: max ${worst.toExponential(2)}`
		);
		expect(Math.min(...leak)).toBeGreaterThanOrEqual(0);
		expect(worst).toBeLessThan(1e-4);
	});

	it('single pass through the stack API: Gooch–Tarry across a dispersive spectrum, closed-form and sliced', () => {
		const wavelengths_nm = visibleGrid_nm();
		const gap_m = 5e-6;
		const expectedNb = wavelengths_nm.map((w) => {
			const { ne, no } = fixtureIndicesAt(w);
			return goochTarryLeak(QUARTER_TURN_rad, (2 * gap_m * (ne - no)) / (w * 1e-9));
		});
		const ideal = (rear_deg: number) => ({
			front: { polarizer: IDEAL_POLARIZER, axis_deg: 0 },
			rear: { polarizer: IDEAL_POLARIZER, axis_deg: rear_deg }
		});
		for (const [nodes, slabModel, tolerance] of [
			[2, 'twisted', 1e-6],
			[4001, 'retarder', 1e-6]
		] as const) {
			const profile = uniformTwistProfile({ gap_m, twist_rad: QUARTER_TURN_rad, nodes });
			const parallel = singlePassTransmittance({
				profile,
				indicesAt: fixtureIndicesAt,
				wavelengths_nm,
				stack: ideal(0),
				slabModel
			});
			const crossed = singlePassTransmittance({
				profile,
				indicesAt: fixtureIndicesAt,
				wavelengths_nm,
				stack: ideal(90),
				slabModel
			});
			const label = `${slabModel}, ${nodes - 1} slab(s)`;
			checkAgainstReference({
				label: `T_NB, ${label}`,
				source: 'Gooch & Tarry, J. Phys. D 8:1575 (1975)',
				actual: parallel,
				expected: expectedNb,
				tolerance,
				unit: 'transmittance'
			});
			checkAgainstReference({
				label: `T_NW, ${label}`,
				source: 'Gooch & Tarry, J. Phys. D 8:1575 (1975)',
				actual: crossed,
				expected: expectedNb.map((t) => 1 - t),
				tolerance,
				unit: 'transmittance'
			});
		}
	});

	it('transflective: reflects 0.7, depolarising, and reports the transmitted share', () => {
		const stack = reflectiveStackForMode({
			mode: 'positive',
			twist_deg: 90,
			polarizer: IDEAL_POLARIZER,
			reflector: { kind: 'transflective' }
		});
		const s = stackSpectra({
			profile: GUIDING_OFF,
			indicesAt: CONSTANT_INDICES,
			wavelengths_nm: AT_550,
			stack
		});
		const rs = FRONT_SURFACE_REFLECTANCE_DEFAULT;
		// I_r = 1/2 (ideal, guided); R = R_s + (1−R_s)²·0.7·I_r²; T_rear = (1−R_s)·0.3·I_r
		checkAgainstReference({
			label: 'transflective R, T_rear',
			source: 'Jones calculus with ideal polarizers and a depolarising reflector, by hand',
			actual: [s.reflectance[0], s.transmittedToRear[0]],
			expected: [rs + (1 - rs) ** 2 * 0.7 * 0.25, (1 - rs) * 0.3 * 0.5],
			tolerance: 1e-12,
			unit: 'fraction (0…1)'
		});
		expect(s.singlePass[0]).toBeCloseTo(1, 12);
	});

	it('indices as arrays and as a callback give identical spectra; out buffers are reused', () => {
		const wavelengths_nm = visibleGrid_nm();
		const stack = reflectiveStackForMode({ mode: 'positive', twist_deg: 90 });
		const ne = wavelengths_nm.map((w) => fixtureIndicesAt(w).ne);
		const no = wavelengths_nm.map((w) => fixtureIndicesAt(w).no);
		const profile = fixtureOnProfile(41);
		const viaCallback = stackReflectance({
			profile,
			indicesAt: fixtureIndicesAt,
			wavelengths_nm,
			stack
		});
		const viaArrays = stackReflectance({ profile, indicesAt: { ne, no }, wavelengths_nm, stack });
		expect(Array.from(viaArrays)).toEqual(Array.from(viaCallback));
		const evaluator = createStackEvaluator({ wavelengths_nm, indicesAt: fixtureIndicesAt, stack });
		const out = createStackSpectra(wavelengths_nm.length);
		evaluator.evaluate(GUIDING_OFF, out);
		expect(evaluator.evaluate(profile, out).reflectance).toBe(out.reflectance);
		expect(Array.from(out.reflectance)).toEqual(Array.from(viaCallback));
	});

	it('property: reflectance lies in [R_s, 1] and single pass in [0, 1] for random stacks', () => {
		const wavelengths_nm = Float64Array.of(420, 550, 680);
		fc.assert(
			fc.property(
				fc.double({ min: 0, max: 360, noNaN: true }),
				fc.double({ min: 0, max: 360, noNaN: true }),
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.double({ min: 0, max: 0.2, noNaN: true }),
				fc.integer({ min: 2, max: 30 }),
				(front_deg, rear_deg, rho, delta, rs, nodes) => {
					const stack: ReflectiveStackSpec = {
						front: { polarizer: NEUTRAL_GREY_POLARIZER, axis_deg: front_deg },
						rear: { polarizer: IDEAL_POLARIZER, axis_deg: rear_deg },
						reflector: { kind: 'brushedMetal', reflectance: rho, depolarizedFraction: delta },
						frontSurfaceReflectance: rs
					};
					const s = stackSpectra({
						profile: fixtureOnProfile(nodes),
						indicesAt: fixtureIndicesAt,
						wavelengths_nm,
						stack
					});
					for (let i = 0; i < 3; i++) {
						expect(s.reflectance[i]).toBeGreaterThanOrEqual(rs - 1e-15);
						expect(s.reflectance[i]).toBeLessThanOrEqual(1);
						expect(s.singlePass[i]).toBeGreaterThanOrEqual(0);
						expect(s.singlePass[i]).toBeLessThanOrEqual(1 + 1e-12);
					}
				}
			),
			{ numRuns: 200 }
		);
	});

	it('property: returned light scales with the reflector, mixes with depolarisation, and an ideal front polarizer passes at most half', () => {
		// Physics, not the code: with one bounce (multiple reflections neglected) the light
		// returned is proportional to the reflector's reflectance ρ; a reflector depolarising a
		// share δ returns the mix (1 − δ)·R(δ=0) + δ·R(δ=1); and an ideal polarizer passes at most
		// half of unpolarised light (Malus), which crosses the first surface twice, so
		// R − R_s ≤ (1 − R_s)²·ρ/2 (Born & Wolf, Principles of Optics, §1.5 and §14.4).
		const wavelengths_nm = Float64Array.of(430, 550, 660);
		const run = (options: {
			front_deg: number;
			rear_deg: number;
			rho: number;
			delta: number;
			rs: number;
			nodes: number;
		}) =>
			stackSpectra({
				profile: fixtureOnProfile(options.nodes),
				indicesAt: fixtureIndicesAt,
				wavelengths_nm,
				stack: {
					front: { polarizer: IDEAL_POLARIZER, axis_deg: options.front_deg },
					rear: { polarizer: IDEAL_POLARIZER, axis_deg: options.rear_deg },
					reflector: {
						kind: 'brushedMetal',
						reflectance: options.rho,
						depolarizedFraction: options.delta
					},
					frontSurfaceReflectance: options.rs
				}
			}).reflectance;
		fc.assert(
			fc.property(
				fc.double({ min: 0, max: 360, noNaN: true }),
				fc.double({ min: 0, max: 360, noNaN: true }),
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.double({ min: 0, max: 0.2, noNaN: true }),
				fc.integer({ min: 2, max: 30 }),
				(front_deg, rear_deg, rho, delta, rs, nodes) => {
					const base = { front_deg, rear_deg, rs, nodes };
					const r = run({ ...base, rho, delta });
					const full = run({ ...base, rho: 1, delta });
					const kept = run({ ...base, rho, delta: 0 });
					const mixed = run({ ...base, rho, delta: 1 });
					for (let i = 0; i < wavelengths_nm.length; i++) {
						expect(r[i] - rs).toBeCloseTo(rho * (full[i] - rs), 12);
						expect(r[i]).toBeCloseTo((1 - delta) * kept[i] + delta * mixed[i], 12);
						expect(r[i] - rs).toBeLessThanOrEqual(((1 - rs) ** 2 * rho) / 2 + 1e-12);
					}
				}
			),
			{ numRuns: 150, seed: propertySeed('reflective stack scaling') }
		);
	});

	it('rejects bad inputs at the public edge', () => {
		const stack = reflectiveStackForMode({ mode: 'positive', twist_deg: 90 });
		const base = {
			profile: GUIDING_OFF,
			indicesAt: CONSTANT_INDICES,
			wavelengths_nm: AT_550,
			stack
		};
		expect(() => stackReflectance({ ...base, wavelengths_nm: Float64Array.of(-1) })).toThrow(
			RangeError
		);
		expect(() =>
			stackReflectance({ ...base, stack: { ...stack, frontSurfaceReflectance: 1 } })
		).toThrow(RangeError);
		expect(() =>
			stackReflectance({
				...base,
				stack: {
					...stack,
					reflector: { kind: 'transflective', reflectance: 0.8, transmittance: 0.3 }
				}
			})
		).toThrow(RangeError);
		expect(() =>
			stackReflectance({
				...base,
				profile: { gap_m: 5e-6, tilt_rad: Float64Array.of(0), twist_rad: Float64Array.of(0) }
			})
		).toThrow(RangeError);
		expect(() =>
			stackReflectance({
				...base,
				indicesAt: { ne: Float64Array.of(1.6, 1.6), no: Float64Array.of(1.5, 1.5) }
			})
		).toThrow(RangeError);
	});
});
