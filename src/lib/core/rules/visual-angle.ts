/**
 * Visual angle of an object of size h seen square-on from distance D: α = 2·atan(h / 2D)
 * (plane trigonometry; the same relation tabulated for character heights in NUREG-0700 and
 * ISO 9241-3, which set 16′ as the minimum height of characters). Angles in arcminutes
 * (1° = 60′), lengths in millimetres.
 */
const ARCMIN_PER_RAD = (180 * 60) / Math.PI;

export function visualAngle_arcmin(options: { size_mm: number; distance_mm: number }): number {
	return 2 * Math.atan(options.size_mm / (2 * options.distance_mm)) * ARCMIN_PER_RAD;
}

/** The size that subtends `angle_arcmin` at `distance_mm` (inverse of `visualAngle_arcmin`). */
export function sizeForVisualAngle_mm(options: { angle_arcmin: number; distance_mm: number }) {
	return 2 * options.distance_mm * Math.tan(options.angle_arcmin / ARCMIN_PER_RAD / 2);
}
