import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	applyToVector,
	createMatrix,
	createVector,
	determinant,
	multiply
} from '../../src/lib/core/optics/complex2x2';
import {
	uniformTwistProfile,
	type DirectorProfile
} from '../../src/lib/core/optics/director-profile';
import { jonesOfProfile, type SlabModel } from '../../src/lib/core/optics/profile-jones';
import { backwardJones } from '../../src/lib/core/optics/reciprocity';
import { jonesOfTwistedLayer } from '../../src/lib/core/optics/twisted-layer';
import { goochTarryLeak } from './fixtures';
import { checkAgainstReference } from './reference-check';

const GOOCH_TARRY = 'Gooch & Tarry, J. Phys. D 8:1575 (1975)';
const QUARTER_TURN_rad = Math.PI / 2;
const WAVELENGTH_nm = 550;
const INDICES = { ne: 1.6, no: 1.5 }; // Δn = 0.1, fixture

/** Gap giving Gooch–Tarry parameter u for a 90° layer: u = 2dΔn/λ. */
function gapFor(u: number): number {
	return (u * WAVELENGTH_nm * 1e-9) / (2 * (INDICES.ne - INDICES.no));
}

function leakOfProfile(profile: DirectorProfile, slabModel: SlabModel): number {
	const m = jonesOfProfile(createMatrix(), {
		profile,
		indices: INDICES,
		wavelength_nm: WAVELENGTH_nm,
		slabModel
	});
	const e = applyToVector(createVector(), m, Float64Array.of(1, 0, 0, 0));
	return e[0] * e[0] + e[1] * e[1];
}

const someU = Float64Array.from({ length: 41 }, (_, i) => 0.1 + i * 0.2); // 0.1 … 8.1

