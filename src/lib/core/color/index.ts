/*
 * Public API of the colour core: spectra, CIE illuminants and observers, tristimulus values,
 * chromaticity, CIELAB, CIEDE2000, chromatic adaptation, sRGB preview, Lambertian luminance.
 * See README.md for the data flow.
 */
export { adaptXyzBradford, bradfordAdaptationMatrix, BRADFORD } from './chromatic-adaptation';
export { xyToXyz, xyzToUvPrime, xyzToXy } from './chromaticity';
export { labToXyz, xyzToLab } from './cielab';
export {
	deltaE2000ByCulori,
	SRGB_WHITE,
	xyzToSrgbPreview,
	type SrgbPreview
} from './culori-bridge';
export {
	daylightBasisWeights,
	daylightByNominalCct,
	daylightCctFromNominal_K,
	daylightChromaticity,
	daylightIlluminant,
	DAYLIGHT_CCT_MAX_K,
	DAYLIGHT_CCT_MIN_K
} from './daylight-illuminant';
export { deltaE2000, deltaE2000WithFactors, type ParametricFactors } from './delta-e-2000';
export { illuminantA, illuminantARelativePower, ILLUMINANT_A_GRID } from './illuminant-a';
export { FIXED_ILLUMINANT_NAMES, illuminantByName } from './illuminant-by-name';
export { lambertianLuminance_cdm2 } from './lambertian-luminance';
export {
	colorMatchingFunctions,
	DEFAULT_OBSERVER,
	OBSERVER_NAMES,
	type ColorMatchingFunctions,
	type ObserverName
} from './observers';
export {
	C2_CURRENT_mK,
	C2_ILLUMINANT_A_mK,
	C2_IPTS48_mK,
	rescaleTemperature_K
} from './radiation-constants';
export {
	reflectanceToColor,
	type ReflectanceColor,
	type ReflectanceColorRequest
} from './reflectance-to-color';
export {
	gridOfSpectrum,
	gridWavelengths_nm,
	resampleSpectrum,
	spectrumFromFunction,
	spectrumFromTable,
	spectrumValueAt,
	VISIBLE_5NM_GRID,
	wavelengthAt_nm,
	wavelengthGrid,
	type OutsideRange,
	type Spectrum,
	type WavelengthGrid
} from './spectrum';
export { illuminantWhitePoint, reflectanceToXyz, spectrumToXyz } from './spectrum-to-xyz';
export {
	computeTristimulusWeights,
	tristimulusWeights,
	type TristimulusWeights
} from './tristimulus-weights';
export type { Chromaticity, ChromaticityUv, Illuminant, Lab, Xyz } from './types';
