/**
 * The drive check of a design: RMS levels, the Alt–Pleshko comparison, the operating window over
 * temperature, the pin map and the frame rate, with findings in plain language.
 */
import type { Design, DriveSettings, Thresholds } from '../design/schema';
import {
	altPleshkoLimit,
	isStaticDrive,
	maxCommonsForSteepness,
	optimalBiasDivisor,
	rmsVoltages
} from './rms-drive';
import { operatingWindow, type OperatingWindow } from './operating-window';
import { thresholdsOverRange, type ThresholdPoint } from './threshold-at-temperature';
import { windowFindings } from './drive-verdict';
import { finding, overallSeverity, type Finding, type Severity } from '../findings/finding';
import { pinMap, type PinMap } from './pin-map';
import { pinFitFindings } from '../wiring/pin-fit';

/** Frame rates outside this range flicker or waste power [common practice: 30–200 Hz]. */
export const FRAME_RATE_RANGE_HZ = { min: 30, max: 200 } as const;

export interface DriveReport {
	commons: number;
	biasDivisor: number;
	amplitude_V: number;
	isStatic: boolean;
	onRms_V: number;
	offRms_V: number;
	/** V_on/V_off; null for static drive, where it is unbounded. */
	selectionRatio: number | null;
	altPleshkoLimit: number | null;
	optimalBias: number | null;
	/** Largest V90/V10 over the checked temperatures. */
	steepness: number;
	maxCommonsForSteepness: number | null;
	window: OperatingWindow;
	findings: Finding[];
	severity: Severity;
}

const finiteOrNull = (v: number) => (Number.isFinite(v) ? v : null);

export function analyzeDrive(options: {
	drive: DriveSettings;
	/** Either the design's thresholds (reference value and coefficient) or computed points. */
	thresholds: Thresholds | readonly ThresholdPoint[];
}): DriveReport {
	const { drive } = options;
	const points = Array.isArray(options.thresholds)
		? (options.thresholds as readonly ThresholdPoint[])
		: thresholdsOverRange(options.thresholds as Thresholds, drive.temperature);
	const levels = {
		commons: drive.commons,
		biasDivisor: drive.biasDivisor,
		amplitude_V: drive.amplitude_V
	};
	const rms = rmsVoltages(levels);
	const isStatic = isStaticDrive(drive.commons);
	const window = operatingWindow({ ...levels, thresholds: points });
	const findings = windowFindings({
		result: window,
		amplitude_V: drive.amplitude_V,
		selectionRatio: rms.selectionRatio
	});
	const steepness = Math.max(...points.map((p) => p.v90_V / p.v10_V));
	if (!isStatic) {
		const optimum = optimalBiasDivisor(drive.commons);
		const atOptimum = rmsVoltages({ ...levels, biasDivisor: optimum }).selectionRatio;
		if (rms.selectionRatio < atOptimum * 0.99) {
			findings.push(
				finding({
					code: 'drive.bias-off-optimum',
					severity: 'warn',
					message:
						`Bias 1/${Number(drive.biasDivisor.toFixed(3))} gives a selection ratio of ` +
						`${rms.selectionRatio.toFixed(3)}; 1/${optimum.toFixed(2)} would give ${atOptimum.toFixed(3)} ` +
						`(the Alt–Pleshko limit for ${drive.commons} commons).`,
					fix: `Choose the bias nearest 1/${optimum.toFixed(2)} that the LCD driver offers.`
				})
			);
		}
	}
	if (drive.frameRate_Hz < FRAME_RATE_RANGE_HZ.min) {
		findings.push(
			finding({
				code: 'drive.frame-rate-low',
				severity: 'warn',
				message: `A frame rate of ${drive.frameRate_Hz} Hz may flicker; segment glass is usually driven at ${FRAME_RATE_RANGE_HZ.min}–${FRAME_RATE_RANGE_HZ.max} Hz.`,
				fix: `Raise the frame rate to at least ${FRAME_RATE_RANGE_HZ.min} Hz.`
			})
		);
	} else if (drive.frameRate_Hz > FRAME_RATE_RANGE_HZ.max) {
		findings.push(
			finding({
				code: 'drive.frame-rate-high',
				severity: 'warn',
				message: `A frame rate of ${drive.frameRate_Hz} Hz raises drive current for no gain; segment glass is usually driven at ${FRAME_RATE_RANGE_HZ.min}–${FRAME_RATE_RANGE_HZ.max} Hz.`,
				fix: `Lower the frame rate to at most ${FRAME_RATE_RANGE_HZ.max} Hz.`
			})
		);
	}
	return {
		commons: drive.commons,
		biasDivisor: drive.biasDivisor,
		amplitude_V: drive.amplitude_V,
		isStatic,
		onRms_V: rms.on_V,
		offRms_V: rms.off_V,
		selectionRatio: finiteOrNull(rms.selectionRatio),
		altPleshkoLimit: finiteOrNull(altPleshkoLimit(drive.commons)),
		optimalBias: isStatic ? null : optimalBiasDivisor(drive.commons),
		steepness,
		maxCommonsForSteepness: finiteOrNull(maxCommonsForSteepness(steepness)),
		window,
		findings,
		severity: overallSeverity(findings)
	};
}

export interface WiringReport {
	pins: PinMap;
	findings: Finding[];
	severity: Severity;
}

export function analyzeWiring(design: Design): WiringReport {
	const pins = pinMap(design);
	const findings: Finding[] = [];
	for (const conflict of pins.conflicts) {
		findings.push(
			finding({
				code: 'wiring.shared-crossing',
				severity: 'fail',
				message: `${conflict.electrodes.join(', ')} share common ${conflict.common} and line ${conflict.line}; they would always switch together.`,
				fix: 'Move all but one of them to a free (common, line) crossing.',
				electrodes: conflict.electrodeIds
			})
		);
	}
	if (pins.unassigned.length > 0) {
		findings.push(
			finding({
				code: 'wiring.unassigned',
				severity: 'fail',
				message: `Not assigned to a common and a line: ${pins.unassigned.join(', ')}.`,
				fix: 'Assign each to a common and a segment line, by hand or automatically.',
				electrodes: pins.unassignedIds
			})
		);
	}
	if (pins.commonsBeyondDrive.length > 0) {
		findings.push(
			finding({
				code: 'wiring.common-beyond-drive',
				severity: 'fail',
				message: `The drive scans ${design.drive.commons} common(s), but electrodes sit on ${pins.commonsBeyondDrive.join(', ')}.`,
				fix: 'Raise the number of commons the drive scans, or move those electrodes to scanned commons.'
			})
		);
	}
	findings.push(...pinFitFindings(design));
	if (findings.length === 0) {
		findings.push(
			finding({
				code: 'wiring.ok',
				severity: 'pass',
				message: `${design.electrodes.length} electrodes on ${pins.commonsUsed} common(s) and ${pins.linesUsed} segment line(s): ${pins.pinCount} pins, no conflicts.`
			})
		);
	}
	return { pins, findings, severity: overallSeverity(findings) };
}
