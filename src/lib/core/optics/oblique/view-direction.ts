/**
 * A viewing direction and the plane-wave geometry it fixes, for the oblique-incidence model.
 *
 * Frame (the display frame): x to the right, y downwards as the viewer sees the glass, z into
 * the glass (forward propagation) — right-handed, and the same x, y as the design's glass
 * coordinates. Azimuths run from +x toward +y (clockwise as seen by the viewer: 0° is 3 o'clock,
 * 90° is 6 o'clock). The viewer sits at polar angle θ from the normal, at azimuth φ.
 *
 * The light that reaches the viewer after a mirror-like reflection enters along the mirrored
 * path: both legs share the tangential wave vector k0·β with β = sin θ·(cos φ, sin φ) (Snell:
 * conserved across every plane interface); the incoming leg runs toward +z, the outgoing one
 * toward −z. ŝ = (−sin φ, cos φ) is the s direction (normal to the plane of incidence), β̂ the
 * in-plane direction of β.
 */

export interface ViewDirection {
	/** Angle from the glass normal, deg, 0 ≤ θ < 90. */
	polar_deg: number;
	/** Azimuth toward the viewer, deg clockwise from 3 o'clock as the viewer sees the glass. */
	azimuth_deg: number;
}

export interface WaveGeometry {
	/** Tangential wave vector / k0 (dimensionless), x and y. */
	betaX: number;
	betaY: number;
	/** |β|² = sin²θ in air. */
	betaSq: number;
	/** Unit vectors: ŝ (normal to the plane of incidence) and β̂ (in it), x and y. */
	sX: number;
	sY: number;
	pX: number;
	pY: number;
}

const RAD_PER_DEG = Math.PI / 180;

export function assertViewDirection({ polar_deg, azimuth_deg }: ViewDirection): void {
	if (!(polar_deg >= 0 && polar_deg < 90))
		throw new RangeError(`polar_deg must lie in [0, 90), got ${polar_deg}`);
	if (!Number.isFinite(azimuth_deg))
		throw new RangeError(`azimuth_deg must be finite, got ${azimuth_deg}`);
}

export function waveGeometry(direction: ViewDirection): WaveGeometry {
	assertViewDirection(direction);
	const sinTheta = Math.sin(direction.polar_deg * RAD_PER_DEG);
	const c = Math.cos(direction.azimuth_deg * RAD_PER_DEG);
	const s = Math.sin(direction.azimuth_deg * RAD_PER_DEG);
	return {
		betaX: sinTheta * c,
		betaY: sinTheta * s,
		betaSq: sinTheta * sinTheta,
		sX: -s,
		sY: c,
		pX: c,
		pY: s
	};
}

/** Clock reading of an azimuth (0° = 3 o'clock, clockwise), 1…12, rounded to the hour. */
export function clockHour(azimuth_deg: number): number {
	const hours = Math.round((((azimuth_deg / 30 + 3) % 12) + 12) % 12);
	return hours === 0 ? 12 : hours;
}
