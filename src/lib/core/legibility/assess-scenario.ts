/**
 * The verdict of each character group in one scenario, with the binding reason and the fix:
 * - too small for the distance: height under 16′ (not readable) or under 20′ (marginal);
 * - contrast: on against off segments under 3:1 (not readable) or 6:1 (marginal), called
 *   "washed out by glare" when the front-surface veil is what pulls it under the limit;
 * - below threshold: VL under the floor (not readable) or the reading factor (marginal), "in the
 *   dark" when the background is dimmer than 10 cd/m² [common practice: mesopic reading begins
 *   to limit small numerals near there];
 * - ghosts visible: off segments more than 1 ΔE00 from the background (marginal).
 * Minimums and their sources: legibility-limits.ts.
 */
import type { LegibilitySettings, Scenario } from '../design/legibility-schema';
import { deltaE2000 } from '../color/delta-e-2000';
import type { CharacterGroup } from './character-groups';
import { groupMetrics, type GroupMetrics } from './group-metrics';
import {
	CHARACTER_HEIGHT_MIN,
	CHARACTER_HEIGHT_PREFERRED,
	CONTRAST_RATIO_MIN,
	CONTRAST_RATIO_RECOMMENDED,
	GHOST_DELTA_E00
} from './legibility-limits';
import type { ScenarioLight } from './scenario-light';
import { sizeForAngle_mm } from './visual-angle';

export type Verdict = 'readable' | 'marginal' | 'not readable';
export const DARK_BACKGROUND_cdm2 = 10;

export interface Reason {
	code: string;
	severity: 'warn' | 'fail';
	text: string;
	fix: string;
}

export interface GroupAssessment extends GroupMetrics {
	groupId: string;
	groupName: string;
	members: string[];
	verdict: Verdict;
	reasons: Reason[];
}

export interface ScenarioAssessment {
	scenario: Scenario;
	light: ScenarioLight;
	/** On against off segments, veil included. */
	contrastRatio: number;
	/** Luminance contrast |L_off − L_on| / the brighter of the two. */
	luminanceContrast: number;
	contrastRatioWithoutVeil: number;
	deltaE00On: number;
	deltaE00Ghost: number;
	groups: GroupAssessment[];
	verdict: Verdict;
}

const ratio = (a: number, b: number) => {
	const hi = Math.max(a, b);
	const lo = Math.min(a, b);
	return lo > 0 ? hi / lo : Infinity;
};

export function verdictOf(reasons: readonly Reason[]): Verdict {
	if (reasons.some((r) => r.severity === 'fail')) return 'not readable';
	return reasons.length > 0 ? 'marginal' : 'readable';
}

function sizeReason(m: GroupMetrics, s: Scenario, group: CharacterGroup): Reason | null {
	if (m.height_arcmin >= CHARACTER_HEIGHT_PREFERRED.value) return null;
	const need = CHARACTER_HEIGHT_MIN.value;
	const want = CHARACTER_HEIGHT_PREFERRED.value;
	const cos = Math.cos((s.viewAngle_deg * Math.PI) / 180);
	const height = (angle: number) =>
		sizeForAngle_mm({ angle_arcmin: angle, distance_mm: s.distance_mm }) / cos;
	const fix = `Digits of at least ${height(need).toFixed(1)} mm (${want}′ needs ${height(want).toFixed(1)} mm) at ${s.distance_mm} mm, or a shorter reading distance.`;
	return m.height_arcmin < need
		? {
				code: 'legibility.too-small',
				severity: 'fail',
				text: `too small for the distance: ${group.height_mm} mm subtends ${m.height_arcmin.toFixed(1)}′ (minimum ${need}′, ${CHARACTER_HEIGHT_MIN.source})`,
				fix
			}
		: {
				code: 'legibility.small',
				severity: 'warn',
				text: `small for the distance: ${m.height_arcmin.toFixed(1)}′ (preferred ${want}–22′, ${CHARACTER_HEIGHT_PREFERRED.source})`,
				fix
			};
}

