/**
 * Director response times of a twisted-nematic cell, and their temperature dependence.
 *
 * Model [Jakeman & Raynes, Phys. Lett. A 39:69 (1972)], small-signal director relaxation without
 * backflow:
 *   τ_off = γ1·d²/(K·π²),  τ_on = γ1·d²/(ε0Δε·V² − K·π²) = τ_off/((V/V_th)² − 1),
 * with K the twist-weighted elastic constant of threshold.ts (K11 + (K33 − 2K22)/4 at 90°, no
 * dopant), so V_th = π·sqrt(K/(ε0Δε)) is consistent. These are director time constants; optical
 * 10-90 % times are similar plus a delay. Temperature enters through the scaled material
 * (temperature.ts): γ1 rises steeply in the cold, so cold turn-off limits reflective segments.
 * At or below threshold the cell does not turn on: tauOn_s is null, never NaN or Infinity.
 */
import { cellAt, type CellGeometry, type DirectorCell } from './cell';
import { M_PER_UM, VACUUM_PERMITTIVITY_F_PER_M } from './constants';
import { dielectricAnisotropy, type LcMaterial } from './material';
import { materialAt } from './temperature';
import { thresholdFromConstants, twistElasticConstant_N } from './threshold';

export interface ResponseTimes {
	/** Relaxation time after the field is removed, s. */
	tauOff_s: number;
	/** Switch-on time at the drive voltage, s; null when the voltage is at or below threshold. */
	tauOn_s: number | null;
	/** Threshold of this cell, V RMS. */
	vth_V: number;
}

/** Jakeman-Raynes times from SI constants (the kernel; all inputs explicit). */
export function jakemanRaynesTimes(options: {
	gamma1_Pas: number;
	gap_m: number;
	elastic_N: number;
	deltaEps: number;
	voltage_V: number;
}): ResponseTimes {
	const { gamma1_Pas, gap_m, elastic_N, deltaEps, voltage_V } = options;
	const viscousGap = gamma1_Pas * gap_m * gap_m;
	const restoring = elastic_N * Math.PI * Math.PI;
	const driving = VACUUM_PERMITTIVITY_F_PER_M * deltaEps * voltage_V * voltage_V - restoring;
	return {
		tauOff_s: viscousGap / restoring,
		tauOn_s: driving > 0 ? viscousGap / driving : null,
		vth_V: thresholdFromConstants({ elastic_N, deltaEps })
	};
}

/** Response times of a resolved cell at an RMS drive voltage. */
export function responseTimes(options: { cell: DirectorCell; voltage_V: number }): ResponseTimes {
	const { cell, voltage_V } = options;
	const elastic_N = twistElasticConstant_N(cell);
	if (!(elastic_N > 0)) {
		throw new Error(
			'the untilted twisted state is unstable at 0 V (K_eff ≤ 0): no relaxation time'
		);
	}
	return jakemanRaynesTimes({
		gamma1_Pas: cell.material.gamma1_Pas,
		gap_m: cell.gap_um * M_PER_UM,
		elastic_N,
		deltaEps: dielectricAnisotropy(cell.material),
		voltage_V
	});
}

export interface ResponseAtTemperature {
	temperature_C: number;
	phase: 'nematic' | 'isotropic';
	/** null above the clearing point. */
	times: ResponseTimes | null;
	/** True when τ_on or τ_off exceeds the limit, or the drive no longer switches the cell. */
	tooSlow: boolean;
}

/** Default designer limit on cold switching, s. */
export const DEFAULT_SWITCHING_LIMIT_S = 1;

/**
 * τ_on, τ_off at each temperature for a fixed drive, flagging temperatures where switching is
 * slower than the limit (default 1 s) or does not happen (drive at or below the cold threshold).
 */
export function responseVsTemperature(options: {
	material: LcMaterial;
	geometry: CellGeometry;
	voltage_V: number;
	temperatures_C: readonly number[];
	limit_s?: number;
}): { rows: ResponseAtTemperature[]; limit_s: number; tooSlowAt_C: number[] } {
	const limit_s = options.limit_s ?? DEFAULT_SWITCHING_LIMIT_S;
	if (!(limit_s > 0)) throw new Error(`limit_s must be positive (got ${limit_s})`);
	const rows = options.temperatures_C.map((temperature_C): ResponseAtTemperature => {
		const state = materialAt({ material: options.material, temperature_C });
		if (state.phase !== 'nematic')
			return { temperature_C, phase: 'isotropic', times: null, tooSlow: false };
		const cell = cellAt({ geometry: options.geometry, material: options.material, temperature_C });
		const times = responseTimes({ cell, voltage_V: options.voltage_V });
		const tooSlow = times.tauOn_s === null || times.tauOn_s > limit_s || times.tauOff_s > limit_s;
		return { temperature_C, phase: 'nematic', times, tooSlow };
	});
	return {
		rows,
		limit_s,
		tooSlowAt_C: rows.filter((row) => row.tooSlow).map((row) => row.temperature_C)
	};
}
