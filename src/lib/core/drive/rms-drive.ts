/**
 * RMS voltages of conventional multiplexed ("1/N duty, 1/a bias") segment drive.
 *
 * With N commons, a bias divisor a and a full ladder amplitude V (the LCD supply), a pixel sees
 * V during its own common's slot (on) or (a − 2)·V/a (off), and ±V/a in the other N − 1 slots:
 *   V_on  = (V/a)·sqrt((N − 1 + a²)/N)
 *   V_off = (V/a)·sqrt((N − 1 + (a − 2)²)/N)
 * The selection ratio V_on/V_off is largest at a = √N + 1, where it equals
 *   sqrt((√N + 1)/(√N − 1)),
 * the bound of Alt & Pleshko (IEEE Trans. Electron Devices ED-21(2):146–155, 1974) for all
 * RMS addressing of this kind. Static drive (N = 1) puts the full V across on pixels and none
 * across off pixels, so its selection ratio is unbounded.
 */

export interface DriveLevels {
	commons: number;
	/** The divisor a of "bias 1/a"; not used for static drive. */
	biasDivisor: number;
	amplitude_V: number;
}

export interface RmsVoltages {
	on_V: number;
	off_V: number;
	/** V_on/V_off; Infinity for static drive. */
	selectionRatio: number;
}

export function isStaticDrive(commons: number): boolean {
	return commons === 1;
}

export function rmsVoltages({ commons, biasDivisor, amplitude_V }: DriveLevels): RmsVoltages {
	if (isStaticDrive(commons)) {
		return { on_V: amplitude_V, off_V: 0, selectionRatio: Infinity };
	}
	const n = commons;
	const a = biasDivisor;
	const step_V = amplitude_V / a;
	const on_V = step_V * Math.sqrt((n - 1 + a * a) / n);
	const off_V = step_V * Math.sqrt((n - 1 + (a - 2) * (a - 2)) / n);
	return { on_V, off_V, selectionRatio: on_V / off_V };
}

/** The Alt–Pleshko maximum selection ratio for N commons; Infinity for static drive. */
export function altPleshkoLimit(commons: number): number {
	if (isStaticDrive(commons)) return Infinity;
	const root = Math.sqrt(commons);
	return Math.sqrt((root + 1) / (root - 1));
}

/** The bias divisor a = √N + 1 that reaches the Alt–Pleshko limit. */
export function optimalBiasDivisor(commons: number): number {
	return Math.sqrt(commons) + 1;
}

/** Largest N whose Alt–Pleshko limit still reaches a cell steepness γ = V90/V10. */
export function maxCommonsForSteepness(steepness: number): number {
	if (!(steepness > 1)) return Infinity;
	const g2 = steepness * steepness;
	return Math.floor(((g2 + 1) / (g2 - 1)) ** 2);
}
