/**
 * Fluid limits over the operating range: where the fluid is not nematic the twisted-nematic
 * effect is gone and the display blanks, but every temperature below the clearing point can still
 * be modelled. `nematicTemperatures` keeps those; `fluidLimitFindings` reports the rest.
 *
 * Model: the clearing point T_NI of the fluid data is the sharp nematic–isotropic transition
 * (lc/temperature.ts); at and above it the material is isotropic. Temperatures in °C.
 */
import type { Design } from '../design/schema';
import { finding, type Finding } from '../findings/finding';
import { materialOfCell } from './resolve-cell';

/** The temperatures at which the fluid is nematic (strictly below its clearing point). */
export function nematicTemperatures(options: {
	clearing_C: number;
	temperatures_C: readonly number[];
}): number[] {
	return options.temperatures_C.filter((t) => t < options.clearing_C);
}

/** A failing finding when the fluid clears at or below the hottest operating temperature. */
export function fluidLimitFindings(design: Design): Finding[] {
	let clearing_C: number;
	try {
		clearing_C = materialOfCell(design.cell).clearing_C;
	} catch {
		return []; // an unknown fluid is reported by the cell model itself
	}
	const { min_C, max_C } = design.drive.temperature;
	if (max_C < clearing_C) return [];
	const none = min_C >= clearing_C;
	return [
		finding({
			code: 'optics.fluid-clears',
			severity: 'fail',
			message:
				`The fluid clears at ${clearing_C} °C, below the hottest operating temperature ${max_C} °C: ` +
				`the display would blank from ${clearing_C} °C up. ` +
				(none
					? 'No operating temperature is below the clearing point, so no optics can be computed.'
					: `Optics and the model's switching voltages are shown for ${min_C} °C up to below ${clearing_C} °C only.`),
			fix: `Choose a fluid that clears well above ${max_C} °C (common practice: at least 10 °C above), or lower the hottest operating temperature.`
		})
	];
}
