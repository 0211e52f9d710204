/* Pins the public surface of the colour core: a change here is an API change. */
import { describe, expect, it } from 'vitest';
import * as color from '../../src/lib/core/color/index';

describe('color public API', () => {
	it('exports exactly these names', () => {
		expect(Object.keys(color).sort()).toEqual([
			'BRADFORD',
			'C2_CURRENT_mK',
			'C2_ILLUMINANT_A_mK',
			'C2_IPTS48_mK',
			'DAYLIGHT_CCT_MAX_K',
			'DAYLIGHT_CCT_MIN_K',
			'DEFAULT_OBSERVER',
			'FIXED_ILLUMINANT_NAMES',
			'ILLUMINANT_A_GRID',
			'OBSERVER_NAMES',
			'SRGB_WHITE',
			'VISIBLE_5NM_GRID',
			'adaptXyzBradford',
			'bradfordAdaptationMatrix',
			'colorMatchingFunctions',
			'computeTristimulusWeights',
			'daylightBasisWeights',
			'daylightByNominalCct',
			'daylightCctFromNominal_K',
			'daylightChromaticity',
			'daylightIlluminant',
			'deltaE2000',
			'deltaE2000ByCulori',
			'deltaE2000WithFactors',
			'gridOfSpectrum',
			'gridWavelengths_nm',
			'illuminantA',
			'illuminantARelativePower',
			'illuminantByName',
			'illuminantWhitePoint',
			'labToXyz',
			'lambertianLuminance_cdm2',
			'reflectanceToColor',
			'reflectanceToXyz',
			'resampleSpectrum',
			'rescaleTemperature_K',
			'spectrumFromFunction',
			'spectrumFromTable',
			'spectrumToXyz',
			'spectrumValueAt',
			'tristimulusWeights',
			'wavelengthAt_nm',
			'wavelengthGrid',
			'xyToXyz',
			'xyzToLab',
			'xyzToSrgbPreview',
			'xyzToUvPrime',
			'xyzToXy'
		]);
	});

	it('reflectanceToColor returns the documented fields', () => {
		const c = color.reflectanceToColor({
			reflectance: new Float64Array(81).fill(0.5),
			grid: color.VISIBLE_5NM_GRID,
			illuminant: 'D65'
		});
		expect(Object.keys(c).sort()).toEqual(
			['L', 'X', 'Y', 'Z', 'a', 'b', 'srgbHex', 'srgbInGamut', 'x', 'y'].sort()
		);
	});
});
