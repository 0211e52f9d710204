/**
 * One design's cell seen from any direction at one temperature: director profiles from the
 * constant-voltage statics (../cell/cell-optics.ts), oriented by the design's rubbing directions
 * and twist sense, fed to the oblique-incidence stack (../optics/oblique/), and turned into
 * colour under the design's illuminant. Light: a uniformly bright surround (the depolarised part
 * of the reflector sees the hemisphere-averaged light; see oblique-stack.ts).
 *
 * Slabs: the solver's nodes, each interval cut in two (midpoint-retarder slabs; at normal
 * incidence within ≈ 1e-4 of the twisted-slab normal-incidence model used for the cell report).
 */
import type { Design } from '../design/schema';
import { createCellOptics, observerName, CELL_GRID } from '../cell/cell-optics';
import type { DirectorProfile } from '../lc/profile';
import { indicesAt } from '../lc/temperature';
import { materialOfCell, stackOfCell } from '../cell/resolve-cell';
import { reflectanceToColor, type ReflectanceColor } from '../color/reflectance-to-color';
import { illuminantByName } from '../color/illuminant-by-name';
import {
	createObliqueStackEvaluator,
	type IncidentLight,
	type PreparedState
} from '../optics/oblique/oblique-stack';
import { orientedSlabs } from '../optics/oblique/oriented-slabs';
import type { ViewDirection } from '../optics/oblique/view-direction';

export const VIEW_SUBSLICES = 1;

export interface ViewState {
	voltage_V: number;
	prepared: PreparedState;
	profile: DirectorProfile;
}

export interface SeenColor extends ReflectanceColor {
	reflectance: Float64Array;
	/** The front surface's reflectance R_s(θ) in this direction, 0…1 (part of `reflectance`). */
	surface: number;
}

export interface CellView {
	temperature_C: number;
	stateAt(voltage_V: number, start?: DirectorProfile): ViewState;
	/** A state from a director profile solved elsewhere (same cell, temperature and slices). */
	stateOf(voltage_V: number, profile: DirectorProfile): ViewState;
	seen(state: ViewState, direction: ViewDirection): SeenColor;
}

export function twistSign(design: Pick<Design, 'orientation'>): 1 | -1 {
	return design.orientation.twistSense === 'left-handed' ? -1 : 1;
}

export function createCellView(options: {
	design: Design;
	temperature_C: number;
	incidentLight?: IncidentLight;
}): CellView {
	const { design, temperature_C } = options;
	const { cell, lighting, orientation } = design;
	const optics = createCellOptics({ cell, lighting, temperature_C });
	const material = materialOfCell(cell);
	const grid = optics.wavelengths_nm;
	const ne = new Float64Array(grid.length);
	const no = new Float64Array(grid.length);
	grid.forEach((wavelength_nm, i) => {
		const pair = indicesAt({ material, temperature_C, wavelength_nm });
		ne[i] = pair.ne;
		no[i] = pair.no;
	});
	const sense = twistSign(design);
	const entrance_deg = orientation.frontRubbing_deg;
	const spec = stackOfCell(cell);
	const evaluator = createObliqueStackEvaluator({
		wavelengths_nm: grid,
		indices: { ne, no },
		stack: {
			front: {
				polarizer: spec.front.polarizer,
				axis_deg: entrance_deg + sense * spec.front.axis_deg
			},
			rear: { polarizer: spec.rear.polarizer, axis_deg: entrance_deg + sense * spec.rear.axis_deg },
			reflector: spec.reflector,
			frontSurfaceReflectance: spec.frontSurfaceReflectance
		},
		incidentLight: options.incidentLight ?? 'hemisphere'
	});
	const illuminant = illuminantByName(lighting.illuminant);
	const observer = observerName(lighting.observer);
	return {
		temperature_C,
		stateAt(voltage_V, start) {
			return this.stateOf(voltage_V, optics.stateAt(voltage_V, start).solution);
		},
		stateOf(voltage_V, profile) {
			const slabs = orientedSlabs({ profile, entrance_deg, sense, subslices: VIEW_SUBSLICES });
			return { voltage_V, profile, prepared: evaluator.prepare(slabs) };
		},
		seen(state, direction) {
			const { reflectance, surface } = evaluator.at(state.prepared, direction);
			const color = reflectanceToColor({ reflectance, grid: CELL_GRID, illuminant, observer });
			return { ...color, reflectance, surface };
		}
	};
}
