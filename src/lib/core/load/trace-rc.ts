/**
 * ITO trace resistance and the settling of a pixel through it.
 *
 * Model: a trace of length L and width W on a film of sheet resistance R_s has R = R_s·L/W (L/W
 * is the number of squares). With the pixel capacitance C it charges with time constant τ = R·C.
 * The waveform holds each level for a settling window: half a common slot with line inversion
 * (the polarity flips mid-slot), a whole slot with frame inversion. A pixel that has not settled by
 * the end of its window sees less than its RMS design voltage. Limits: τ at most a tenth of the
 * window passes (settled to 1 − e⁻¹⁰), up to a quarter warns (1 − e⁻⁴ ≈ 98 %), beyond fails
 * ["keep RC ≪ the slot time": common practice; the two ratios are this tool's choice].
 */
import type { InversionScheme } from '../drive/waveform';

export const RC_WARN_RATIO = 0.1;
export const RC_FAIL_RATIO = 0.25;

export function traceResistance_ohm(options: {
	sheetResistance_ohm_per_sq: number;
	length_mm: number;
	width_mm: number;
}): number {
	return (options.sheetResistance_ohm_per_sq * options.length_mm) / options.width_mm;
}

/** Duration of one common's time slot: a frame shared among the commons. */
export function timeSlot_s(options: { commons: number; frameRate_Hz: number }): number {
	return 1 / (options.commons * options.frameRate_Hz);
}

/** The longest time a level is held: half a slot with line inversion, a slot with frame inversion. */
export function settlingWindow_s(options: {
	commons: number;
	frameRate_Hz: number;
	inversion: InversionScheme;
}): number {
	const slot = timeSlot_s(options);
	return options.inversion === 'line' ? slot / 2 : slot;
}

/** Fraction of a step reached after charging for `time_s` with time constant `tau_s`. */
export function settledFraction(options: { time_s: number; tau_s: number }): number {
	return options.tau_s > 0 ? 1 - Math.exp(-options.time_s / options.tau_s) : 1;
}
