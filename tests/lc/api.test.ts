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

	it('uses the CODATA 2018 constants', () => {
		// CODATA 2018 recommended values (Tiesinga et al., Rev. Mod. Phys. 93:025010 (2021)):
		// ε0 = 8.8541878128(13)e-12 F/m; k_B = 1.380649e-23 J/K exactly; e = 1.602176634e-19 C
		// exactly, so k_B/e = 8.617333262…e-5 eV/K.
		expect(lc.VACUUM_PERMITTIVITY_F_PER_M).toBe(8.8541878128e-12);
		expect(lc.BOLTZMANN_J_PER_K).toBe(1.380649e-23);
		expect(lc.ELEMENTARY_CHARGE_C).toBe(1.602176634e-19);
		expect(lc.BOLTZMANN_EV_PER_K).toBeCloseTo(8.617333262e-5, 14);
	});
});
