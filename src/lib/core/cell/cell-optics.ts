/**
 * One cell at one temperature, ready to answer "what does a pixel look like at V volts RMS?":
 * the director profile (constant-voltage statics, lc/director.ts) feeds the reflective Jones
 * stack (optics/) on the visible grid, and the reflectance spectrum is turned into colour under
 * the design's illuminant (color/).
 *
 * The evaluator, indices and tristimulus weights are built once per temperature; a state then
 * costs one director solve (warm-started from a neighbouring voltage) and one spectral pass.
 */
import type { CellSettings, Lighting } from '../design/cell-schema';
import { cellAt, type DirectorCell } from '../lc/cell';
import { solveDirector } from '../lc/director';
import type { DirectorProfile, DirectorSolution } from '../lc/profile';
import { indicesAt } from '../lc/temperature';
import { twistedThreshold_V, splayThreshold_V } from '../lc/threshold';
import {
	createStackEvaluator,
	createStackSpectra,
	type StackSpectra
} from '../optics/stack-evaluator';
import { reflectanceToColor, type ReflectanceColor } from '../color/reflectance-to-color';
import { VISIBLE_5NM_GRID, gridWavelengths_nm } from '../color/spectrum';
import type { ObserverName } from '../color/observers';
import { illuminantByName } from '../color/illuminant-by-name';
import { geometryOfCell, materialOfCell, stackOfCell } from './resolve-cell';

export const CELL_GRID = VISIBLE_5NM_GRID;
/**
 * Default director slabs across the gap. The error of the profile falls as 1/N² (second-order
 * differences): at 60 slabs the mid-plane tilt just above threshold is off by ≈ 3e-3 rad for a
 * high-Δε fluid, ≈ 8e-5 at 400. `chooseSlices` (slice-count.ts) picks N from an error estimate.
 */
export const CELL_SLICES = 60;

export interface PixelState {
	voltage_V: number;
	solution: DirectorSolution;
	reflectance: Float64Array;
	color: ReflectanceColor;
}

export interface CellOptics {
	temperature_C: number;
	slices: number;
	directorCell: DirectorCell;
	/** Analytic threshold of the twisted cell (Schadt–Helfrich form), V. */
	analyticThreshold_V: number;
	wavelengths_nm: Float64Array;
	stateAt(voltage_V: number, start?: DirectorProfile): PixelState;
	/** Single pass between the polarizers at each grid wavelength (ideal parallel pair = 1). */
	singlePassOf(profile: DirectorProfile): Float64Array;
	/** Spectra of a given profile, for callers that already have one. */
	spectraOf(profile: DirectorProfile): StackSpectra;
}

export function observerName(observer: 2 | 10): ObserverName {
	return observer === 10 ? 'CIE1964-10deg' : 'CIE1931-2deg';
}

export function createCellOptics(options: {
	cell: CellSettings;
	lighting: Lighting;
	temperature_C: number;
	/** Fix the angle between the polarizers instead of following the display mode. */
	polarizerAngle_deg?: number;
	/** Director slabs across the gap (default CELL_SLICES). */
	slices?: number;
}): CellOptics {
	const { cell, lighting, temperature_C } = options;
	const slices = options.slices ?? CELL_SLICES;
	const material = materialOfCell(cell);
	const directorCell = cellAt({ geometry: geometryOfCell(cell), material, temperature_C });
	const wavelengths_nm = gridWavelengths_nm(CELL_GRID);
	const ne = new Float64Array(wavelengths_nm.length);
	const no = new Float64Array(wavelengths_nm.length);
	wavelengths_nm.forEach((wavelength_nm, i) => {
		const pair = indicesAt({ material, temperature_C, wavelength_nm });
		ne[i] = pair.ne;
		no[i] = pair.no;
	});
	const evaluator = createStackEvaluator({
		wavelengths_nm,
		indicesAt: { ne, no },
		stack: stackOfCell(cell, { polarizerAngle_deg: options.polarizerAngle_deg })
	});
	const illuminant = illuminantByName(lighting.illuminant);
	const observer = observerName(lighting.observer);
	const twisted = twistedThreshold_V(directorCell);
	const analyticThreshold_V = twisted > 0 ? twisted : splayThreshold_V(directorCell.material);
	const spectraOf = (profile: DirectorProfile) =>
		evaluator.evaluate(profile, createStackSpectra(wavelengths_nm.length));
	return {
		temperature_C,
		slices,
		directorCell,
		analyticThreshold_V,
		wavelengths_nm,
		spectraOf,
		singlePassOf: (profile) => spectraOf(profile).singlePass,
		stateAt(voltage_V, start) {
			const solution = solveDirector({ cell: directorCell, voltage_V, start, slices });
			if (!solution.convergence.converged) {
				throw new Error(
					`the director solution did not converge at ${voltage_V.toFixed(3)} V, ${temperature_C} °C`
				);
			}
			const { reflectance } = spectraOf(solution);
			const color = reflectanceToColor({ reflectance, grid: CELL_GRID, illuminant, observer });
			return { voltage_V, solution, reflectance, color };
		}
	};
}
