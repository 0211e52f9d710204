/**
 * Drive energy over the real multiplexed waveform, checked against (1) the textbook square-wave
 * power P = C·V_pp²·f and (2) a brute-force RC charging simulation of the same waveform, written
 * here from the waveform's definition without the code under test.
 */
import { describe, expect, it } from 'vitest';
import { expectWithin } from '../helpers/tolerance';
import {
	cycleDuration_s,
	cycleEnergies_J,
	type PixelSite
} from '../../src/lib/core/load/waveform-energy';
import { meanLitFractionOfDigits } from '../../src/lib/core/load/display-patterns';

const PF = 1e-12;

describe('square-wave power', () => {
	it('gives P = C·V_pp²·f for a static on pixel', () => {
		// Textbook: a capacitor driven by a square wave of peak-to-peak V_pp at frequency f through any
		// resistance dissipates 2·½·C·V_pp² per period, P = C·V_pp²·f. A static on pixel sees ±V:
		// V_pp = 2V, at the frame rate with line inversion and at half of it with frame inversion.
		const c_F = 150 * PF;
		const amplitude_V = 3;
		const frameRate_Hz = 80;
		const cases = (['line', 'frame'] as const).map((inversion) => {
			const [energy] = cycleEnergies_J({
				drive: { commons: 1, biasDivisor: 2, amplitude_V, inversion },
				sites: [{ commonIndex: 0, lineIndex: 0, onProbability: 1, off_F: c_F, on_F: c_F }]
			});
			const f = inversion === 'line' ? frameRate_Hz : frameRate_Hz / 2;
			return {
				label: `${inversion} inversion`,
				expected: c_F * (2 * amplitude_V) ** 2 * f * 1e6,
				actual: (energy / cycleDuration_s(frameRate_Hz)) * 1e6
			};
		});
		expectWithin(cases, { tolerance: 1e-9, unit: 'µW', source: 'textbook P = C·V_pp²·f' });
	});

	it('draws nothing for a static off pixel (segment in phase with its common)', () => {
		const [energy] = cycleEnergies_J({
			drive: { commons: 1, biasDivisor: 2, amplitude_V: 5, inversion: 'line' },
			sites: [{ commonIndex: 0, lineIndex: 0, onProbability: 0, off_F: PF, on_F: PF }]
		});
		expect(energy).toBe(0);
	});
});

/**
 * The multiplexed waveform from its definition (1/N duty, 1/a bias, amplitude V): in common slot
 * s the selected common is at V and the others at V/a; an on segment is at 0, an off one at 2V/a;
 * the negative half mirrors every level L to V − L. Line inversion: positive then negative half of
 * every slot; frame inversion: a positive frame, then a negative one. Two frames per cycle.
 */
function referenceWaveform(o: {
	commons: number;
	bias: number;
	volts: number;
	inversion: 'line' | 'frame';
}) {
	const halves: { slot: number; positive: boolean }[] = [];
	for (let frame = 0; frame < 2; frame++)
		for (let slot = 0; slot < o.commons; slot++)
			for (let half = 0; half < 2; half++)
				halves.push({ slot, positive: o.inversion === 'line' ? half === 0 : frame === 0 });
	const level = (l: number, positive: boolean) => (positive ? l : o.volts - l);
	return {
		halves,
		common: (c: number, h: number) =>
			level(halves[h].slot === c ? o.volts : o.volts / o.bias, halves[h].positive),
		segment: (on: boolean[], h: number) =>
			level(on[halves[h].slot] ? 0 : (2 * o.volts) / o.bias, halves[h].positive)
	};
}

/** Energy dissipated in R per cycle by an RC pixel, by time stepping (second cycle, after one to settle). */
function simulatedCycleEnergy(o: { source: number[]; c_F: number; step_s: number }): number {
	const tau_s = o.step_s / 40;
	const r = tau_s / o.c_F;
	const substeps = 2000;
	const dt = o.step_s / substeps;
	const decay = Math.exp(-dt / tau_s);
	let v = 0;
	let energy = 0;
	for (let cycle = 0; cycle < 2; cycle++) {
		energy = 0;
		for (const vs of o.source) {
			for (let k = 0; k < substeps; k++) {
				const i0 = (vs - v) / r;
				v = vs - (vs - v) * decay;
				const i1 = (vs - v) / r;
				energy += ((i0 * i0 + i1 * i1) / 2) * r * dt; // trapezoid rule on i²R
			}
		}
	}
	return energy;
}

