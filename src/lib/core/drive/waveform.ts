/**
 * A time-slot model of multiplexed drive waveforms, from which RMS and DC are computed directly
 * rather than from the closed form (the two must agree).
 *
 * Levels for bias 1/a and amplitude V, in the positive polarity: the selected common is at V,
 * the other commons at V/a; an on segment is at 0 and an off segment at 2V/a. The negative
 * polarity mirrors every level about V/2 (L → V − L). A pixel thus sees V (on) or (a − 2)V/a
 * (off) in its own slot and ±V/a elsewhere. Static drive: one common square wave 0/V, on segments
 * in anti-phase, off segments in phase.
 *
 * Line inversion (often called type A) flips polarity half way through every common slot; frame
 * inversion (type B) flips it every other frame. Either way the full cycle is two frames.
 */
import type { DriveLevels } from './rms-drive';

export type InversionScheme = 'line' | 'frame';

export interface Waveform {
	/** Number of equal time steps in a full DC-balanced cycle. */
	steps: number;
	/** commonLevels_V[c][t]: voltage of common c at step t. */
	commonLevels_V: Float64Array[];
	/** Voltage of a segment line at step t given which commons it turns on. */
	segmentLevels_V: (onCommons: readonly boolean[]) => Float64Array;
}

export function multiplexWaveform(options: DriveLevels & { inversion: InversionScheme }): Waveform {
	const { commons, amplitude_V, inversion } = options;
	const a = commons === 1 ? 2 : options.biasDivisor;
	const v = amplitude_V;
	// Each common slot spans two steps, so both schemes fit the same grid of 2 frames × N slots × 2.
	const steps = 4 * commons;
	const polarityAt = (t: number): 1 | -1 => {
		const frame = Math.floor(t / (2 * commons));
		const half = t % 2;
		if (inversion === 'line') return half === 0 ? 1 : -1;
		return frame === 0 ? 1 : -1;
	};
	const slotAt = (t: number) => Math.floor(t / 2) % commons;
	const mirror = (level: number, polarity: 1 | -1) => (polarity === 1 ? level : v - level);
	const commonLevels_V = Array.from({ length: commons }, (_, c) => {
		const levels = new Float64Array(steps);
		for (let t = 0; t < steps; t++) {
			const selected = slotAt(t) === c;
			levels[t] = mirror(selected ? v : commons === 1 ? 0 : v / a, polarityAt(t));
		}
		return levels;
	});
	const segmentLevels_V = (onCommons: readonly boolean[]) => {
		const levels = new Float64Array(steps);
		for (let t = 0; t < steps; t++) {
			const on = onCommons[slotAt(t)] ?? false;
			const positive = commons === 1 ? (on ? 0 : v) : on ? 0 : (2 * v) / a;
			levels[t] = mirror(positive, polarityAt(t));
		}
		return levels;
	};
	return { steps, commonLevels_V, segmentLevels_V };
}

/** RMS and mean (DC) of the voltage across a pixel: segment minus common over the cycle. */
export function pixelVoltageStats(
	common: Float64Array,
	segment: Float64Array
): { rms_V: number; dc_V: number } {
	let sum = 0;
	let sumSquares = 0;
	for (let t = 0; t < common.length; t++) {
		const across = segment[t] - common[t];
		sum += across;
		sumSquares += across * across;
	}
	return { rms_V: Math.sqrt(sumSquares / common.length), dc_V: sum / common.length };
}
