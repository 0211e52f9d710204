/**
 * One-call entry points for the reflective stack (model and normalisation: stack-evaluator.ts).
 * Each builds an evaluator and runs it once; for repeated profiles on the same grid and stack
 * (on/off states, voltage sweeps) create the evaluator once and call evaluate().
 */

import type { DirectorProfile } from './director-profile';
import {
	createStackEvaluator,
	type StackEvaluatorOptions,
	type StackSpectra
} from './stack-evaluator';
import type { PolarizerPairSpec } from './stack-spec';

export interface StackSpectrumOptions extends StackEvaluatorOptions {
	profile: DirectorProfile;
}

/** Reflectance, single-pass and rear-transmitted spectra in one pass. */
export function stackSpectra(options: StackSpectrumOptions): StackSpectra {
	return createStackEvaluator(options).evaluate(options.profile);
}

/** Reflectance factor of the whole stack per wavelength, 0…1, including R_s. */
export function stackReflectance(options: StackSpectrumOptions): Float64Array {
	return stackSpectra(options).reflectance;
}

export interface SinglePassOptions extends Omit<StackSpectrumOptions, 'stack'> {
	/** Only the polarizers matter; a full ReflectiveStackSpec is accepted too. */
	stack: PolarizerPairSpec;
}

/**
 * ‖P_r·J·P_f‖² per wavelength: the single-pass transmission between the polarizers, normalised
 * to the pair — ideal parallel polarizers without a cell give 1; unpolarised light sees half.
 */
export function singlePassTransmittance(options: SinglePassOptions): Float64Array {
	const stack = {
		...options.stack,
		reflector: { kind: 'diffuseWhite' as const },
		frontSurfaceReflectance: 0
	};
	return stackSpectra({ ...options, stack }).singlePass;
}
