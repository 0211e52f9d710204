/**
 * Where the switched fraction s(V) = (Y(0) − Y(V))/(Y(0) − Y_sat) crosses a level, to a stated
 * voltage tolerance, by the Illinois variant of regula falsi (Dowell & Jarratt, BIT 11:168
 * (1971)) inside a bracket from the coarse sweep: each step is one director solve warm-started
 * from the nearer bracket end, and the bracket always keeps the crossing. Typically 3–5 solves.
 */
import type { DirectorProfile } from '../lc/profile';
import type { CellOptics } from './cell-optics';

/** Switching voltages are refined to this, V. */
export const CROSSING_TOLERANCE_V = 2e-5;
const MAX_STEPS = 40;

export interface BracketEnd {
	voltage_V: number;
	switched: number;
	profile: DirectorProfile;
}

export function refineCrossing(options: {
	optics: CellOptics;
	level: number;
	lo: BracketEnd;
	hi: BracketEnd;
	Y0: number;
	swing: number;
	tolerance_V?: number;
}): number {
	const { optics, level, Y0, swing } = options;
	const tolerance_V = options.tolerance_V ?? CROSSING_TOLERANCE_V;
	let lo = options.lo,
		hi = options.hi;
	let fLo = lo.switched - level,
		fHi = hi.switched - level;
	if (!(fLo < 0 && fHi >= 0)) throw new RangeError('the bracket does not contain the crossing');
	let side = 0;
	for (let step = 0; step < MAX_STEPS && hi.voltage_V - lo.voltage_V > tolerance_V; step++) {
		let v = (lo.voltage_V * fHi - hi.voltage_V * fLo) / (fHi - fLo);
		const width = hi.voltage_V - lo.voltage_V;
		// keep inside, and never closer than a tenth of the tolerance to an end
		v = Math.min(Math.max(v, lo.voltage_V + tolerance_V / 10), hi.voltage_V - tolerance_V / 10);
		if (!Number.isFinite(v)) v = lo.voltage_V + width / 2;
		const start = v - lo.voltage_V < hi.voltage_V - v ? lo.profile : hi.profile;
		const state = optics.stateAt(v, start);
		const switched = swing === 0 ? 0 : (Y0 - state.color.Y) / swing;
		const end = { voltage_V: v, switched, profile: state.solution };
		const f = switched - level;
		if (f < 0) {
			lo = end;
			fLo = f;
			if (side === -1) fHi /= 2;
			side = -1;
		} else {
			hi = end;
			fHi = f;
			if (side === 1) fLo /= 2;
			side = 1;
		}
		if (Math.abs(f) < 1e-12) return v;
	}
	return (lo.voltage_V * fHi - hi.voltage_V * fLo) / (fHi - fLo);
}
