/**
 * The optical report of a design's cell: electro-optic curves and switching voltages at the cold,
 * room and hot ends of the operating range; the look of background, off and on pixels under the
 * design's drive and light; contrast and colour difference; response times against temperature.
 * Checked temperatures at or above the fluid's clearing point are skipped (see fluid-limits.ts):
 * the report then covers the nematic part of the range only.
 */
import type { Design } from '../design/schema';
import { deltaE2000 } from '../color/delta-e-2000';
import { responseVsTemperature } from '../lc/response';
import { rmsVoltages } from '../drive/rms-drive';
import type { ThresholdPoint } from '../drive/threshold-at-temperature';
import { finding, type Finding } from '../findings/finding';
import { createCellOptics } from './cell-optics';
import { electroOpticCurve, type ElectroOpticCurve } from './electro-optic-curve';
import { contrastRatio, pixelAppearance, type PixelAppearance } from './pixel-appearance';
import { geometryOfCell, materialOfCell } from './resolve-cell';
import { responseTemperatures } from './response-temperatures';
import type { ObliqueView } from '../legibility/oblique-views';
import { rememberStateProfiles } from './state-profiles';
import { nematicTemperatures } from './fluid-limits';

export const ROOM_C = 25;

export interface CellReport {
	temperatures_C: number[];
	curves: ElectroOpticCurve[];
	/** Switching voltages read from the curves, for the drive check. */
	thresholds: ThresholdPoint[];
	/** At room temperature (or the nearest end of the range) with the design's drive. */
	room_C: number;
	background: PixelAppearance;
	off: PixelAppearance;
	on: PixelAppearance;
	/** Background, off and on at each checked temperature (cold end, room, hot end). */
	statesByTemperature: TemperatureStates[];
	/** Off (unselected) segment against on segment, first-surface reflection included. */
	contrastRatio: number;
	/** Background against on segment. */
	backgroundContrastRatio: number;
	deltaE00: number;
	/** Visible difference between off segments and the background: ghosting. */
	ghostDeltaE00: number;
	response: ReturnType<typeof responseVsTemperature>;
	findings: Finding[];
}

export interface TemperatureStates {
	temperature_C: number;
	background: PixelAppearance;
	off: PixelAppearance;
	on: PixelAppearance;
	/** The states from the legibility scenarios' oblique directions, when computed ahead. */
	views?: ObliqueView[];
}

function checkedTemperatures(min_C: number, max_C: number): number[] {
	const room = Math.min(Math.max(ROOM_C, min_C), max_C);
	return [...new Set([min_C, room, max_C])].sort((a, b) => a - b);
}

