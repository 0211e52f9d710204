/**
 * Area and capacitance of every electrode: the filled area of its outline minus its holes, with
 * curves flattened at 1 µm (geometry/polygon.ts), times ε0·εr/d for the off and the on state.
 *
 * Self-crossing or degenerate outlines are not this module's business (the rule check names
 * them); their area is taken as it comes out of the shoelace sum, never below zero.
 */
import type { Design, Electrode } from '../design/schema';
import { shapeArea } from '../geometry/polygon';
import { parallelPlateCapacitance_F } from './capacitance';
import type { PixelPermittivity } from './fluid-permittivity';

/** Flattening tolerance of curved outlines for the area, µm. */
export const AREA_TOLERANCE_um = 1;

export interface ElectrodeLoad {
	id: string;
	name: string;
	common: string | null;
	line: string | null;
	area_mm2: number;
	off_F: number;
	on_F: number;
}

/** Areas by electrode record: records are immutable, so an edit brings a new record. */
const AREA_CACHE = new WeakMap<Electrode, number>();

export function electrodeArea_mm2(electrode: Electrode): number {
	const cached = AREA_CACHE.get(electrode);
	if (cached !== undefined) return cached;
	const raw = shapeArea(electrode, { tolerance_um: AREA_TOLERANCE_um });
	const area = Number.isFinite(raw) ? Math.max(0, raw) : 0;
	AREA_CACHE.set(electrode, area);
	return area;
}

export function electrodeLoads(options: {
	design: Design;
	permittivity: PixelPermittivity;
	/** Areas already computed (they do not change with temperature or frame rate). */
	areas_mm2?: readonly number[];
}): ElectrodeLoad[] {
	const { design, permittivity } = options;
	const gap_um = design.cell.gap_um;
	const off_F_per_mm2 = parallelPlateCapacitance_F({
		area_mm2: 1,
		gap_um,
		permittivity: permittivity.off
	});
	const on_F_per_mm2 = parallelPlateCapacitance_F({
		area_mm2: 1,
		gap_um,
		permittivity: permittivity.on
	});
	return design.electrodes.map((e, i) => {
		const area_mm2 = options.areas_mm2?.[i] ?? electrodeArea_mm2(e);
		return {
			id: e.id,
			name: e.name,
			common: e.common,
			line: e.line,
			area_mm2,
			off_F: off_F_per_mm2 * area_mm2,
			on_F: on_F_per_mm2 * area_mm2
		};
	});
}
