/**
 * Visual angle of a detail of size h seen at distance D: α = 2·atan(h / 2D), in arcminutes
 * (exact form; for small angles α ≈ h/D rad, the form NUREG-0700 writes as
 * height = 6.283·D·MA/21600). The inverse gives the height a wanted angle needs.
 *
 * Viewing off the normal by θ foreshortens a detail lying in the tilt plane to h·cos θ; we take
 * the worst case, the tilt in the plane of the character's height (a wall display seen from
 * below, a meter seen from above). The distance is along the line of sight.
 */
export const ARCMIN_PER_RAD = (180 * 60) / Math.PI;

/** Visual angle (arcmin) of a detail of `size_mm` at `distance_mm`, seen `viewAngle_deg` off normal. */
export function visualAngle_arcmin(options: {
	size_mm: number;
	distance_mm: number;
	viewAngle_deg?: number;
}): number {
	const { size_mm, distance_mm } = options;
	if (!(size_mm >= 0) || !(distance_mm > 0))
		throw new RangeError(`expected size ≥ 0 and distance > 0 mm, got ${size_mm}, ${distance_mm}`);
	const projected_mm = size_mm * Math.cos(((options.viewAngle_deg ?? 0) * Math.PI) / 180);
	return 2 * Math.atan(projected_mm / (2 * distance_mm)) * ARCMIN_PER_RAD;
}

/** Height (mm) that subtends `angle_arcmin` at `distance_mm`, seen face on. */
export function sizeForAngle_mm(options: { angle_arcmin: number; distance_mm: number }): number {
	return 2 * options.distance_mm * Math.tan(options.angle_arcmin / ARCMIN_PER_RAD / 2);
}
