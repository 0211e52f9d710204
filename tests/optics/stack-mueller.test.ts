import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createMatrix, multiply, transpose } from '../../src/lib/core/optics/complex2x2';
import { polarizerJones } from '../../src/lib/core/optics/polarizer';
import { jonesOfProfile } from '../../src/lib/core/optics/profile-jones';
import { stackSpectra } from '../../src/lib/core/optics/reflective-stack';
import { unpolarizedTransmittance } from '../../src/lib/core/optics/unpolarized';
import { fixtureIndicesAt, fixtureOnProfile, muellerOfJones, muellerTimesVector } from './fixtures';
import { checkAgainstReference } from './reference-check';

const RAD_PER_DEG = Math.PI / 180;
const MUELLER = 'Mueller calculus from the Jones matrices, M_ij = ½ tr(σ_i J σ_j J†)';

describe('stack reflectance against an independent Mueller (Stokes) computation', () => {
	it('random polarizers, reflector and profile: evaluator = Mueller chain', () => {
		const actual: number[] = [];
		const expected: number[] = [];
		fc.assert(
			fc.property(
				fc.double({ min: 0, max: 180, noNaN: true }),
				fc.double({ min: 0, max: 180, noNaN: true }),
				fc.double({ min: 0.5, max: 1, noNaN: true }),
				fc.double({ min: 0, max: 0.05, noNaN: true }),
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.double({ min: 0, max: 1, noNaN: true }),
				fc.double({ min: 0, max: 0.1, noNaN: true }),
				fc.double({ min: 400, max: 700, noNaN: true }),
				fc.integer({ min: 2, max: 25 }),
				(front_deg, rear_deg, k1, k2, rho, delta, rs, wavelength_nm, nodes) => {
					const polarizer = { kind: 'principal' as const, k1, k2 };
					const profile = fixtureOnProfile(nodes, 4e-6);
					const s = stackSpectra({
						profile,
						indicesAt: fixtureIndicesAt,
						wavelengths_nm: Float64Array.of(wavelength_nm),
						stack: {
							front: { polarizer, axis_deg: front_deg },
							rear: { polarizer, axis_deg: rear_deg },
							reflector: { kind: 'brushedMetal', reflectance: rho, depolarizedFraction: delta },
							frontSurfaceReflectance: rs
						}
					});
					// Independent route: Mueller matrices of forward and backward passes, a partial
					// depolarizer ρ·diag(1, 1−δ, 1−δ, 1−δ) between them, unpolarised input (1, 0, 0, 0).
					const j = jonesOfProfile(createMatrix(), {
						profile,
						indices: fixtureIndicesAt(wavelength_nm),
						wavelength_nm
					});
					const pf = polarizerJones(createMatrix(), { k1, k2, axis_rad: front_deg * RAD_PER_DEG });
					const pr = polarizerJones(createMatrix(), { k1, k2, axis_rad: rear_deg * RAD_PER_DEG });
					const forward = multiply(createMatrix(), pr, multiply(createMatrix(), j, pf));
					const backward = transpose(createMatrix(), forward);
					const atReflector = muellerTimesVector(muellerOfJones(forward), [1, 0, 0, 0]);
					const reflected = atReflector.map((x, i) => rho * (i === 0 ? x : (1 - delta) * x));
					const out = muellerTimesVector(muellerOfJones(backward), reflected);
					actual.push(s.reflectance[0], s.singlePass[0]);
					expected.push(rs + (1 - rs) ** 2 * out[0], 2 * atReflector[0]);
				}
			),
			{ numRuns: 200 }
		);
		checkAgainstReference({
			label: 'reflectance and single pass',
			source: MUELLER,
			actual,
			expected,
			tolerance: 1e-12,
			unit: 'reflectance / transmittance (0…1)'
		});
	});

	it('unpolarised = incoherent sum over any orthogonal pair (linear x/y, ±45°, circular)', () => {
		const m = Float64Array.of(0.3, 0.1, -0.2, 0.4, 0.5, -0.6, 0.1, 0.2);
		const intensity = (v: number[]) => {
			const ex = [
				m[0] * v[0] - m[1] * v[1] + m[2] * v[2] - m[3] * v[3],
				m[0] * v[1] + m[1] * v[0] + m[2] * v[3] + m[3] * v[2]
			];
			const ey = [
				m[4] * v[0] - m[5] * v[1] + m[6] * v[2] - m[7] * v[3],
				m[4] * v[1] + m[5] * v[0] + m[6] * v[3] + m[7] * v[2]
			];
			return ex[0] ** 2 + ex[1] ** 2 + ey[0] ** 2 + ey[1] ** 2;
		};
		const h = Math.SQRT1_2;
		const pairs = [
			[
				[1, 0, 0, 0],
				[0, 0, 1, 0]
			],
			[
				[h, 0, h, 0],
				[h, 0, -h, 0]
			],
			[
				[h, 0, 0, h],
				[h, 0, 0, -h]
			]
		];
		for (const [a, b] of pairs) {
			expect(0.5 * (intensity(a) + intensity(b))).toBeCloseTo(unpolarizedTransmittance(m), 15);
		}
	});
});