export function analyzeCell(
	design: Design,
	onProgress?: (done: number, total: number) => void
): CellReport {
	const { cell, lighting, drive } = design;
	const material = materialOfCell(cell);
	const findings: Finding[] = [];
	// Temperatures at or above the clearing point are left out (the fluid-limit finding reports
	// them); everything below is still modelled.
	const temperatures_C = nematicTemperatures({
		clearing_C: material.clearing_C,
		temperatures_C: checkedTemperatures(drive.temperature.min_C, drive.temperature.max_C)
	});
	if (temperatures_C.length === 0) {
		throw new Error(
			`the fluid clears at ${material.clearing_C} °C, at or below the coldest operating temperature ` +
				`${drive.temperature.min_C} °C: no optics can be computed. Choose a fluid with a higher clearing point.`
		);
	}
	const room_C = temperatures_C.includes(ROOM_C)
		? ROOM_C
		: temperatures_C[Math.floor(temperatures_C.length / 2)];
	const rms = rmsVoltages({
		commons: drive.commons,
		biasDivisor: drive.biasDivisor,
		amplitude_V: drive.amplitude_V
	});
	const curves: ElectroOpticCurve[] = [];
	const statesByTemperature: TemperatureStates[] = [];
	for (const [index, temperature_C] of temperatures_C.entries()) {
		const optics = createCellOptics({ cell, lighting, temperature_C });
		curves.push(
			electroOpticCurve({
				optics,
				withSlices: (slices) => createCellOptics({ cell, lighting, temperature_C, slices })
			})
		);
		const zero = optics.stateAt(0);
		const offState = rms.off_V > 0 ? optics.stateAt(rms.off_V, zero.solution) : zero;
		const onState = optics.stateAt(rms.on_V, offState.solution);
		const states: TemperatureStates = {
			temperature_C,
			background: pixelAppearance(zero, lighting.illuminance_lx),
			off: pixelAppearance(offState, lighting.illuminance_lx),
			on: pixelAppearance(onState, lighting.illuminance_lx)
		};
		rememberStateProfiles(states, {
			background: zero.solution,
			off: offState.solution,
			on: onState.solution
		});
		statesByTemperature.push(states);
		onProgress?.(index + 1, temperatures_C.length);
	}
	const roomStates = statesByTemperature.find((s) => s.temperature_C === room_C);
	if (!roomStates) throw new Error('no room-temperature state was computed');
	const { background, off, on } = roomStates;
	const response = responseVsTemperature({
		material,
		geometry: geometryOfCell(cell),
		voltage_V: rms.on_V,
		temperatures_C: [
			...new Set([
				...responseTemperatures(drive.temperature.min_C, drive.temperature.max_C),
				room_C
			])
		].sort((a, b) => a - b),
		limit_s: cell.switchingLimit_s
	});
	if (response.tooSlowAt_C.length > 0) {
		const coldest = Math.min(...response.tooSlowAt_C);
		findings.push(
			finding({
				code: 'optics.slow-switching',
				severity: 'warn',
				message:
					`Switching is slower than ${cell.switchingLimit_s} s at and below ${Math.max(...response.tooSlowAt_C)} °C ` +
					`(coldest checked ${coldest} °C): readings will lag or smear.`,
				fix: 'Use a lower-viscosity fluid, a thinner gap or a heater.'
			})
		);
	}
	const ghostDeltaE00 = deltaE2000(background, off);
	findings.push(...contrastFindings(contrastRatio(off, on), ghostDeltaE00));
	return {
		temperatures_C,
		curves,
		thresholds: curves.map((c) => ({
			temperature_C: c.temperature_C,
			v10_V: c.v10_V,
			v90_V: c.v90_V
		})),
		room_C,
		background,
		off,
		on,
		statesByTemperature,
		contrastRatio: contrastRatio(off, on),
		backgroundContrastRatio: contrastRatio(background, on),
		deltaE00: deltaE2000(off, on),
		ghostDeltaE00,
		response,
		findings
	};
}

/**
 * Contrast limits: below 3:1 a readout fails ISO 9241-3's minimum; 6:1 and more is what
 * display ergonomics guidance recommends (ISO 9241-3; NUREG-0700 Rev. 3, ambient reflections
 * included). A ghost (off segment against background) above ΔE00 ≈ 1 starts to be visible side
 * by side [common practice: a just-noticeable difference of about 1 ΔE00].
 */
export const CONTRAST_MINIMUM = 3;
export const CONTRAST_RECOMMENDED = 6;
export const GHOST_VISIBLE_DELTA_E00 = 1;

function contrastFindings(ratio: number, ghost: number): Finding[] {
	const findings: Finding[] = [];
	if (ratio < CONTRAST_MINIMUM) {
		findings.push(
			finding({
				code: 'optics.contrast-below-minimum',
				severity: 'fail',
				message: `On segments reach only ${ratio.toFixed(2)}:1 against off segments (minimum ${CONTRAST_MINIMUM}:1).`,
				fix: "Raise the drive or check the cell's switching voltages."
			})
		);
	} else if (ratio < CONTRAST_RECOMMENDED) {
		findings.push(
			finding({
				code: 'optics.contrast-below-recommended',
				severity: 'warn',
				message: `Contrast ${ratio.toFixed(2)}:1 is legible but below the ${CONTRAST_RECOMMENDED}:1 usually recommended.`,
				fix: 'An anti-reflection front or a stronger drive helps.'
			})
		);
	}
	if (ghost > GHOST_VISIBLE_DELTA_E00) {
		findings.push(
			finding({
				code: 'optics.ghost-visible',
				severity: 'warn',
				message: `Off segments differ from the background by ΔE00 ${ghost.toFixed(1)}: they may show as ghosts.`,
				fix: 'Lower the drive amplitude, use a steeper fluid, or fewer commons.'
			})
		);
	}
	return findings;
}