describe('sliced director profile', () => {
	it("'twisted' slabs: a uniform profile equals the closed form for any slab count", () => {
		const closed = createMatrix(),
			sliced = createMatrix();
		let worst = 0;
		for (const nodes of [2, 3, 7, 61]) {
			for (const twist_rad of [QUARTER_TURN_rad, -1.1, 4.2]) {
				for (const u of [0.3, 1.7, 5]) {
					const gap_m = gapFor(u);
					jonesOfProfile(sliced, {
						profile: uniformTwistProfile({ gap_m, twist_rad, nodes }),
						indices: INDICES,
						wavelength_nm: WAVELENGTH_nm
					});
					const retardation_rad = (2 * Math.PI * 0.1 * gap_m) / (WAVELENGTH_nm * 1e-9);
					jonesOfTwistedLayer(closed, { twist_rad, retardation_rad });
					for (let i = 0; i < 8; i++) worst = Math.max(worst, Math.abs(sliced[i] - closed[i]));
				}
			}
		}
		console.log(
			`[closed form, Yeh & Gu TN chapter] sliced 'twisted' vs closed form: worst |Δ| = ${worst.toExponential(2)} (matrix entry, amplitude)`
		);
		expect(worst).toBeLessThan(1e-12);
	});

	it("'twisted' slabs, 60 slabs: T_NB equals Gooch–Tarry to 1e-6", () => {
		const actual = someU.map((u) =>
			leakOfProfile(
				uniformTwistProfile({ gap_m: gapFor(u), twist_rad: QUARTER_TURN_rad, nodes: 61 }),
				'twisted'
			)
		);
		const expected = someU.map((u) => goochTarryLeak(QUARTER_TURN_rad, u));
		checkAgainstReference({
			label: "T_NB, sliced 'twisted', 60 slabs",
			source: GOOCH_TARRY,
			actual,
			expected,
			tolerance: 1e-6,
			unit: 'transmittance'
		});
	});

	it("'retarder' slabs, 4000 slabs: T_NB equals Gooch–Tarry to 1e-6", () => {
		// Midpoint retarder slabs carry an O(Δz²) error; a rough estimate gives 1e-5 at 4000
		// slabs, we measure ≈ 1e-7 and hold 1e-6.
		const actual = someU.map((u) =>
			leakOfProfile(
				uniformTwistProfile({ gap_m: gapFor(u), twist_rad: QUARTER_TURN_rad, nodes: 4001 }),
				'retarder'
			)
		);
		const expected = someU.map((u) => goochTarryLeak(QUARTER_TURN_rad, u));
		checkAgainstReference({
			label: "T_NB, sliced 'retarder', 4000 slabs",
			source: GOOCH_TARRY,
			actual,
			expected,
			tolerance: 1e-6,
			unit: 'transmittance'
		});
	});

	it("'retarder' slabs converge to the closed-form matrix (same handedness), entries within 1e-5", () => {
		const twist_rad = 1.3;
		const gap_m = gapFor(2.2);
		const sliced = jonesOfProfile(createMatrix(), {
			profile: uniformTwistProfile({ gap_m, twist_rad, nodes: 4001 }),
			indices: INDICES,
			wavelength_nm: WAVELENGTH_nm,
			slabModel: 'retarder'
		});
		const closed = jonesOfTwistedLayer(createMatrix(), {
			twist_rad,
			retardation_rad: (2 * Math.PI * 0.1 * gap_m) / (WAVELENGTH_nm * 1e-9)
		});
		checkAgainstReference({
			label: "'retarder' vs closed form, matrix entries",
			source: 'Yeh & Gu, TN chapter (closed form, from memory)',
			actual: sliced,
			expected: closed,
			tolerance: 1e-5,
			unit: 'amplitude'
		});
	});

	it('both slab models agree on a tilted, non-linear profile (400 vs 4000 slabs)', () => {
		const nodes = 401;
		const tilt = Float64Array.from(
			{ length: nodes },
			(_, k) => 0.03 + 1.3 * Math.sin((Math.PI * k) / (nodes - 1)) ** 2
		);
		const twist = Float64Array.from({ length: nodes }, (_, k) => {
			const z = k / (nodes - 1);
			return QUARTER_TURN_rad * (z + 0.15 * Math.sin(2 * Math.PI * z));
		});
		const profile = { gap_m: 5e-6, tilt_rad: tilt, twist_rad: twist };
		const fine = jonesOfProfile(createMatrix(), {
			profile,
			indices: INDICES,
			wavelength_nm: WAVELENGTH_nm,
			slabModel: 'twisted',
			subslices: 10
		});
		const coarseTwisted = jonesOfProfile(createMatrix(), {
			profile,
			indices: INDICES,
			wavelength_nm: WAVELENGTH_nm,
			slabModel: 'twisted'
		});
		const coarseRetarder = jonesOfProfile(createMatrix(), {
			profile,
			indices: INDICES,
			wavelength_nm: WAVELENGTH_nm,
			slabModel: 'retarder'
		});
		// A consistency check between the two slab models (no outside value exists for this tilted
		// profile): both are second-order accurate in the slab thickness, so 400 slabs should sit
		// within ~1e-4 of a 4000-slab answer on a smooth profile.
		checkAgainstReference({
			label: "'twisted', 400 slabs vs 4000",
			source: 'consistency check (slab-model convergence)',
			actual: coarseTwisted,
			expected: fine,
			tolerance: 1e-4,
			unit: 'amplitude'
		});
		checkAgainstReference({
			label: "'retarder', 400 slabs vs 'twisted' 4000",
			source: 'consistency check (slab-model convergence)',
			actual: coarseRetarder,
			expected: fine,
			tolerance: 1e-4,
			unit: 'amplitude'
		});
	});

	it('sub-slicing a 2-node linear profile equals the matching many-node profile', () => {
		const twist_rad = 1.5,
			gap_m = 4e-6;
		const coarse = {
			gap_m,
			tilt_rad: Float64Array.of(0.1, 0.5),
			twist_rad: Float64Array.of(0, twist_rad)
		};
		const nodes = 9;
		const fine = {
			gap_m,
			tilt_rad: Float64Array.from({ length: nodes }, (_, k) => 0.1 + (0.4 * k) / 8),
			twist_rad: Float64Array.from({ length: nodes }, (_, k) => (twist_rad * k) / 8)
		};
		for (const slabModel of ['twisted', 'retarder'] as const) {
			const a = jonesOfProfile(createMatrix(), {
				profile: coarse,
				indices: INDICES,
				wavelength_nm: 500,
				slabModel,
				subslices: 8
			});
			const b = jonesOfProfile(createMatrix(), {
				profile: fine,
				indices: INDICES,
				wavelength_nm: 500,
				slabModel
			});
			for (let i = 0; i < 8; i++) expect(a[i]).toBeCloseTo(b[i], 13);
		}
	});

	it('azimuths count from the entrance director: an offset profile gives the same matrix', () => {
		const base = uniformTwistProfile({ gap_m: 5e-6, twist_rad: QUARTER_TURN_rad, nodes: 11 });
		const shifted = { ...base, twist_rad: base.twist_rad.map((t) => t + 0.4) };
		const a = jonesOfProfile(createMatrix(), {
			profile: base,
			indices: INDICES,
			wavelength_nm: 600
		});
		const b = jonesOfProfile(createMatrix(), {
			profile: shifted,
			indices: INDICES,
			wavelength_nm: 600
		});
		for (let i = 0; i < 8; i++) expect(a[i]).toBeCloseTo(b[i], 14);
	});

	it('a homeotropic layer (tilt 90°) is the identity in both slab models', () => {
		const profile = uniformTwistProfile({
			gap_m: 6e-6,
			twist_rad: QUARTER_TURN_rad,
			nodes: 31,
			tilt_rad: QUARTER_TURN_rad
		});
		for (const slabModel of ['twisted', 'retarder'] as const) {
			const m = jonesOfProfile(createMatrix(), {
				profile,
				indices: INDICES,
				wavelength_nm: 550,
				slabModel
			});
			checkAgainstReference({
				label: `homeotropic, '${slabModel}'`,
				// Light along the optic axis sees only n_o, so a homeotropic layer has no retardation
				// and (common phase dropped) is the identity (Born & Wolf, Principles of Optics,
				// §15.3, uniaxial crystals — from memory).
				source: 'propagation along the optic axis: n_eff(90°) = n_o',
				actual: m,
				expected: createMatrix(),
				tolerance: 1e-12,
				unit: 'amplitude'
			});
		}
	});

	it('property: a lossless layer is unitary with |det| = 1, and so is its round trip', () => {
		const profileArb = fc.integer({ min: 2, max: 40 }).chain((nodes) =>
			fc.record({
				gap_m: fc.double({ min: 0, max: 2e-5, noNaN: true }),
				tilt: fc.array(fc.double({ min: 0, max: Math.PI / 2, noNaN: true }), {
					minLength: nodes,
					maxLength: nodes
				}),
				twist: fc.array(fc.double({ min: -2 * Math.PI, max: 2 * Math.PI, noNaN: true }), {
					minLength: nodes,
					maxLength: nodes
				})
			})
		);
		const m = createMatrix(),
			back = createMatrix(),
			round = createMatrix(),
			det = new Float64Array(2);
		let worst = 0;
		fc.assert(
			fc.property(
				profileArb,
				fc.double({ min: 380, max: 780, noNaN: true }),
				fc.double({ min: 1.45, max: 1.55, noNaN: true }),
				fc.double({ min: 0, max: 0.3, noNaN: true }),
				fc.constantFrom<SlabModel>('twisted', 'retarder'),
				({ gap_m, tilt, twist }, wavelength_nm, no, dn, slabModel) => {
					const profile = {
						gap_m,
						tilt_rad: Float64Array.from(tilt),
						twist_rad: Float64Array.from(twist)
					};
					jonesOfProfile(m, { profile, indices: { ne: no + dn, no }, wavelength_nm, slabModel });
					multiply(round, backwardJones(back, m), m);
					for (const matrix of [m, round]) {
						determinant(det, matrix);
						worst = Math.max(worst, Math.abs(Math.hypot(det[0], det[1]) - 1));
					}
					// unitarity: columns of m have unit norm and are orthogonal
					const n1 = m[0] ** 2 + m[1] ** 2 + m[4] ** 2 + m[5] ** 2;
					const n2 = m[2] ** 2 + m[3] ** 2 + m[6] ** 2 + m[7] ** 2;
					const dotRe = m[0] * m[2] + m[1] * m[3] + m[4] * m[6] + m[5] * m[7];
					const dotIm = m[0] * m[3] - m[1] * m[2] + m[4] * m[7] - m[5] * m[6];
					worst = Math.max(
						worst,
						Math.abs(n1 - 1),
						Math.abs(n2 - 1),
						Math.abs(dotRe),
						Math.abs(dotIm)
					);
					expect(worst).toBeLessThan(1e-12);
				}
			),
			{ numRuns: 300 }
		);
		console.log(
			`[Jones 1941, lossless ⇒ unitary] worst ||det| − 1| or unitarity residual = ${worst.toExponential(2)}`
		);
	});
});
