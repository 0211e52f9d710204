import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createMatrix, multiply } from '../../src/lib/core/optics/complex2x2';
import { uniformTwistProfile } from '../../src/lib/core/optics/director-profile';
import {
	crossedPairTransmittance,
	parallelPairTransmittance,
	polarizerJones,
	polarizingEfficiency,
	singlePolarizerTransmittance
} from '../../src/lib/core/optics/polarizer';
import {
	IDEAL_POLARIZER,
	NEUTRAL_GREY_POLARIZER,
	samplePolarizer
} from '../../src/lib/core/optics/polarizer-models';
import { singlePassTransmittance } from '../../src/lib/core/optics/reflective-stack';
import { unpolarizedTransmittance } from '../../src/lib/core/optics/unpolarized';
import { fixtureIndicesAt, visibleGrid_nm } from './fixtures';
import { checkAgainstReference } from './reference-check';

const NO_CELL = uniformTwistProfile({ gap_m: 0, twist_rad: 0, nodes: 2 });
const ALGEBRA = 'standard polarizer algebra (Jones calculus, Jones, JOSA 31:488 (1941))';

function idealPair(rearAxis_deg: number): Float64Array {
	return singlePassTransmittance({
		profile: NO_CELL,
		indicesAt: fixtureIndicesAt,
		wavelengths_nm: visibleGrid_nm(),
		stack: {
			front: { polarizer: IDEAL_POLARIZER, axis_deg: 0 },
			rear: { polarizer: IDEAL_POLARIZER, axis_deg: rearAxis_deg }
		}
	});
}

