/**
 * Parallel-plate capacitance of a segment pixel: C = ε0·εr·A/d.
 *
 * Model: the segment electrode and the common facing it form a plate capacitor across the cell
 * gap d filled with the fluid (relative permittivity εr); fringe fields and the thin alignment
 * layers are neglected (they matter only for electrodes a few gaps wide). ε0 is the CODATA 2018
 * value. Areas in mm², gaps in µm, capacitances in farads (and pF at the edge).
 */
import { M_PER_UM, VACUUM_PERMITTIVITY_F_PER_M } from '../lc/constants';

export const M2_PER_MM2 = 1e-6;
export const PF_PER_F = 1e12;

/** Capacitance in farads of a plate pair of `area_mm2` across `gap_um` of a medium `permittivity`. */
export function parallelPlateCapacitance_F(options: {
	area_mm2: number;
	gap_um: number;
	permittivity: number;
}): number {
	const { area_mm2, gap_um, permittivity } = options;
	if (!(gap_um > 0)) throw new Error(`gap_um: expected a gap above 0 µm (got ${gap_um})`);
	if (!(permittivity >= 1))
		throw new Error(
			`permittivity: expected a relative permittivity of 1 or more (got ${permittivity})`
		);
	const area = Math.max(0, area_mm2);
	return (VACUUM_PERMITTIVITY_F_PER_M * permittivity * area * M2_PER_MM2) / (gap_um * M_PER_UM);
}

/** Capacitance per unit area in pF/mm², the figure glass makers quote. */
export function capacitancePerArea_pF_per_mm2(options: {
	gap_um: number;
	permittivity: number;
}): number {
	return parallelPlateCapacitance_F({ ...options, area_mm2: 1 }) * PF_PER_F;
}
