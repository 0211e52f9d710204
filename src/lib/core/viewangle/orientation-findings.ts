/**
 * The instant part of the viewing-angle check, run with every design analysis: do the rubbing
 * directions agree with the cell's twist, and how far does a segment's shadow move at the
 * checked reading angle compared with the narrowest stroke (parallax.ts).
 */
import type { Design } from '../design/schema';
import { finding, type Finding } from '../findings/finding';
import { PARALLAX_CHECK_POLAR_deg, PARALLAX_STROKE_FRACTION, shadowOffset_mm } from './parallax';
import { matchingRearRubbing, rubbingTwistMismatch_deg, twistFromRubbing } from './rubbing-twist';
import { narrowestSegment } from './stroke-width';

/** Rubbing directions are set to a degree or so on the glass [common practice]. */
export const RUBBING_TOLERANCE_deg = 1;

export interface ParallaxCheck {
	rearGlass_mm: number;
	polar_deg: number;
	offset_mm: number;
	narrowest: { id: string; width_mm: number } | null;
}

export function parallaxCheck(design: Design): ParallaxCheck {
	const rearGlass_mm = design.orientation.rearGlass_mm;
	const polar_deg = PARALLAX_CHECK_POLAR_deg;
	return {
		rearGlass_mm,
		polar_deg,
		offset_mm: shadowOffset_mm({ rearGlass_mm, polar_deg }),
		narrowest: narrowestSegment(design)
	};
}

export function orientationFindings(design: Design): Finding[] {
	const findings: Finding[] = [];
	const { orientation, cell } = design;
	if (rubbingTwistMismatch_deg(orientation, cell.twist_deg) > RUBBING_TOLERANCE_deg) {
		const rear = matchingRearRubbing(orientation, cell.twist_deg);
		findings.push(
			finding({
				code: 'viewangle.rubbing-twist-mismatch',
				severity: 'warn',
				message:
					`The rubbing directions give a ${twistFromRubbing(orientation).toFixed(0)}° ${orientation.twistSense} twist, ` +
					`but the cell is set to ${cell.twist_deg}°: the glass would not build the modelled cell.`,
				fix: `Rub the rear plate toward ${rear.toFixed(0)}°, or change the twist or its sense.`
			})
		);
	}
	const parallax = parallaxCheck(design);
	const limit_mm = parallax.narrowest ? PARALLAX_STROKE_FRACTION * parallax.narrowest.width_mm : 0;
	if (parallax.narrowest && parallax.offset_mm > limit_mm) {
		findings.push(
			finding({
				code: 'viewangle.parallax-shadow',
				severity: 'warn',
				message:
					`At ${parallax.polar_deg}° off the normal a segment's shadow lands ${parallax.offset_mm.toFixed(2)} mm beside it ` +
					`(rear glass ${parallax.rearGlass_mm} mm), more than half the narrowest stroke ` +
					`(${parallax.narrowest.width_mm.toFixed(2)} mm): strokes show a grey double edge off-axis.`,
				fix: 'Use thinner rear glass (0.4–0.55 mm) or wider strokes.',
				electrodes: [parallax.narrowest.id]
			})
		);
	}
	return findings;
}
