/**
 * The electro-optic curve of a reflective cell: luminance factor Y against RMS voltage, and the
 * voltages where the optical change reaches 10 %, 50 % and 90 % of its full swing (glass makers
 * call the 10 % point the threshold; LCD-driver data sheets require V_off ≤ V10, V_on ≥ V90).
 *
 * The swing runs from the 0 V state to a saturated state at SATURATION_FACTOR × the analytic
 * threshold; the switched fraction is (Y(0) − Y(V))/(Y(0) − Y_sat), which works for both modes
 * (negative mode gives a negative swing). Voltages are swept upwards with each director solve
 * warm-started from the previous one; each crossing is then refined inside its bracket by a few
 * warm-started solves (refine-crossing.ts) to 2e-5 V, so the switching voltages carry no
 * voltage-grid error — what remains is the director's slicing error (slice-count.ts).
 */
import type { CellOptics } from './cell-optics';
import type { DirectorProfile } from '../lc/profile';
import { refineCrossing } from './refine-crossing';
import { convergeSwitching } from './slice-count';

/** The saturated reference state, in multiples of the analytic threshold. */
export const SATURATION_FACTOR = 6;

export interface CurvePoint {
	voltage_V: number;
	/** Luminance factor of the stack, %. */
	Y: number;
	/** Fraction of the full optical change, 0 at 0 V, 1 at saturation. */
	switched: number;
}

export interface SwitchingVoltages {
	v10_V: number;
	v50_V: number;
	v90_V: number;
}

export interface ElectroOpticCurve extends SwitchingVoltages {
	temperature_C: number;
	/** Slabs the switching voltages were converged to (the curve's points use optics.slices). */
	slices: number;
	/** Estimated slicing error of V10/V50/V90, V (null when not converged in slices). */
	errorEstimate_V: number | null;
	points: CurvePoint[];
	Y0: number;
	Ysat: number;
}

export function curveVoltages(threshold_V: number, count = 28): number[] {
	const from = 0.6 * threshold_V;
	const to = 3.2 * threshold_V;
	return Array.from({ length: count }, (_, i) => from + ((to - from) * i) / (count - 1));
}

/** First crossing of `level` by the switched fraction, linearly interpolated. */
export function crossing(points: readonly CurvePoint[], level: number): number {
	for (let i = 1; i < points.length; i++) {
		const a = points[i - 1];
		const b = points[i];
		if (a.switched < level && b.switched >= level) {
			return (
				a.voltage_V +
				((level - a.switched) / (b.switched - a.switched)) * (b.voltage_V - a.voltage_V)
			);
		}
	}
	return NaN;
}

export function electroOpticCurve(options: {
	optics: CellOptics;
	voltages_V?: readonly number[];
	/** The same cell with another slice count: when given, V10/V50/V90 converge in slices. */
	withSlices?: (slices: number) => CellOptics;
}): ElectroOpticCurve {
	const { optics } = options;
	const voltages = options.voltages_V ?? curveVoltages(optics.analyticThreshold_V);
	const zero = optics.stateAt(0);
	let previous = zero.solution;
	const profiles: DirectorProfile[] = [];
	const raw = voltages.map((voltage_V) => {
		const state = optics.stateAt(voltage_V, voltage_V > 0 ? previous : undefined);
		previous = state.solution;
		profiles.push(state.solution);
		return { voltage_V, Y: state.color.Y };
	});
	const saturated = optics.stateAt(SATURATION_FACTOR * optics.analyticThreshold_V, previous);
	const Y0 = zero.color.Y;
	const Ysat = saturated.color.Y;
	const swing = Y0 - Ysat;
	const points = raw.map((p) => ({ ...p, switched: swing === 0 ? 0 : (Y0 - p.Y) / swing }));
	const refined = (level: number) => {
		const i = points.findIndex(
			(p, k) => k > 0 && points[k - 1].switched < level && p.switched >= level
		);
		if (i < 1) return NaN;
		const end = (k: number) => ({ ...points[k], profile: profiles[k] });
		return refineCrossing({ optics, level, lo: end(i - 1), hi: end(i), Y0, swing });
	};
	let v10_V = refined(0.1);
	let v50_V = refined(0.5);
	let v90_V = refined(0.9);
	if (![v10_V, v50_V, v90_V].every(Number.isFinite)) {
		throw new Error(
			`the cell does not switch monotonically between ${voltages[0].toFixed(2)} and ` +
				`${voltages[voltages.length - 1].toFixed(2)} V at ${optics.temperature_C} °C; check the gap, twist and polarizers`
		);
	}
	let slices = optics.slices;
	let errorEstimate_V: number | null = null;
	if (options.withSlices) {
		const nearest = (voltage_V: number) => {
			let k = 0;
			voltages.forEach((v, j) => {
				if (Math.abs(v - voltage_V) < Math.abs(voltages[k] - voltage_V)) k = j;
			});
			return voltage_V <= 0
				? zero.solution
				: voltage_V > voltages[voltages.length - 1]
					? saturated.solution
					: profiles[k];
		};
		const converged = convergeSwitching({
			voltages_V: [v10_V, v50_V, v90_V],
			slices,
			make: options.withSlices,
			startFor: nearest,
			saturation_V: saturated.voltage_V
		});
		[v10_V, v50_V, v90_V] = converged.voltages_V;
		slices = converged.slices;
		errorEstimate_V = converged.errorEstimate_V;
	}
	return {
		temperature_C: optics.temperature_C,
		slices,
		errorEstimate_V,
		points,
		Y0,
		Ysat,
		v10_V,
		v50_V,
		v90_V
	};
}
