/**
 * The fluid's static relative permittivity seen by an off and an on pixel at a temperature.
 *
 * Model: an off pixel (director in the plate plane) sees ε⊥; a fully switched on pixel (director
 * along the field) sees ε∥. A driven pixel at its on RMS voltage is close to but below full
 * switching, so taking ε∥ for it bounds the load from above, which is the safe side for a battery
 * estimate. ε∥ and ε⊥ follow the order parameter with temperature (lc/temperature.ts, Haller
 * scaling of Δε about the mean). Above the clearing point the fluid is isotropic and both pixels
 * see the mean permittivity (ε∥ + 2ε⊥)/3.
 */
import type { CellSettings } from '../design/cell-schema';
import { materialOfCell } from '../cell/resolve-cell';
import { materialAt } from '../lc/temperature';

export interface PixelPermittivity {
	off: number;
	on: number;
	/** False above the clearing point. */
	nematic: boolean;
}

export function pixelPermittivity(options: {
	cell: CellSettings;
	temperature_C: number;
}): PixelPermittivity {
	const material = materialOfCell(options.cell);
	const state = materialAt({ material, temperature_C: options.temperature_C });
	if (state.phase === 'isotropic') {
		const mean = (material.epsParallel + 2 * material.epsPerpendicular) / 3;
		return { off: mean, on: mean, nematic: false };
	}
	return { off: state.epsPerpendicular, on: state.epsParallel, nematic: true };
}
