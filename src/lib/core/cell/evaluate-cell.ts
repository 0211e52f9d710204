/**
 * A cell evaluated on its own, without a design: the single-pass transmission between the
 * polarizers at one wavelength, the electro-optic curve with V10/V50/V90, and the look of the
 * unpowered and the driven pixel under an illuminant. The command line's `cell` uses it.
 */
import type { CellSettings, Lighting } from '../design/cell-schema';
import { indicesAt } from '../lc/temperature';
import { createStackEvaluator } from '../optics/stack-evaluator';
import { createCellOptics } from './cell-optics';
import {
	electroOpticCurve,
	SATURATION_FACTOR,
	type ElectroOpticCurve
} from './electro-optic-curve';
import { contrastRatio, pixelAppearance, type PixelAppearance } from './pixel-appearance';
import { materialOfCell, stackOfCell } from './resolve-cell';

export interface CellEvaluation {
	temperature_C: number;
	wavelength_nm: number;
	volts_V: number;
	/** Single pass between the polarizers at wavelength_nm and volts_V (ideal parallel pair = 1). */
	transmittance: number;
	curve: ElectroOpticCurve;
	v10_V: number;
	v50_V: number;
	v90_V: number;
	off: PixelAppearance;
	on: PixelAppearance;
	contrastRatio: number;
}

export function evaluateCell(options: {
	cell: CellSettings;
	lighting: Lighting;
	temperature_C: number;
	wavelength_nm: number;
	/** RMS voltage of the driven pixel; 0 uses the saturated state. */
	volts_V: number;
	polarizerAngle_deg?: number;
}): CellEvaluation {
	const { cell, lighting, temperature_C, wavelength_nm, volts_V, polarizerAngle_deg } = options;
	const optics = createCellOptics({ cell, lighting, temperature_C, polarizerAngle_deg });
	const curve = electroOpticCurve({
		optics,
		withSlices: (slices) =>
			createCellOptics({ cell, lighting, temperature_C, polarizerAngle_deg, slices })
	});
	const zero = optics.stateAt(0);
	const onVoltage_V = volts_V > 0 ? volts_V : SATURATION_FACTOR * optics.analyticThreshold_V;
	const driven = optics.stateAt(onVoltage_V);
	const atVolts = volts_V > 0 ? driven : zero;
	const material = materialOfCell(cell);
	const pair = indicesAt({ material, temperature_C, wavelength_nm });
	const single = createStackEvaluator({
		wavelengths_nm: Float64Array.of(wavelength_nm),
		indicesAt: { ne: Float64Array.of(pair.ne), no: Float64Array.of(pair.no) },
		stack: stackOfCell(cell, { polarizerAngle_deg })
	}).evaluate(atVolts.solution);
	const off = pixelAppearance(zero, lighting.illuminance_lx);
	const on = pixelAppearance(driven, lighting.illuminance_lx);
	return {
		temperature_C,
		wavelength_nm,
		volts_V,
		transmittance: single.singlePass[0],
		curve,
		v10_V: curve.v10_V,
		v50_V: curve.v50_V,
		v90_V: curve.v90_V,
		off,
		on,
		contrastRatio: contrastRatio(off, on)
	};
}
