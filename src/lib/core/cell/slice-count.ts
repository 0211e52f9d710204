/**
 * Switching voltages converged in the director's slice count. The profile's error falls as 1/N²
 * (second-order differences), so for a crossing V_N found with N slabs the error of V_2N is
 * estimated as c = |V_2N − V_N|/3 and removed by the Richardson extrapolation
 * V_2N + (V_2N − V_N)/3 (Richardson, Phil. Trans. R. Soc. A 210:307 (1911)). What is left is
 * the next-order term. Starting from the curve's N, N is doubled until c ≤ EXTRAPOLATION_LIMIT_V
 * (or MAX_SLICES is reached). The limit assumes the extrapolation removes at least four fifths
 * of the error, i.e. leaves ≤ SWITCHING_TOLERANCE_V; tests/cell/switching-accuracy.test.ts checks
 * the result against extrapolated 240/480-slab answers for two fluids, one of high Δε (worst ≈ 3e-6 V).
 * Each finer crossing is bracketed ±BRACKET_V around the coarser one and refined by
 * refine-crossing.ts, warm-started from the coarse sweep's nearest profile.
 */
import type { DirectorProfile } from '../lc/profile';
import type { CellOptics } from './cell-optics';
import { refineCrossing, type BracketEnd } from './refine-crossing';

export const SWITCHING_TOLERANCE_V = 2e-4;
export const EXTRAPOLATION_LIMIT_V = 5 * SWITCHING_TOLERANCE_V;
export const MAX_SLICES = 480;
const BRACKET_V = 0.004;
const LEVELS = [0.1, 0.5, 0.9] as const;

export interface ConvergedSwitching {
	voltages_V: [number, number, number];
	/** The finer slice count of the last pair used. */
	slices: number;
	/** Richardson correction of the last pair, V: the estimated error of its finer member (the
	 * reported extrapolation is far better). */
	errorEstimate_V: number;
}

function crossingsWith(options: {
	optics: CellOptics;
	near_V: readonly number[];
	startFor: (voltage_V: number) => DirectorProfile;
	saturation_V: number;
}): number[] {
	const { optics, near_V, startFor } = options;
	const Y0 = optics.stateAt(0, startFor(0)).color.Y;
	const saturated = optics.stateAt(options.saturation_V, startFor(options.saturation_V));
	const swing = Y0 - saturated.color.Y;
	const endAt = (voltage_V: number): BracketEnd => {
		const state = optics.stateAt(voltage_V, startFor(voltage_V));
		return { voltage_V, switched: (Y0 - state.color.Y) / swing, profile: state.solution };
	};
	return LEVELS.map((level, i) => {
		let width = BRACKET_V;
		for (let attempt = 0; attempt < 6; attempt++, width *= 4) {
			const lo = endAt(Math.max(near_V[i] - width, 1e-3));
			const hi = endAt(near_V[i] + width);
			if (lo.switched < level && hi.switched >= level)
				return refineCrossing({ optics, level, lo, hi, Y0, swing });
		}
		throw new Error(
			`the ${level * 100} % crossing moved by more than ${width} V with the slice count`
		);
	});
}

export function convergeSwitching(options: {
	/** Crossings found with `slices` slabs (already refined in voltage). */
	voltages_V: readonly [number, number, number];
	slices: number;
	make: (slices: number) => CellOptics;
	startFor: (voltage_V: number) => DirectorProfile;
	saturation_V: number;
}): ConvergedSwitching {
	let coarse = [...options.voltages_V];
	let slices = options.slices;
	let estimate = Infinity;
	let extrapolated = coarse;
	while (slices * 2 <= MAX_SLICES) {
		const fine = crossingsWith({
			optics: options.make(slices * 2),
			near_V: coarse,
			startFor: options.startFor,
			saturation_V: options.saturation_V
		});
		slices *= 2;
		estimate = Math.max(...fine.map((v, i) => Math.abs(v - coarse[i]) / 3));
		extrapolated = fine.map((v, i) => v + (v - coarse[i]) / 3);
		coarse = fine;
		if (estimate <= EXTRAPOLATION_LIMIT_V) break;
	}
	return {
		voltages_V: extrapolated as [number, number, number],
		slices,
		errorEstimate_V: estimate
	};
}
