/**
 * Current of a design's display over temperature and over frame rate, for the plots. Energy per
 * cycle does not depend on the frame rate, so current grows in proportion to it; over temperature
 * it follows the fluid's ε∥ and ε⊥ (fluid-permittivity.ts).
 */
import type { Design } from '../design/schema';
import { prepareDriveLoad } from './drive-load';
import { electrodeArea_mm2 } from './electrode-capacitance';
import { pixelPermittivity } from './fluid-permittivity';
import { LOAD_PATTERNS, loadSettingsOf, type LoadPattern } from './load-settings';
import { onProbabilityOf } from './display-patterns';

export interface CurrentPoint {
	pattern: LoadPattern;
	temperature_C: number;
	frameRate_Hz: number;
	total_uA: number;
}

/** Evenly spaced temperatures over the design's range, ends included (one when min = max). */
export function rangeTemperatures_C(range: { min_C: number; max_C: number }, count = 9): number[] {
	if (range.max_C === range.min_C) return [range.min_C];
	return Array.from(
		{ length: count },
		(_, i) => range.min_C + ((range.max_C - range.min_C) * i) / (count - 1)
	);
}

/** Total current (display plus quiescent) of each pattern at each temperature and frame rate. */
export function currentSweep(options: {
	design: Design;
	temperatures_C: readonly number[];
	frameRates_Hz: readonly number[];
}): CurrentPoint[] {
	const { design } = options;
	const quiescent_uA = loadSettingsOf(design).quiescent_uA;
	const areas_mm2 = design.electrodes.map(electrodeArea_mm2);
	const points: CurrentPoint[] = [];
	const prepared = LOAD_PATTERNS.map((pattern) => ({
		pattern,
		model: prepareDriveLoad({ design, onProbability: onProbabilityOf(pattern), areas_mm2 })
	}));
	for (const temperature_C of options.temperatures_C) {
		const permittivity = pixelPermittivity({ cell: design.cell, temperature_C });
		for (const { pattern, model } of prepared) {
			const base = model.at({ permittivity });
			for (const frameRate_Hz of options.frameRates_Hz) {
				const scale = frameRate_Hz / design.drive.frameRate_Hz;
				points.push({
					pattern,
					temperature_C,
					frameRate_Hz,
					total_uA: base.current_A * scale * 1e6 + quiescent_uA
				});
			}
		}
	}
	return points;
}