describe('multiplexed waveform energy against a time-stepped RC simulation', () => {
	const configs = [
		{ commons: 4, bias: 3, volts: 4.7, inversion: 'line' as const },
		{ commons: 4, bias: 3, volts: 4.7, inversion: 'frame' as const },
		{ commons: 3, bias: 2.5, volts: 3.3, inversion: 'line' as const },
		{ commons: 2, bias: 2, volts: 3, inversion: 'frame' as const }
	];
	for (const cfg of configs) {
		it(`${cfg.commons} commons, bias 1/${cfg.bias}, ${cfg.inversion} inversion`, () => {
			const ref = referenceWaveform(cfg);
			// Two segment lines, every crossing used; line 0 a mixed pattern, line 1 all on but one.
			const patterns = [
				Array.from({ length: cfg.commons }, (_, c) => c % 2 === 0),
				Array.from({ length: cfg.commons }, (_, c) => c !== 1)
			];
			const capacitance = (line: number, c: number, on: boolean) =>
				(100 + 37 * c + 11 * line) * PF * (on ? 2.5 : 1);
			const sites: PixelSite[] = [];
			for (let line = 0; line < 2; line++)
				for (let c = 0; c < cfg.commons; c++)
					sites.push({
						commonIndex: c,
						lineIndex: line,
						onProbability: patterns[line][c] ? 1 : 0,
						off_F: capacitance(line, c, false),
						on_F: capacitance(line, c, true)
					});
			const energies = cycleEnergies_J({
				drive: {
					commons: cfg.commons,
					biasDivisor: cfg.bias,
					amplitude_V: cfg.volts,
					inversion: cfg.inversion
				},
				sites
			});
			const step_s = 1e-4;
			const cases = sites.map((s, i) => {
				const on = patterns[s.lineIndex];
				const source = ref.halves.map((_, h) => ref.segment(on, h) - ref.common(s.commonIndex, h));
				return {
					label: `line ${s.lineIndex}, common ${s.commonIndex}`,
					expected:
						simulatedCycleEnergy({
							source,
							c_F: on[s.commonIndex] ? s.on_F : s.off_F,
							step_s
						}) * 1e12,
					actual: energies[i] * 1e12
				};
			});
			// Tolerance: the simulation's trapezoid rule and finite settling err by < 0.1 %.
			const largest = Math.max(...cases.map((c) => c.expected));
			expectWithin(cases, {
				tolerance: largest * 1e-3,
				unit: 'pJ per cycle',
				source: 'time-stepped RC simulation of the waveform'
			});
		});
	}
});

describe('expected load of a random picture', () => {
	it('equals the average over every picture weighted by its probability', () => {
		// Brute force: all 2^6 pictures of 3 commons × 2 lines, each weighted p^on·(1 − p)^off.
		const p = 0.7;
		const drive = { commons: 3, biasDivisor: 3, amplitude_V: 4, inversion: 'line' as const };
		const base = Array.from({ length: 6 }, (_, i) => ({
			commonIndex: i % 3,
			lineIndex: Math.floor(i / 3),
			off_F: (50 + 10 * i) * PF,
			on_F: (120 + 25 * i) * PF
		}));
		let expectedTotal = 0;
		for (let mask = 0; mask < 64; mask++) {
			const sites = base.map((s, i) => ({ ...s, onProbability: (mask >> i) & 1 }));
			let weight = 1;
			for (let i = 0; i < 6; i++) weight *= (mask >> i) & 1 ? p : 1 - p;
			expectedTotal += weight * cycleEnergies_J({ drive, sites }).reduce((a, b) => a + b, 0);
		}
		const actual = cycleEnergies_J({
			drive,
			sites: base.map((s) => ({ ...s, onProbability: p }))
		}).reduce((a, b) => a + b, 0);
		expectWithin([{ label: 'p = 0.7', expected: expectedTotal * 1e12, actual: actual * 1e12 }], {
			tolerance: 1e-9,
			unit: 'pJ per cycle',
			source: 'enumeration of all 64 pictures'
		});
	});

	it("uses the digits' mean lit fraction for a typical reading", () => {
		// Common practice: the usual digit forms 0–9 light 6, 2, 5, 5, 4, 5, 6, 3, 7, 6 of 7 segments.
		expect(meanLitFractionOfDigits()).toBeCloseTo(49 / 70, 12);
	});
});
