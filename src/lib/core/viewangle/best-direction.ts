/**
 * The best viewing direction: the azimuth whose contrast stays highest off the normal, scored
 * by the mean of ln(contrast) over the polar angles from 10° to 50° (the range a reader's eye
 * actually moves through at a panel or a hand-held meter [common practice]). The best sampled
 * azimuth is refined by a parabola through it and its two neighbours, then read as a clock hour
 * (3 o'clock = 0°, 6 o'clock = 90°, clockwise as the viewer sees the glass).
 */
import { clockHour } from '../optics/oblique/view-direction';

export const SCORE_POLAR_MIN_deg = 10;
export const SCORE_POLAR_MAX_deg = 50;

export interface BestDirection {
	azimuth_deg: number;
	clock: number;
	/** exp(mean ln contrast) over the scored polar range at the best sampled azimuth. */
	typicalContrast: number;
}

export function bestDirection(options: {
	polar_deg: readonly number[];
	azimuth_deg: readonly number[];
	/** contrast[polarIndex][azimuthIndex] */
	contrast: readonly (readonly number[])[];
}): BestDirection {
	const { polar_deg, azimuth_deg, contrast } = options;
	let rows = polar_deg
		.map((p, i) => (p >= SCORE_POLAR_MIN_deg && p <= SCORE_POLAR_MAX_deg ? i : -1))
		.filter((i) => i >= 0);
	if (rows.length === 0) rows = polar_deg.map((_, i) => i).filter((i) => polar_deg[i] > 0);
	if (rows.length === 0) rows = [0];
	const score = azimuth_deg.map(
		(_, a) =>
			rows.reduce((sum, r) => sum + Math.log(Math.max(contrast[r][a], 1e-9)), 0) / rows.length
	);
	let best = 0;
	score.forEach((s, a) => {
		if (s > score[best]) best = a;
	});
	const n = azimuth_deg.length;
	let azimuth = azimuth_deg[best];
	if (n >= 3) {
		const step = 360 / n;
		const l = score[(best - 1 + n) % n],
			c = score[best],
			r = score[(best + 1) % n];
		const curvature = l - 2 * c + r;
		if (curvature < 0) azimuth += (0.5 * (l - r) * step) / curvature;
	}
	azimuth = ((azimuth % 360) + 360) % 360;
	return {
		azimuth_deg: azimuth,
		clock: clockHour(azimuth),
		typicalContrast: Math.exp(score[best])
	};
}
