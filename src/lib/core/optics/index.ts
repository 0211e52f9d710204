/** Public surface of the optics core (see README.md). Kernels live under the `complex2x2` namespace. */

export * as complex2x2 from './complex2x2';
export { uniformTwistProfile, assertDirectorProfile } from './director-profile';
export type { DirectorProfile, UniformTwistOptions } from './director-profile';
export { effectiveExtraordinaryIndex } from './effective-index';
export { fresnelNormalReflectance, FRONT_SURFACE_REFLECTANCE_DEFAULT } from './fresnel';
export { sampleIndices } from './indices';
export type { IndicesAt, IndicesOnGrid, IndicesSource, RefractiveIndices } from './indices';
export {
	crossedPairTransmittance,
	parallelPairTransmittance,
	polarizerJones,
	polarizingEfficiency,
	singlePolarizerTransmittance
} from './polarizer';
export type { PolarizerAtAxis, PrincipalTransmittances } from './polarizer';
export {
	IDEAL_POLARIZER,
	iodinePvaTransmittances,
	NEUTRAL_GREY_POLARIZER,
	samplePolarizer
} from './polarizer-models';
export type { IodinePvaParameters, PolarizerSpec, SampledPolarizer } from './polarizer-models';
export { jonesOfProfile, jonesOfSlicedProfile } from './profile-jones';
export type { ProfileJonesOptions, SlabModel, SlicedJonesInput } from './profile-jones';
export { backwardJones, toMirroredFrame } from './reciprocity';
export { singlePassTransmittance, stackReflectance, stackSpectra } from './reflective-stack';
export type { SinglePassOptions, StackSpectrumOptions } from './reflective-stack';
export {
	BRUSHED_METAL_DEPOLARIZED_FRACTION,
	BRUSHED_METAL_REFLECTANCE,
	DIFFUSE_WHITE_REFLECTANCE,
	sampleReflector,
	TRANSFLECTIVE_REFLECTANCE,
	TRANSFLECTIVE_TRANSMITTANCE
} from './reflector';
export type { ReflectorSpec, SampledReflector } from './reflector';
export { sliceDirectorProfile } from './sliced-profile';
export type { SliceOptions, SlicedProfile } from './sliced-profile';
export { sampleSpectralValue, spectralValueAt } from './spectral-value';
export type { SpectralTable, SpectralValue } from './spectral-value';
export { createStackEvaluator, createStackSpectra } from './stack-evaluator';
export type { StackEvaluator, StackEvaluatorOptions, StackSpectra } from './stack-evaluator';
export { reflectiveStackForMode } from './stack-spec';
export type {
	DisplayMode,
	ModeStackOptions,
	PolarizerPairSpec,
	PolarizerPlacement,
	ReflectiveStackSpec
} from './stack-spec';
export { jonesOfTwistedLayer, retardationOf, twistFrameMatrix } from './twisted-layer';
export type { TwistedLayer } from './twisted-layer';
export { unpolarizedTransmittance } from './unpolarized';
