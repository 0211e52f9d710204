/**
 * The cell's look from one direction, for callers outside the viewing-angle map (the legibility
 * scenarios call it for their viewing angle when it is off the normal). Defaults: the design's
 * drive at room temperature (clamped to the operating range), on-segment voltage.
 */
import type { Design } from '../design/schema';
import { rmsVoltages } from '../drive/rms-drive';
import { ROOM_C } from '../cell/analyze-cell';
import { createCellView, type SeenColor } from './cell-view';

export type SegmentState = 'background' | 'off' | 'on';

export function driveVoltage(design: Design, state: SegmentState): number {
	if (state === 'background') return 0;
	const rms = rmsVoltages({
		commons: design.drive.commons,
		biasDivisor: design.drive.biasDivisor,
		amplitude_V: design.drive.amplitude_V
	});
	return state === 'on' ? rms.on_V : rms.off_V;
}

export function roomTemperature(design: Design): number {
	const { min_C, max_C } = design.drive.temperature;
	return Math.min(Math.max(ROOM_C, min_C), max_C);
}

export function cellReflectanceAt(options: {
	design: Design;
	polar_deg: number;
	azimuth_deg: number;
	/** Which segment state; default 'on'. Ignored when voltage_V is given. */
	state?: SegmentState;
	voltage_V?: number;
	temperature_C?: number;
}): SeenColor & { voltage_V: number; temperature_C: number } {
	const { design, polar_deg, azimuth_deg } = options;
	const temperature_C = options.temperature_C ?? roomTemperature(design);
	const voltage_V = options.voltage_V ?? driveVoltage(design, options.state ?? 'on');
	const view = createCellView({ design, temperature_C });
	const seen = view.seen(view.stateAt(voltage_V), { polar_deg, azimuth_deg });
	return { ...seen, voltage_V, temperature_C };
}
