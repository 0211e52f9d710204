/**
 * How one character group reads in one lit scenario: the visual angles of its height and stroke
 * at the reader's distance (foreshortened by the viewing angle), the luminance difference between
 * on and off segments, the Adrian (1989) threshold for the stroke on the background's luminance at
 * the reader's age, and the visibility level VL = ΔL/ΔL_th (field factor k = 1 inside ΔL_th;
 * the reading factor asked for is compared against VL).
 *
 * The target size fed to the threshold is the stroke (the finest detail that tells an 8 from a
 * 0); the character height is judged against the published minimums (legibility-limits.ts).
 */
import type { Scenario } from '../design/legibility-schema';
import { adrianThreshold_cdm2 } from './adrian-threshold';
import type { CharacterGroup } from './character-groups';
import { visualAngle_arcmin } from './visual-angle';

export interface GroupMetrics {
	height_arcmin: number;
	stroke_arcmin: number;
	deltaL_cdm2: number;
	threshold_cdm2: number;
	visibilityLevel: number;
}

export function groupMetrics(options: {
	group: Pick<CharacterGroup, 'height_mm' | 'stroke_mm'>;
	scenario: Pick<Scenario, 'distance_mm' | 'viewAngle_deg' | 'age_years'>;
	background_cdm2: number;
	on_cdm2: number;
	off_cdm2: number;
}): GroupMetrics {
	const { group, scenario } = options;
	const view = { distance_mm: scenario.distance_mm, viewAngle_deg: scenario.viewAngle_deg };
	const height_arcmin = visualAngle_arcmin({ size_mm: group.height_mm, ...view });
	const stroke_arcmin = visualAngle_arcmin({ size_mm: group.stroke_mm, ...view });
	const deltaL_cdm2 = Math.abs(options.off_cdm2 - options.on_cdm2);
	const threshold_cdm2 = adrianThreshold_cdm2({
		size_arcmin: Math.max(stroke_arcmin, 1e-3),
		background_cdm2: Math.max(options.background_cdm2, 1e-6),
		age_years: scenario.age_years
	});
	return {
		height_arcmin,
		stroke_arcmin,
		deltaL_cdm2,
		threshold_cdm2,
		visibilityLevel: deltaL_cdm2 / threshold_cdm2
	};
}
