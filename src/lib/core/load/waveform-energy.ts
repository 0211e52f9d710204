/**
 * Energy the driver spends per DC-balanced cycle charging the pixels of a multiplexed display.
 *
 * Model: each pixel is a capacitor C between its segment line and its common, both driven from
 * voltage sources through some resistance. Every step ΔV of the voltage across it dissipates
 * ½·C·ΔV² in that resistance, whatever its value, provided the pixel settles within the step
 * (see trace-rc.ts). Over a full cycle the capacitor ends where it started, so the energy drawn
 * from the supply equals the sum of ½·C·ΔV_t² over every step t of the real waveform
 * (drive/waveform.ts, line or frame inversion), not a sine approximation.
 *
 * A shown pattern gives each crossing (common, line) a probability of being on: 0 or 1 for a
 * fixed picture, in between for a statistical one. The segment line's level at step t depends
 * only on the state of the crossing scanned at t, so the expected ½·C·ΔV² of a step involves at
 * most three independent crossings (the pixel's own, the ones scanned at t − 1 and at t); the
 * expectation is summed exactly over their 2³ joint states. An on pixel has its on capacitance.
 */
import { multiplexWaveform, type InversionScheme } from '../drive/waveform';

export interface PixelSite {
	commonIndex: number;
	lineIndex: number;
	/** Probability that the crossing is on in the shown pattern, 0…1. */
	onProbability: number;
	off_F: number;
	on_F: number;
}

export interface WaveformDrive {
	commons: number;
	biasDivisor: number;
	amplitude_V: number;
	inversion: InversionScheme;
}

/** Which common the segment lines serve at each step, read off the waveform model itself. */
function scannedCommonAtStep(drive: WaveformDrive): { steps: number; slot: Int32Array } {
	const wave = multiplexWaveform(drive);
	const slot = new Int32Array(wave.steps);
	if (drive.commons === 1) return { steps: wave.steps, slot };
	const none = new Array<boolean>(drive.commons).fill(false);
	const off = wave.segmentLevels_V(none);
	for (let c = 0; c < drive.commons; c++) {
		const only = none.map((_, k) => k === c);
		const levels = wave.segmentLevels_V(only);
		for (let t = 0; t < wave.steps; t++) if (levels[t] !== off[t]) slot[t] = c;
	}
	return { steps: wave.steps, slot };
}

/**
 * Per site, the two coefficients k_off, k_on (V²) of its expected energy per cycle
 * E = C_off·k_off + C_on·k_on: the waveform's part, independent of the capacitances, so a
 * temperature sweep (which only rescales C) reuses it. Layout [k_off0, k_on0, k_off1, …].
 */
export function cycleEnergyCoefficients(options: {
	drive: WaveformDrive;
	sites: readonly PixelSite[];
}): Float64Array {
	const { drive, sites } = options;
	const n = drive.commons;
	const wave = multiplexWaveform(drive);
	const { steps, slot } = scannedCommonAtStep(drive);
	const segOn = wave.segmentLevels_V(new Array<boolean>(n).fill(true));
	const segOff = wave.segmentLevels_V(new Array<boolean>(n).fill(false));
	// State probability of each crossing: the first site at a crossing defines it.
	let lines = 0;
	for (const s of sites) lines = Math.max(lines, s.lineIndex + 1);
	const crossingP = new Float64Array(lines * n);
	const defined = new Uint8Array(lines * n);
	for (const s of sites) {
		if (s.commonIndex < 0 || s.commonIndex >= n) continue;
		const k = s.lineIndex * n + s.commonIndex;
		if (defined[k]) continue;
		defined[k] = 1;
		crossingP[k] = Math.min(1, Math.max(0, s.onProbability));
	}
	const out = new Float64Array(2 * sites.length);
	for (let i = 0; i < sites.length; i++) {
		const own = sites[i].commonIndex;
		if (own < 0 || own >= n) continue;
		const row = sites[i].lineIndex * n;
		const com = wave.commonLevels_V[own];
		const pOwn = crossingP[row + own];
		let kOff = 0;
		let kOn = 0;
		for (let t = 0; t < steps; t++) {
			const prev = t === 0 ? steps - 1 : t - 1;
			const s0 = slot[prev];
			const s1 = slot[t];
			const p0 = crossingP[row + s0];
			const p1 = crossingP[row + s1];
			const deltaCom = com[t] - com[prev];
			// Joint states (a: own, b: scanned at t − 1, c: scanned at t); equal crossings share a state.
			for (let a = 0; a < 2; a++) {
				const pa = a ? pOwn : 1 - pOwn;
				for (let b = 0; b < 2; b++) {
					if (s0 === own && b !== a) continue;
					const pb = s0 === own ? 1 : b ? p0 : 1 - p0;
					for (let c = 0; c < 2; c++) {
						if (s1 === own && c !== a) continue;
						if (s1 === s0 && c !== b) continue;
						const pc = s1 === own || s1 === s0 ? 1 : c ? p1 : 1 - p1;
						const p = pa * pb * pc;
						if (p === 0) continue;
						const dv = (c ? segOn[t] : segOff[t]) - (b ? segOn[prev] : segOff[prev]) - deltaCom;
						if (a) kOn += p * 0.5 * dv * dv;
						else kOff += p * 0.5 * dv * dv;
					}
				}
			}
		}
		out[2 * i] = kOff;
		out[2 * i + 1] = kOn;
	}
	return out;
}

/** Expected energy per cycle of each pixel site, J (same order as `sites`). */
export function cycleEnergies_J(options: {
	drive: WaveformDrive;
	sites: readonly PixelSite[];
}): Float64Array {
	const k = cycleEnergyCoefficients(options);
	return Float64Array.from(options.sites, (s, i) => s.off_F * k[2 * i] + s.on_F * k[2 * i + 1]);
}

/** Duration of the waveform's full DC-balanced cycle: two frames. */
export function cycleDuration_s(frameRate_Hz: number): number {
	return 2 / frameRate_Hz;
}
