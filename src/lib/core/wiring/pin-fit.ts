/**
 * Whether the pins fit along the chosen edge: n pads at the pitch need n × pitch of edge
 * (pin-layout.ts). A row longer than the edge cannot be made; the fix is a finer pitch, another
 * edge or fewer lines (more commons).
 */
import type { Design } from '../design/schema';
import { finding, type Finding } from '../findings/finding';
import { pinLayout } from './pin-layout';

export function pinFitFindings(design: Design): Finding[] {
	const layout = pinLayout(design);
	if (layout.fits) return [];
	const { edge, pitch_mm } = design.pinout;
	return [
		finding({
			code: 'wiring.pins-do-not-fit',
			severity: 'fail',
			message:
				`${layout.pins.length} pins at ${pitch_mm} mm pitch need ${layout.rowLength_mm.toFixed(2)} mm, ` +
				`but the ${edge} edge is ${layout.edgeLength_mm.toFixed(2)} mm long.`,
			fix: 'Choose a finer pitch or a longer edge, or use more commons so fewer lines are needed.'
		})
	];
}