describe('polarizers', () => {
	it('ideal crossed polarizers without a cell transmit nothing', () => {
		const actual = idealPair(90);
		checkAgainstReference({
			label: 'crossed ideal pair',
			source: ALGEBRA,
			actual,
			expected: new Float64Array(actual.length),
			tolerance: 1e-15,
			unit: 'transmittance'
		});
	});

	it('ideal parallel polarizers without a cell give 1 (single-pass normalisation)', () => {
		const actual = idealPair(0);
		checkAgainstReference({
			label: 'parallel ideal pair',
			source: "Malus's law at 0° (an ideal parallel pair passes all of the polarised light)",
			actual,
			expected: new Float64Array(actual.length).fill(1),
			tolerance: 1e-15,
			unit: 'transmittance'
		});
	});

	it("an ideal pair at angle α follows Malus's law cos²α", () => {
		const angles_deg = [0, 15, 30, 45, 60, 75, 90, 135, -20];
		const actual = angles_deg.map((a) => idealPair(a)[40]);
		const expected = angles_deg.map((a) => Math.cos((a * Math.PI) / 180) ** 2);
		checkAgainstReference({
			label: 'Malus',
			source: "Malus's law",
			actual,
			expected,
			tolerance: 1e-15,
			unit: 'transmittance'
		});
	});

	it('unpolarised light through one ideal polarizer: 1/2, at any axis', () => {
		const m = createMatrix();
		const axes = Array.from({ length: 37 }, (_, i) => (i * Math.PI) / 36);
		const actual = axes.map((axis_rad) =>
			unpolarizedTransmittance(polarizerJones(m, { k1: 1, k2: 0, axis_rad }))
		);
		checkAgainstReference({
			label: 'single ideal polarizer',
			source: ALGEBRA,
			actual,
			expected: axes.map(() => 0.5),
			tolerance: 1e-15,
			unit: 'transmittance'
		});
	});

	it('Jones matrices reproduce T_s, T_p, T_c for random k1, k2 and axes', () => {
		// Uniform draws: fc.double concentrates on extreme values (denormals, 0, ±π), which leaves
		// the off-diagonal terms of a partial polarizer at an oblique axis untested.
		const k = fc.integer({ min: 0, max: 1_000_000 }).map((i) => i / 1_000_000);
		const axis = fc.integer({ min: -180_000, max: 180_000 }).map((i) => (i / 180_000) * Math.PI);
		const a = createMatrix(),
			b = createMatrix(),
			ab = createMatrix();
		fc.assert(
			fc.property(k, k, axis, (k1, k2, axis_rad) => {
				const pair = { k1, k2 };
				polarizerJones(a, { ...pair, axis_rad });
				expect(unpolarizedTransmittance(a)).toBeCloseTo(singlePolarizerTransmittance(pair), 14);
				polarizerJones(b, { ...pair, axis_rad });
				expect(unpolarizedTransmittance(multiply(ab, b, a))).toBeCloseTo(
					parallelPairTransmittance(pair),
					14
				);
				polarizerJones(b, { ...pair, axis_rad: axis_rad + Math.PI / 2 });
				expect(unpolarizedTransmittance(multiply(ab, b, a))).toBeCloseTo(
					crossedPairTransmittance(pair),
					14
				);
			})
		);
	});

	it("a partial pair at angle θ follows Malus's law for partial polarizers", () => {
		// Two identical polarizers of principal transmittances k1, k2 with axes θ apart pass
		// unpolarised light as T(θ) = T_p·cos²θ + T_c·sin²θ, T_p = (k1² + k2²)/2, T_c = k1·k2
		// (Malus's law applied to each principal component; e.g. Bennett, "Polarizers", Handbook
		// of Optics vol. II, 2nd ed. (1995) — from memory).
		const pair = { k1: 0.81, k2: 0.09 };
		const tp = (0.81 ** 2 + 0.09 ** 2) / 2;
		const tc = 0.81 * 0.09;
		const a = createMatrix(),
			b = createMatrix(),
			ab = createMatrix();
		const angles_deg = [0, 10, 25, 40, 45, 60, 80, 90, 120];
		const actual = angles_deg.map((deg) => {
			polarizerJones(a, { ...pair, axis_rad: 0.3 });
			polarizerJones(b, { ...pair, axis_rad: 0.3 + (deg * Math.PI) / 180 });
			return unpolarizedTransmittance(multiply(ab, b, a));
		});
		const expected = angles_deg.map((deg) => {
			const c2 = Math.cos((deg * Math.PI) / 180) ** 2;
			return tp * c2 + tc * (1 - c2);
		});
		checkAgainstReference({
			label: 'partial pair vs angle',
			source: "Malus's law for partial polarizers",
			actual,
			expected,
			tolerance: 1e-14,
			unit: 'transmittance'
		});
	});

	it('k1 = 0.86, k2 = 0.0005 give T_s 0.430, T_p 0.370, T_c 4.3e-4 (hand computation)', () => {
		const pair = { k1: 0.86, k2: 0.0005 };
		const a = polarizerJones(createMatrix(), { ...pair, axis_rad: 0 });
		const p = polarizerJones(createMatrix(), { ...pair, axis_rad: 0 });
		const c = polarizerJones(createMatrix(), { ...pair, axis_rad: Math.PI / 2 });
		const actual = [
			unpolarizedTransmittance(a),
			unpolarizedTransmittance(multiply(createMatrix(), p, a)),
			unpolarizedTransmittance(multiply(createMatrix(), c, a))
		];
		// tolerance: half a unit of the last kept digit (5e-4 for 0.430/0.370, 5e-6 for 4.3e-4)
		checkAgainstReference({
			label: 'T_s, T_p',
			source: 'hand computation: T_s = (k1 + k2)/2, T_p = (k1² + k2²)/2 (Jones calculus)',
			actual: actual.slice(0, 2),
			expected: [0.43, 0.37],
			tolerance: 5e-4,
			unit: 'transmittance'
		});
		checkAgainstReference({
			label: 'T_c',
			source: 'hand computation: T_c = k1·k2 (Jones calculus)',
			actual: actual.slice(2),
			expected: [4.3e-4],
			tolerance: 5e-6,
			unit: 'transmittance'
		});
	});

	it('neutral-grey iodine-PVA-like default: T_s 42–44 % over 400–700 nm, PE ≥ 99.9 % over 380–780 nm', () => {
		const grid = visibleGrid_nm();
		const { k1, k2 } = samplePolarizer(NEUTRAL_GREY_POLARIZER, grid);
		let minTs = 1,
			maxTs = 0,
			minPe = 1;
		grid.forEach((w, i) => {
			const pair = { k1: k1[i], k2: k2[i] };
			if (w >= 400 && w <= 700) {
				minTs = Math.min(minTs, singlePolarizerTransmittance(pair));
				maxTs = Math.max(maxTs, singlePolarizerTransmittance(pair));
			}
			minPe = Math.min(minPe, polarizingEfficiency(pair));
		});
		console.log(
			`[typical values, common practice] T_s ∈ [${minTs.toFixed(4)}, ${maxTs.toFixed(4)}], min PE ${minPe.toFixed(5)}`
		);
		expect(minTs).toBeGreaterThanOrEqual(0.42);
		expect(maxTs).toBeLessThanOrEqual(0.44);
		expect(minPe).toBeGreaterThanOrEqual(0.999);
	});

	it('principal spec: tabulated k1, k2 interpolate linearly and clamp; out-of-range values throw', () => {
		const table = { wavelengths_nm: Float64Array.of(400, 600), values: Float64Array.of(0.8, 0.9) };
		const { k1, k2 } = samplePolarizer(
			{ kind: 'principal', k1: table, k2: 0.001 },
			Float64Array.of(300, 500, 700)
		);
		expect(Array.from(k1)).toEqual([0.8, expect.closeTo(0.85, 14), 0.9]);
		expect(Array.from(k2)).toEqual([0.001, 0.001, 0.001]);
		expect(() =>
			samplePolarizer({ kind: 'principal', k1: 1.2, k2: 0 }, Float64Array.of(500))
		).toThrow(RangeError);
		expect(Array.from(samplePolarizer(IDEAL_POLARIZER, Float64Array.of(500)).k1)).toEqual([1]);
	});
});
