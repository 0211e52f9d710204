/**
 * The cell's 10 % and 90 % switching voltages at a temperature. The design stores them at a
 * reference temperature with a linear coefficient (mV/K), which is how glass makers quote fluid
 * data; the cell model can instead supply computed values at each temperature.
 */
import type { Thresholds } from '../design/schema';

export interface ThresholdPoint {
	temperature_C: number;
	v10_V: number;
	v90_V: number;
}

export function thresholdsAt(thresholds: Thresholds, temperature_C: number): ThresholdPoint {
	const shift_V = (thresholds.tempCoeff_mV_per_K / 1000) * (temperature_C - thresholds.reference_C);
	return {
		temperature_C,
		v10_V: Math.max(thresholds.v10_V + shift_V, 0),
		v90_V: Math.max(thresholds.v90_V + shift_V, 0)
	};
}

/** Thresholds at the ends of the range and at the reference temperature if it lies inside. */
export function thresholdsOverRange(
	thresholds: Thresholds,
	range: { min_C: number; max_C: number }
): ThresholdPoint[] {
	const temperatures = [range.min_C];
	if (thresholds.reference_C > range.min_C && thresholds.reference_C < range.max_C) {
		temperatures.push(thresholds.reference_C);
	}
	if (range.max_C > range.min_C) temperatures.push(range.max_C);
	return temperatures.map((t) => thresholdsAt(thresholds, t));
}
