import { describe, expect, it } from 'vitest';
import { createMatrix, applyToVector, createVector } from '../../src/lib/core/optics/complex2x2';
import { jonesOfTwistedLayer, retardationOf } from '../../src/lib/core/optics/twisted-layer';
import { goochTarryLeak } from './fixtures';
import { checkAgainstReference } from './reference-check';

const QUARTER_TURN_rad = Math.PI / 2;
const GOOCH_TARRY = 'Gooch & Tarry, J. Phys. D 8:1575 (1975)';

/** Γ for a 90° layer at Gooch–Tarry parameter u: u = Γ/(2Φ) ⇒ Γ = 2Φu = πu. */
function retardationFor(twist_rad: number, u: number): number {
	return 2 * twist_rad * u;
}

/** |M·x̂|² components for x-polarised input: [along x, along y]. */
function outputIntensities(m: Float64Array): [number, number] {
	const e = applyToVector(createVector(), m, Float64Array.of(1, 0, 0, 0));
	return [e[0] * e[0] + e[1] * e[1], e[2] * e[2] + e[3] * e[3]];
}

const manyU = Float64Array.from({ length: 2001 }, (_, i) => i * 0.005); // u = 0 … 10

describe('closed-form twisted layer (90° TN, ideal polarizers)', () => {
	it('parallel polarizers reproduce the Gooch–Tarry leak T_NB for u = 0…10', () => {
		const m = createMatrix();
		const actual = manyU.map(
			(u) =>
				outputIntensities(
					jonesOfTwistedLayer(m, {
						twist_rad: QUARTER_TURN_rad,
						retardation_rad: retardationFor(QUARTER_TURN_rad, u)
					})
				)[0]
		);
		const expected = manyU.map((u) => goochTarryLeak(QUARTER_TURN_rad, u));
		checkAgainstReference({
			label: 'T_NB closed form',
			source: GOOCH_TARRY,
			actual,
			expected,
			tolerance: 1e-6,
			unit: 'transmittance'
		});
	});

	it('crossed polarizers give T_NW = 1 − T_NB', () => {
		const m = createMatrix();
		const actual = manyU.map(
			(u) =>
				outputIntensities(
					jonesOfTwistedLayer(m, {
						twist_rad: QUARTER_TURN_rad,
						retardation_rad: retardationFor(QUARTER_TURN_rad, u)
					})
				)[1]
		);
		const expected = manyU.map((u) => 1 - goochTarryLeak(QUARTER_TURN_rad, u));
		checkAgainstReference({
			label: 'T_NW closed form',
			source: GOOCH_TARRY,
			actual,
			expected,
			tolerance: 1e-6,
			unit: 'transmittance'
		});
	});

	it('other twists (30°…270°): polarizer ∥ entrance, analyzer ⊥ exit director', () => {
		const m = createMatrix();
		const actual: number[] = [];
		const expected: number[] = [];
		for (const twist_deg of [30, 45, 60, 120, 180, 240, 270]) {
			const twist_rad = (twist_deg * Math.PI) / 180;
			for (const u of [0.1, 0.5, 1, 2, 3.3, 7]) {
				jonesOfTwistedLayer(m, { twist_rad, retardation_rad: retardationFor(twist_rad, u) });
				const e = applyToVector(createVector(), m, Float64Array.of(1, 0, 0, 0));
				// component along (−sin Φ, cos Φ), perpendicular to the exit director
				const re = -Math.sin(twist_rad) * e[0] + Math.cos(twist_rad) * e[2];
				const im = -Math.sin(twist_rad) * e[1] + Math.cos(twist_rad) * e[3];
				actual.push(re * re + im * im);
				expected.push(goochTarryLeak(twist_rad, u));
			}
		}
		checkAgainstReference({
			label: 'leak ⊥ exit director, general twist',
			source: GOOCH_TARRY,
			actual,
			expected,
			tolerance: 1e-6,
			unit: 'transmittance'
		});
	});

	it('matches the T_NB table derived from Gooch & Tarry (1975)', () => {
		const dDnOverLambda = [0.25, 0.5, 0.75, 0.866, 1.0, 1.2, 1.25, 1.5];
		const tableT = [0.77281, 0.31656, 0.0286, 0, 0.02626, 0.09682, 0.10819, 0.09364];
		const m = createMatrix();
		const actual = dDnOverLambda.map((r) => {
			const u = 2 * r;
			return outputIntensities(
				jonesOfTwistedLayer(m, {
					twist_rad: QUARTER_TURN_rad,
					retardation_rad: retardationFor(QUARTER_TURN_rad, u)
				})
			)[0];
		});
		// tolerance 1e-5: the table keeps 5 decimals (half a unit is 5e-6)
		checkAgainstReference({
			label: 'T_NB table',
			source: 'Gooch & Tarry, J. Phys. D 8:1575 (1975): T_NB relation evaluated by hand',
			actual,
			expected: tableT,
			tolerance: 1e-5,
			unit: 'transmittance'
		});
	});

	it('the first minimum of T_NB lies at u = √3 (golden-section search)', () => {
		const m = createMatrix();
		const leak = (u: number) =>
			outputIntensities(
				jonesOfTwistedLayer(m, {
					twist_rad: QUARTER_TURN_rad,
					retardation_rad: retardationFor(QUARTER_TURN_rad, u)
				})
			)[0];
		let lo = 1.2,
			hi = 2.4;
		const g = (Math.sqrt(5) - 1) / 2;
		for (let i = 0; i < 80; i++) {
			const a = hi - g * (hi - lo),
				b = lo + g * (hi - lo);
			if (leak(a) < leak(b)) hi = b;
			else lo = a;
		}
		const found = (lo + hi) / 2;
		checkAgainstReference({
			label: 'first zero of T_NB',
			source: `${GOOCH_TARRY}; u = √3 from sqrt(1+u²) = 2`,
			actual: [found],
			expected: [Math.sqrt(3)],
			tolerance: 1e-6,
			unit: 'u (dimensionless)'
		});
		expect(leak(Math.sqrt(3))).toBeLessThan(1e-28);
	});

	it('pins the twist handedness: guided x̂ leaves along (cos Φ, sin Φ), for Φ of both signs', () => {
		// At Φ·sqrt(1+u²) = 4π the twist frame matrix is exactly I, so M = R(−Φ).
		for (const twist_rad of [Math.PI / 3, -Math.PI / 3, QUARTER_TURN_rad]) {
			const u = Math.sqrt(((4 * Math.PI) / twist_rad) ** 2 - 1);
			const m = jonesOfTwistedLayer(createMatrix(), {
				twist_rad,
				retardation_rad: retardationFor(twist_rad, u)
			});
			const e = applyToVector(createVector(), m, Float64Array.of(1, 0, 0, 0));
			expect(e[0]).toBeCloseTo(Math.cos(twist_rad), 12);
			expect(e[2]).toBeCloseTo(Math.sin(twist_rad), 12);
			expect(Math.abs(e[1]) + Math.abs(e[3])).toBeLessThan(1e-12);
		}
	});
});

