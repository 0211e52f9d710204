/**
 * Reflective-stack spectra at normal incidence, with everything that does not depend on the
 * director profile precomputed per wavelength; evaluate() allocates nothing in its wavelength
 * loop, and no arrays per call when `out` is supplied and the slab count is unchanged.
 *
 * Model (derived here by Jones calculus, Jones, JOSA 31:488 (1941)): with P_f, P_r the polarizer
 * matrices and J the cell, the forward matrix is A = P_r·J·P_f; the backward one, in lab axes,
 * is Aᵀ (reciprocity.ts). For unpolarised light of unit intensity behind the first surface:
 *   reaching the reflector      I_r   = ½‖A‖²                      (‖·‖ Frobenius)
 *   polarisation-kept return    R_pol = ½‖Aᵀ·A‖²                   (mirror = I)
 *   depolarised return          R_dep = I_r · ½‖Aᵀ‖² = I_r²
 *   stack reflectance           R = R_s + (1 − R_s)²·ρ·[(1 − δ)·R_pol + δ·R_dep]
 *   transmitted to the rear     T_rear = (1 − R_s)·t·I_r  (transflector; by reciprocity also
 *                                        the backlight-mode transmittance for unpolarised light)
 *   single pass                 T_1 = ‖A‖² = 2·I_r — normalised to the polarizer pair: ideal
 *                                        parallel polarizers and no cell give 1; the physical
 *                                        unpolarised transmittance is T_1/2.
 * Multiple reflections between the first surface and the stack are neglected.
 */

import { createMatrix, frobeniusNormSquared, multiply, transpose } from './complex2x2';
import type { DirectorProfile } from './director-profile';
import { FRONT_SURFACE_REFLECTANCE_DEFAULT } from './fresnel';
import { sampleIndices, type IndicesSource } from './indices';
import { polarizerJones } from './polarizer';
import { samplePolarizer } from './polarizer-models';
import { jonesOfSlicedProfile, type SlabModel, type SlicedJonesInput } from './profile-jones';
import { sampleReflector } from './reflector';
import { RAD_PER_DEG } from './si';
import { createSlicedProfile, sliceDirectorProfile } from './sliced-profile';
import type { PolarizerPlacement, ReflectiveStackSpec } from './stack-spec';

export interface StackEvaluatorOptions {
	/** Wavelength grid, nm, each > 0. */
	wavelengths_nm: Float64Array;
	/** LC indices: callback λ ↦ {ne, no}, or arrays over the grid. */
	indicesAt: IndicesSource;
	stack: ReflectiveStackSpec;
	/** Default 'twisted' (exact for uniform twist); 'retarder' = midpoint retarder slabs. */
	slabModel?: SlabModel;
	/** Slabs per node interval, default 1. */
	subslices?: number;
}

export interface StackSpectra {
	/** Reflectance factor of the whole stack, 0…1, including R_s. */
	reflectance: Float64Array;
	/** ‖P_r·J·P_f‖² (ideal parallel pair without cell = 1; unpolarised value = half of it). */
	singlePass: Float64Array;
	/** Share of incident light leaving through a transflector (0 for opaque reflectors). */
	transmittedToRear: Float64Array;
}

export interface StackEvaluator {
	readonly wavelengths_nm: Float64Array;
	evaluate(profile: DirectorProfile, out?: StackSpectra): StackSpectra;
}

function polarizerMatrices(
	placement: PolarizerPlacement,
	wavelengths_nm: Float64Array
): Float64Array[] {
	const { k1, k2 } = samplePolarizer(placement.polarizer, wavelengths_nm);
	const axis_rad = placement.axis_deg * RAD_PER_DEG;
	return Array.from(wavelengths_nm, (_, i) =>
		polarizerJones(createMatrix(), { k1: k1[i], k2: k2[i], axis_rad })
	);
}

export function createStackSpectra(length: number): StackSpectra {
	return {
		reflectance: new Float64Array(length),
		singlePass: new Float64Array(length),
		transmittedToRear: new Float64Array(length)
	};
}

export function createStackEvaluator(options: StackEvaluatorOptions): StackEvaluator {
	const wavelengths_nm = Float64Array.from(options.wavelengths_nm);
	for (const w of wavelengths_nm) {
		if (!(w > 0 && Number.isFinite(w)))
			throw new RangeError(`wavelengths must be finite and > 0, got ${w}`);
	}
	const { stack } = options;
	const indices = sampleIndices(options.indicesAt, wavelengths_nm);
	const front = polarizerMatrices(stack.front, wavelengths_nm);
	const rear = polarizerMatrices(stack.rear, wavelengths_nm);
	const reflector = sampleReflector(stack.reflector, wavelengths_nm);
	const rs = stack.frontSurfaceReflectance ?? FRONT_SURFACE_REFLECTANCE_DEFAULT;
	if (!(rs >= 0 && rs < 1))
		throw new RangeError(`frontSurfaceReflectance must lie in [0, 1), got ${rs}`);
	const delta = reflector.depolarizedFraction;
	const inner = (1 - rs) * (1 - rs);
	const subslices = options.subslices ?? 1;
	const j = createMatrix(),
		a = createMatrix(),
		back = createMatrix(),
		round = createMatrix();
	const input: SlicedJonesInput = {
		sliced: createSlicedProfile(0),
		ne: 0,
		no: 0,
		wavelength_nm: 0,
		slabModel: options.slabModel ?? 'twisted'
	};

	function evaluate(
		profile: DirectorProfile,
		out = createStackSpectra(wavelengths_nm.length)
	): StackSpectra {
		input.sliced = sliceDirectorProfile(profile, { subslices, reuse: input.sliced });
		for (let i = 0; i < wavelengths_nm.length; i++) {
			input.ne = indices.ne[i];
			input.no = indices.no[i];
			input.wavelength_nm = wavelengths_nm[i];
			jonesOfSlicedProfile(j, input);
			multiply(a, j, front[i]);
			multiply(a, rear[i], a);
			const forward = frobeniusNormSquared(a);
			transpose(back, a);
			multiply(round, back, a);
			const toReflector = 0.5 * forward;
			const kept = 0.5 * frobeniusNormSquared(round);
			const returned = (1 - delta) * kept + delta * toReflector * toReflector;
			out.reflectance[i] = rs + inner * reflector.reflectance[i] * returned;
			out.singlePass[i] = forward;
			out.transmittedToRear[i] = (1 - rs) * reflector.transmittance[i] * toReflector;
		}
		return out;
	}
	return { wavelengths_nm, evaluate };
}
