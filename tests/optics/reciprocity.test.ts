import { describe, expect, it } from 'vitest';
import {
	applyToVector,
	createMatrix,
	createVector,
	multiply,
	rotation,
	transpose
} from '../../src/lib/core/optics/complex2x2';
import {
	uniformTwistProfile,
	type DirectorProfile
} from '../../src/lib/core/optics/director-profile';
import { polarizerJones } from '../../src/lib/core/optics/polarizer';
import { jonesOfProfile, type SlabModel } from '../../src/lib/core/optics/profile-jones';
import { backwardJones, toMirroredFrame } from '../../src/lib/core/optics/reciprocity';
import { fixtureOnProfile } from './fixtures';
import { checkAgainstReference } from './reference-check';

const INDICES = { ne: 1.62, no: 1.5 };
const WAVELENGTH_nm = 520;
const RECIPROCITY = 'Lorentz reciprocity for Jones matrices (Potton 2004, from memory)';

function reversed(profile: DirectorProfile, azimuthSign: 1 | -1): DirectorProfile {
	return {
		gap_m: profile.gap_m,
		tilt_rad: profile.tilt_rad.slice().reverse(),
		twist_rad: profile.twist_rad.map((t) => azimuthSign * t).reverse()
	};
}

/** Lab-axes matrix of a profile whose computed matrix counts azimuths from its own entry node. */
function labMatrix(profile: DirectorProfile, slabModel: SlabModel): Float64Array {
	const relative = jonesOfProfile(createMatrix(), {
		profile,
		indices: INDICES,
		wavelength_nm: WAVELENGTH_nm,
		slabModel
	});
	const entry = profile.twist_rad[0];
	// relative = R(entry)·lab·R(−entry) ⇒ lab = R(−entry)·relative·R(entry)
	const out = multiply(createMatrix(), rotation(createMatrix(), -entry), relative);
	return multiply(out, out, rotation(createMatrix(), entry));
}

describe('backward pass (reciprocity)', () => {
	const profile = fixtureOnProfile(201);

	it('lab axes: the transpose equals the same slabs traversed in reverse order', () => {
		for (const slabModel of ['retarder', 'twisted'] as const) {
			const forward = labMatrix(profile, slabModel);
			const back = backwardJones(createMatrix(), forward);
			const explicit = labMatrix(reversed(profile, 1), slabModel);
			checkAgainstReference({
				label: `Jᵀ vs reversed slabs, '${slabModel}'`,
				source: RECIPROCITY,
				actual: explicit,
				expected: back,
				tolerance: 1e-12,
				unit: 'amplitude'
			});
		}
	});

	it('mirrored frame (x, −y, −z): J′ = F·Jᵀ·F equals the reversed medium with negated azimuths', () => {
		const forward = labMatrix(profile, 'retarder');
		const expected = toMirroredFrame(createMatrix(), transpose(createMatrix(), forward));
		const explicit = labMatrix(reversed(profile, -1), 'retarder');
		checkAgainstReference({
			label: 'F·Jᵀ·F vs mirrored medium',
			source: RECIPROCITY,
			actual: explicit,
			expected,
			tolerance: 1e-12,
			unit: 'amplitude'
		});
	});

	it('polarizers are their own transpose (the backward pass meets the same polarizer)', () => {
		const p = polarizerJones(createMatrix(), { k1: 0.86, k2: 0.001, axis_rad: 0.7 });
		expect(Array.from(transpose(createMatrix(), p))).toEqual(Array.from(p));
	});

	it('a guiding TN retraces its rotation: x̂ → exit director → x̂ (exact at Gooch–Tarry minima)', () => {
		const actual: number[] = [];
		for (const u of [Math.sqrt(3), Math.sqrt(15), Math.sqrt(35)]) {
			const gap_m = (u * WAVELENGTH_nm * 1e-9) / (2 * (INDICES.ne - INDICES.no));
			const j = jonesOfProfile(createMatrix(), {
				profile: uniformTwistProfile({ gap_m, twist_rad: Math.PI / 2, nodes: 31 }),
				indices: INDICES,
				wavelength_nm: WAVELENGTH_nm
			});
			const mid = applyToVector(createVector(), j, Float64Array.of(1, 0, 0, 0));
			const back = applyToVector(createVector(), backwardJones(createMatrix(), j), mid);
			actual.push(mid[2] ** 2 + mid[3] ** 2, back[0] ** 2 + back[1] ** 2);
		}
		checkAgainstReference({
			label: 'forward along y, back along x',
			source: `${RECIPROCITY}; Gooch & Tarry minima`,
			actual,
			expected: actual.map(() => 1),
			tolerance: 1e-12,
			unit: 'intensity'
		});
	});

	it('in the Mauguin regime (u = 30, off-minimum) the retrace is approximate, within 4/(1+u²)', () => {
		const u = 30.3;
		const gap_m = (u * WAVELENGTH_nm * 1e-9) / (2 * (INDICES.ne - INDICES.no));
		const j = jonesOfProfile(createMatrix(), {
			profile: uniformTwistProfile({ gap_m, twist_rad: Math.PI / 2, nodes: 2 }),
			indices: INDICES,
			wavelength_nm: WAVELENGTH_nm
		});
		const round = multiply(createMatrix(), backwardJones(createMatrix(), j), j);
		const e = applyToVector(createVector(), round, Float64Array.of(1, 0, 0, 0));
		const stray = e[2] ** 2 + e[3] ** 2;
		console.log(
			`[Mauguin 1911, guiding limit] stray intensity after the round trip: ${stray.toExponential(2)} (bound ${(4 / (1 + u * u)).toExponential(2)})`
		);
		expect(stray).toBeLessThanOrEqual(4 / (1 + u * u));
	});
});