describe('retardation of a birefringent layer', () => {
	it('a layer with Δn·d = λ/4 is a quarter-wave plate, Γ = π/2; λ/2 gives π', () => {
		// Γ = 2π·Δn·d/λ, the phase retardation of a wave plate (Hecht, Optics, 5th ed., §8.7).
		const quarter = retardationOf({
			birefringence: 0.1,
			thickness_m: 1.375e-6,
			wavelength_nm: 550
		});
		const half = retardationOf({ birefringence: 0.2, thickness_m: 1.6e-6, wavelength_nm: 640 });
		expect(Math.abs(quarter - Math.PI / 2)).toBeLessThan(1e-12);
		expect(Math.abs(half - Math.PI)).toBeLessThan(1e-12);
	});
});

describe('time convention, seen in intensities', () => {
	it('a quarter-wave layer with its slow axis on x turns rotating light into linear light at +45°', () => {
		// Physics without a convention (Hecht, Optics, 5th ed., §8.7, quarter-wave plates): a field
		// E_x = cos ωt, E_y = sin ωt (turning from x toward y) whose x component is delayed by a
		// quarter period becomes E_x = sin ωt = E_y, linear at +45°. In the layer's documented
		// convention (E = Re{A·e^{+iωt}}) that field is A = (1, −i); the director (x) is the slow
		// axis for Δn > 0. An analyzer at +45° then passes everything and one at −45° nothing; the
		// opposite time convention in the code would swap the two.
		const m = jonesOfTwistedLayer(createMatrix(), { twist_rad: 0, retardation_rad: Math.PI / 2 });
		const out = applyToVector(createVector(), m, Float64Array.of(1, 0, 0, -1));
		const through = (sign: 1 | -1) =>
			((out[0] + sign * out[2]) ** 2 + (out[1] + sign * out[3]) ** 2) / 2 / 2;
		checkAgainstReference({
			label: 'analyzer at +45°, −45°',
			source: 'Hecht, Optics, 5th ed., §8.7 (quarter-wave plate)',
			actual: [through(1), through(-1)],
			expected: [1, 0],
			tolerance: 1e-15,
			unit: 'transmittance'
		});
	});
});
