/**
 * The twist the rubbing directions give, against the cell's twist. For a splay-free twisted cell
 * the director leaves the front plate along its rubbing direction α_f and reaches the rear plate
 * at α_f + σ·Φ (σ = +1 right-handed, −1 left-handed), where it rises away from the rear plate
 * along α_f + σ·Φ + 180°, the rear rubbing direction. So σ·Φ = α_r − α_f − 180° (mod 360°), and
 * the sense picks which way round: right-handed Φ ∈ (0°, 360°], left-handed the complement.
 */
import type { Orientation } from '../design/orientation-schema';

const wrap360 = (deg: number) => ((deg % 360) + 360) % 360;

/** Twist magnitude the rubbing directions and sense imply, deg in [0, 360). */
export function twistFromRubbing(orientation: Orientation): number {
	const turn = wrap360(orientation.rearRubbing_deg - orientation.frontRubbing_deg - 180);
	return orientation.twistSense === 'right-handed' ? turn : wrap360(360 - turn);
}

/** The rear rubbing direction that matches a twist, deg in [0, 360). */
export function matchingRearRubbing(orientation: Orientation, twist_deg: number): number {
	const sign = orientation.twistSense === 'right-handed' ? 1 : -1;
	return wrap360(orientation.frontRubbing_deg + sign * twist_deg + 180);
}

/** Angle between the rubbing-implied and the cell's twist, deg (0 when they agree). */
export function rubbingTwistMismatch_deg(orientation: Orientation, twist_deg: number): number {
	const d = wrap360(twistFromRubbing(orientation) - twist_deg);
	return Math.min(d, 360 - d);
}
