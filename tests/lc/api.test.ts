import { describe, expect, it } from 'vitest';
import * as lc from '../../src/lib/core/lc/index';

describe('lc public API', () => {
	it('exports exactly the documented names', () => {
		expect(Object.keys(lc).sort()).toEqual(
			[
				'BOLTZMANN_EV_PER_K',
				'BOLTZMANN_J_PER_K',
				'CELSIUS_ZERO_K',
				'CYANOBIPHENYL_EUTECTIC_HIGH_DN',
				'CYANOBIPHENYL_SINGLE',
				'CYCLOHEXYL_LOW_DN',
				'DEFAULT_SLICES',
				'DEFAULT_SWITCHING_LIMIT_S',
				'ELEMENTARY_CHARGE_C',
				'GENERIC_REFLECTIVE_TN',
				'LC_PRESETS',
				'M_PER_UM',
				'N_PER_PN',
				'RAD_PER_DEG',
				'UM_PER_NM',
				'VACUUM_PERMITTIVITY_F_PER_M',
				'arrheniusFactor',
				'assertValidGeometry',
				'assertValidMaterial',
				'cauchyIndex',
				'cellAt',
				'celsiusToKelvin',
				'continuationLadder',
				'dielectricAnisotropy',
				'energyOfProfile',
				'hallerOrder',
				'indicesAt',
				'initialProfile',
				'jakemanRaynesTimes',
				'materialAt',
				'orderRatio',
				'presetById',
				'requireNematic',
				'responseTimes',
				'responseVsTemperature',
				'solveDirector',
				'splayThreshold_V',
				'sweepVoltage',
				'thresholdFromConstants',
				'twistElasticConstant_N',
				'twistedThreshold_V',
				'validateGeometry',
				'validateMaterial'
			].sort()
		);
	});

	it('derives constants from their definitions', () => {
		expect(lc.VACUUM_PERMITTIVITY_F_PER_M).toBe(8.8541878128e-12);
		expect(lc.BOLTZMANN_EV_PER_K).toBeCloseTo(8.617333262e-5, 14);
	});
});
