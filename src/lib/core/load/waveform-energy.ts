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

/** Expected energy per cycle of each pixel site, J (same order as `sites`). */
export function cycleEnergies_J(options: {
	drive: WaveformDrive;
	sites: readonly PixelSite[];
}): Float64Array {
	const { drive, sites } = options;
	const wave = multiplexWaveform(drive);
	const { steps, slot } = scannedCommonAtStep(drive);
	const segOn = wave.segmentLevels_V(new Array<boolean>(drive.commons).fill(true));
	const segOff = wave.segmentLevels_V(new Array<boolean>(drive.commons).fill(false));
	// State probability of each crossing: the first site at a crossing defines it.
	const crossing = new Map<number, number>();
	const key = (line: number, common: number) => line * drive.commons + common;
	for (const s of sites) {
		const k = key(s.lineIndex, s.commonIndex);
		if (!crossing.has(k)) crossing.set(k, Math.min(1, Math.max(0, s.onProbability)));
	}
	const energies = new Float64Array(sites.length);
	const vars: number[] = [];
	const probs: number[] = [];
	sites.forEach((site, index) => {
		if (site.commonIndex < 0 || site.commonIndex >= drive.commons) return;
		const com = wave.commonLevels_V[site.commonIndex];
		let energy = 0;
		for (let t = 0; t < steps; t++) {
			const prev = (t + steps - 1) % steps;
			vars.length = 0;
			probs.length = 0;
			for (const c of [site.commonIndex, slot[prev], slot[t]]) {
				if (vars.includes(c)) continue;
				vars.push(c);
				probs.push(crossing.get(key(site.lineIndex, c)) ?? 0);
			}
			const count = vars.length;
			const at = (mask: number, common: number) => (mask >> vars.indexOf(common)) & 1;
			const deltaCom = com[t] - com[prev];
			for (let mask = 0; mask < 1 << count; mask++) {
				let p = 1;
				for (let v = 0; v < count; v++) p *= (mask >> v) & 1 ? probs[v] : 1 - probs[v];
				if (p === 0) continue;
				const segNow = at(mask, slot[t]) ? segOn[t] : segOff[t];
				const segBefore = at(mask, slot[prev]) ? segOn[prev] : segOff[prev];
				const dv = segNow - segBefore - deltaCom;
				const c = at(mask, site.commonIndex) ? site.on_F : site.off_F;
				energy += p * 0.5 * c * dv * dv;
			}
		}
		energies[index] = energy;
	});
	return energies;
}

/** Duration of the waveform's full DC-balanced cycle: two frames. */
export function cycleDuration_s(frameRate_Hz: number): number {
	return 2 / frameRate_Hz;
}