function contrastReason(cr: number, crBare: number): Reason | null {
	if (cr >= CONTRAST_RATIO_RECOMMENDED.value) return null;
	const fail = cr < CONTRAST_RATIO_MIN.value;
	const glare = fail
		? crBare >= CONTRAST_RATIO_MIN.value
		: crBare >= CONTRAST_RATIO_RECOMMENDED.value;
	const limit = fail ? CONTRAST_RATIO_MIN : CONTRAST_RATIO_RECOMMENDED;
	const text = `${glare ? (fail ? 'washed out by glare' : 'glare lowers the contrast') : 'weak contrast'}: ${cr.toFixed(2)}:1 (${crBare.toFixed(1)}:1 without the front-surface veil; ${fail ? 'minimum' : 'recommended'} ${limit.value}:1, ${limit.source})`;
	if (glare)
		return {
			code: fail ? 'legibility.washed-out' : 'legibility.glare',
			severity: fail ? 'fail' : 'warn',
			text,
			fix: 'An anti-reflection front (R_s ≈ 0.5–1 %), a hood, or tilting the glass away from the bright surroundings.'
		};
	return {
		code: fail ? 'legibility.low-contrast' : 'legibility.contrast-below-recommended',
		severity: fail ? 'fail' : 'warn',
		text,
		fix: 'A stronger drive or a steeper fluid (check the operating window), or better polarizers.'
	};
}

function thresholdReason(
	m: GroupMetrics,
	bg_cdm2: number,
	settings: LegibilitySettings
): Reason | null {
	if (m.visibilityLevel >= settings.readableVL) return null;
	const dark = bg_cdm2 < DARK_BACKGROUND_cdm2;
	const fail = m.visibilityLevel < settings.marginalVL;
	return {
		code: fail ? 'legibility.below-threshold' : 'legibility.low-visibility',
		severity: fail ? 'fail' : 'warn',
		text: `${fail ? 'below threshold' : 'near threshold'}${dark ? ' in the dark' : ''}: VL ${m.visibilityLevel.toFixed(1)} (ΔL ${m.deltaL_cdm2.toPrecision(3)} cd/m², ΔL_th ${m.threshold_cdm2.toPrecision(3)} cd/m², Adrian 1989; reading asks VL ≥ ${settings.readableVL})`,
		fix: dark
			? 'A front light or a backlight, or more ambient light on the glass.'
			: 'A wider stroke, a stronger drive, or an anti-reflection front.'
	};
}

export function assessScenario(options: {
	scenario: Scenario;
	light: ScenarioLight;
	groups: readonly CharacterGroup[];
	settings: LegibilitySettings;
}): ScenarioAssessment {
	const { scenario: s, light, settings } = options;
	const bg = light.background.luminance_cdm2;
	const off = light.off.luminance_cdm2;
	const on = light.on.luminance_cdm2;
	const contrastRatio = ratio(off, on);
	const crBare = ratio(off - light.veil_cdm2, on - light.veil_cdm2);
	const deltaE00Ghost = deltaE2000(light.background.lab, light.off.lab);
	const ghost: Reason | null =
		deltaE00Ghost > GHOST_DELTA_E00.value
			? {
					code: 'legibility.ghosts-visible',
					severity: 'warn',
					text: `ghosts visible: off segments differ from the background by ΔE00 ${deltaE00Ghost.toFixed(1)} (limit ${GHOST_DELTA_E00.value}, ${GHOST_DELTA_E00.source})`,
					fix: 'Lower the drive amplitude, a steeper fluid, or fewer commons.'
				}
			: null;
	const groups = options.groups.map((group): GroupAssessment => {
		const m = groupMetrics({ group, scenario: s, background_cdm2: bg, on_cdm2: on, off_cdm2: off });
		const reasons = [
			sizeReason(m, s, group),
			contrastReason(contrastRatio, crBare),
			thresholdReason(m, bg, settings),
			ghost
		]
			.filter((r): r is Reason => r !== null)
			.sort((a, b) => (a.severity === b.severity ? 0 : a.severity === 'fail' ? -1 : 1));
		return {
			...m,
			groupId: group.id,
			groupName: group.name,
			members: group.members,
			verdict: verdictOf(reasons),
			reasons
		};
	});
	const rank = { readable: 0, marginal: 1, 'not readable': 2 } as const;
	const verdict = groups.reduce<Verdict>(
		(worst, g) => (rank[g.verdict] > rank[worst] ? g.verdict : worst),
		'readable'
	);
	return {
		scenario: s,
		light,
		contrastRatio,
		luminanceContrast: off > 0 ? Math.abs(off - on) / Math.max(off, on) : 0,
		contrastRatioWithoutVeil: crBare,
		deltaE00On: deltaE2000(light.background.lab, light.on.lab),
		deltaE00Ghost,
		groups,
		verdict
	};
}
