/**
 * The viewing-angle report of a design: the contrast map, the best viewing direction, the
 * parallax shadow at a few angles, and findings — the same for the app's panel, `sunglyph
 * view-angle` and its JSON.
 */
import type { Design } from '../design/schema';
import { finding, type Finding } from '../findings/finding';
import { CONTRAST_MINIMUM } from '../cell/analyze-cell';
import { contrastMap, type ContrastMap, type ContrastMapOptions } from './contrast-map';
import { orientationFindings, parallaxCheck, type ParallaxCheck } from './orientation-findings';
import { shadowOffset_mm } from './parallax';
import { twistFromRubbing } from './rubbing-twist';

export const NARROW_CONE_deg = 30;
export const SHADOW_TABLE_deg = [15, 30, 45, 60] as const;

export interface ViewAngleReport {
	map: ContrastMap;
	twistFromRubbing_deg: number;
	parallax: ParallaxCheck & { table: { polar_deg: number; offset_mm: number }[] };
	findings: Finding[];
}

function clockName(hour: number): string {
	return `${hour} o'clock`;
}

export function viewAngleReport(options: ContrastMapOptions): ViewAngleReport {
	const { design } = options;
	const map = contrastMap(options);
	const findings = [...orientationFindings(design), ...mapFindings(design, map)];
	const parallax = parallaxCheck(design);
	return {
		map,
		twistFromRubbing_deg: twistFromRubbing(design.orientation),
		parallax: {
			...parallax,
			table: SHADOW_TABLE_deg.map((polar_deg) => ({
				polar_deg,
				offset_mm: shadowOffset_mm({ rearGlass_mm: design.orientation.rearGlass_mm, polar_deg })
			}))
		},
		findings
	};
}

/** Contrast along one azimuth (nearest sampled), from the normal outward. */
function columnNear(map: ContrastMap, azimuth_deg: number): number[] {
	let best = 0;
	map.azimuth_deg.forEach((a, i) => {
		const d = Math.abs(((a - azimuth_deg + 540) % 360) - 180);
		const e = Math.abs(((map.azimuth_deg[best] - azimuth_deg + 540) % 360) - 180);
		if (d < e) best = i;
	});
	return map.contrast.map((row) => row[best]);
}

function mapFindings(design: Design, map: ContrastMap): Finding[] {
	const findings: Finding[] = [];
	const { best } = map;
	findings.push(
		finding({
			code: 'viewangle.best-direction',
			severity: 'pass',
			message:
				`Best seen from ${clockName(best.clock)} (azimuth ${best.azimuth_deg.toFixed(0)}°), ` +
				`typical contrast ${best.typicalContrast.toFixed(1)}:1 from 10° to 50° off the normal.`
		})
	);
	const column = columnNear(map, best.azimuth_deg);
	const lowAt = map.polar_deg.find((p, i) => p <= NARROW_CONE_deg && column[i] < CONTRAST_MINIMUM);
	if (lowAt !== undefined) {
		findings.push(
			finding({
				code: 'viewangle.narrow-cone',
				severity: 'warn',
				message: `Even from the best direction the contrast drops below ${CONTRAST_MINIMUM}:1 at ${lowAt}° off the normal.`,
				fix: 'Raise the drive, use an anti-reflection front, or a fluid and gap with a flatter viewing cone.'
			})
		);
	}
	let inverted: { polar: number; azimuth: number } | null = null;
	map.contrast.forEach((row, p) =>
		row.forEach((c, a) => {
			if (c < 1 && (!inverted || map.polar_deg[p] < inverted.polar))
				inverted = { polar: map.polar_deg[p], azimuth: map.azimuth_deg[a] };
		})
	);
	if (inverted) {
		const { polar, azimuth } = inverted as { polar: number; azimuth: number };
		findings.push(
			finding({
				code: 'viewangle.contrast-inversion',
				severity: 'warn',
				message:
					`From ${polar}° off the normal toward ${azimuth}° on segments look lighter than off ones: ` +
					`the readout inverts there.`,
				fix: `Turn the rubbing directions so the ${design.cell.mode === 'positive' ? 'inverting' : 'weak'} side faces away from the reader.`
			})
		);
	}
	return findings;
}

/** A failed model as a finding, for callers that must not crash. */
export function viewAngleFailure(message: string): Finding {
	return finding({
		code: 'viewangle.model-failed',
		severity: 'fail',
		message,
		fix: "Check the cell's fluid, gap, orientation and temperature range."
	});
}
