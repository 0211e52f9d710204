/**
 * Twisted-nematic cell geometry and the resolved cell handed to the director solver.
 *
 * Conventions: z runs across the gap from the entrance (front) substrate, z = 0, where the
 * director azimuth is 0, to the exit substrate, z = d, where it equals the total twist. Tilt is
 * measured from the substrate plane. Positive twist means the azimuth increases with z; the
 * chiral dose d/p carries the dopant's sense with the same sign convention. Strong anchoring:
 * tilt equals the pretilt at both plates.
 */
import type { LcMaterial, NematicState } from './material';
import { materialAt } from './temperature';

/** Cell geometry, independent of the fluid and the temperature. */
export interface CellGeometry {
	/** Cell gap d, µm. */
	gap_um: number;
	/** Total twist Φ from entrance to exit plate, degrees, signed; tested over 0-270°. */
	twist_deg: number;
	/** Pretilt at both plates, degrees from the substrate plane. */
	pretilt_deg: number;
	/** Gap-to-pitch ratio d/p of the chiral dopant, signed (sense); 0 without dopant. */
	gapToPitch: number;
}

/** A cell filled with a material resolved at its operating temperature. */
export interface DirectorCell extends CellGeometry {
	material: NematicState;
}

/** Problems with a geometry, as messages naming the field; empty when usable. */
export function validateGeometry(geometry: CellGeometry): string[] {
	const issues: string[] = [];
	const { gap_um, twist_deg, pretilt_deg, gapToPitch } = geometry;
	if (!(Number.isFinite(gap_um) && gap_um > 0))
		issues.push(`gap_um must be positive (got ${gap_um})`);
	if (!(Number.isFinite(twist_deg) && Math.abs(twist_deg) <= 360)) {
		issues.push(`twist_deg must lie within ±360° (got ${twist_deg})`);
	}
	if (!(Number.isFinite(pretilt_deg) && Math.abs(pretilt_deg) < 90)) {
		issues.push(`pretilt_deg must lie within ±90° (got ${pretilt_deg})`);
	}
	if (!(Number.isFinite(gapToPitch) && Math.abs(gapToPitch) <= 4)) {
		issues.push(`gapToPitch must be a finite d/p within ±4 (got ${gapToPitch})`);
	}
	return issues;
}

/** Throws one error listing every geometry problem. */
export function assertValidGeometry(geometry: CellGeometry): void {
	const issues = validateGeometry(geometry);
	if (issues.length > 0) throw new Error(`invalid cell geometry: ${issues.join('; ')}`);
}

/** Fill a geometry with a material at a temperature; throws if the fluid is isotropic there. */
export function cellAt(options: {
	geometry: CellGeometry;
	material: LcMaterial;
	temperature_C: number;
}): DirectorCell {
	assertValidGeometry(options.geometry);
	const state = materialAt({ material: options.material, temperature_C: options.temperature_C });
	if (state.phase !== 'nematic') throw new Error(state.message);
	return { ...options.geometry, material: state };
}
