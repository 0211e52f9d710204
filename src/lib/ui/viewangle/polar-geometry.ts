/**
 * Drawing helpers for the polar viewing-angle plot: the glass frame is kept (x right, y down as
 * the viewer sees the glass), so 6 o'clock is at the bottom; radius grows with the polar angle.
 */
export const PLOT_SIZE = 320;
export const CENTRE = PLOT_SIZE / 2;
export const RADIUS = 130;

export function toXY(
	polar_deg: number,
	azimuth_deg: number,
	maxPolar_deg: number
): [number, number] {
	const r = (polar_deg / maxPolar_deg) * RADIUS;
	const a = (azimuth_deg * Math.PI) / 180;
	return [CENTRE + r * Math.cos(a), CENTRE + r * Math.sin(a)];
}

/** Path of the annular sector around one map sample. */
export function sectorPath(options: {
	polar0: number;
	polar1: number;
	azimuth0: number;
	azimuth1: number;
	maxPolar_deg: number;
}): string {
	const { polar0, polar1, azimuth0, azimuth1, maxPolar_deg } = options;
	const r0 = (Math.max(polar0, 0) / maxPolar_deg) * RADIUS;
	const r1 = (polar1 / maxPolar_deg) * RADIUS;
	const p = (r: number, a: number) => {
		const t = (a * Math.PI) / 180;
		return `${(CENTRE + r * Math.cos(t)).toFixed(2)} ${(CENTRE + r * Math.sin(t)).toFixed(2)}`;
	};
	return (
		`M${p(r0, azimuth0)} L${p(r1, azimuth0)} A${r1.toFixed(2)} ${r1.toFixed(2)} 0 0 1 ${p(r1, azimuth1)} ` +
		`L${p(r0, azimuth1)} ` +
		(r0 > 0 ? `A${r0.toFixed(2)} ${r0.toFixed(2)} 0 0 0 ${p(r0, azimuth0)} ` : '') +
		'Z'
	);
}

const RAMP = [
	[0.27, 0.0, 0.33],
	[0.23, 0.32, 0.55],
	[0.13, 0.57, 0.55],
	[0.37, 0.79, 0.38],
	[0.99, 0.91, 0.14]
];

/** A perceptually ordered dark-to-light ramp, t in [0, 1]. */
export function rampColour(t: number): string {
	const x = Math.min(Math.max(Number.isFinite(t) ? t : 0, 0), 1) * (RAMP.length - 1);
	const i = Math.min(Math.floor(x), RAMP.length - 2);
	const f = x - i;
	const c = RAMP[i].map((v, k) => Math.round(255 * (v + f * (RAMP[i + 1][k] - v))));
	return `rgb(${c[0]},${c[1]},${c[2]})`;
}
