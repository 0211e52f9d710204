/**
 * Public surface of the liquid-crystal core: materials, temperature model, director statics,
 * thresholds and response times. See README.md for the data flow.
 */
export * from './constants';
export type {
	CauchyFit,
	IsotropicState,
	LcMaterial,
	MaterialState,
	NematicState,
	ViscosityLaw
} from './material';
export { dielectricAnisotropy, requireNematic } from './material';
export { cauchyIndex } from './dispersion';
export { assertValidMaterial, validateMaterial, type MaterialIssue } from './validate';
export {
	arrheniusFactor,
	hallerOrder,
	indicesAt,
	materialAt,
	orderRatio,
	type IndexPair
} from './temperature';
export * from './presets';
export {
	assertValidGeometry,
	cellAt,
	validateGeometry,
	type CellGeometry,
	type DirectorCell
} from './cell';
export type { DirectorConvergence, DirectorProfile, DirectorSolution } from './profile';
export {
	DEFAULT_SLICES,
	continuationLadder,
	energyOfProfile,
	initialProfile,
	solveDirector,
	type DirectorSettings
} from './director';
export { sweepVoltage } from './sweep';
export {
	splayThreshold_V,
	thresholdFromConstants,
	twistedThreshold_V,
	twistElasticConstant_N,
	type TwistSpec
} from './threshold';
export {
	DEFAULT_SWITCHING_LIMIT_S,
	jakemanRaynesTimes,
	responseTimes,
	responseVsTemperature,
	type ResponseAtTemperature,
	type ResponseTimes
} from './response';
