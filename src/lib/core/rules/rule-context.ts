/**
 * What every design rule reads: the design, its limits, and each electrode flattened once (at
 * `RULES_FLATTEN_TOLERANCE_um`, within the 1 µm the rules need) in a uniform-grid spatial index,
 * so neighbour rules visit only nearby pairs. Also the helper that turns bounds into a finding's
 * location. Lengths in millimetres, glass coordinates (x right, y down).
 */
import type { Design } from '../design/schema';
import type { DesignRules } from '../design/rules-schema';
import type { Bounds } from '../geometry/bounds';
import { buildSpatialIndex, type SpatialIndex } from '../geometry/spatial-index';
import type { FindingLocation } from '../findings/finding';

export const RULES_FLATTEN_TOLERANCE_um = 0.5;

export interface RuleContext {
	readonly design: Design;
	readonly limits: DesignRules;
	readonly index: SpatialIndex;
}

export function ruleContext(design: Design, options: { index?: SpatialIndex } = {}): RuleContext {
	const index =
		options.index && options.index.tolerance_um === RULES_FLATTEN_TOLERANCE_um
			? buildSpatialIndex(design.electrodes, {
					tolerance_um: RULES_FLATTEN_TOLERANCE_um,
					previous: options.index
				})
			: buildSpatialIndex(design.electrodes, { tolerance_um: RULES_FLATTEN_TOLERANCE_um });
	return { design, limits: design.rules, index };
}

/** A finding location around `bounds`, padded so a zoom shows some surroundings. */
export function locationOf(bounds: Bounds, pad_mm = 0): FindingLocation {
	return {
		x_mm: bounds.minX - pad_mm,
		y_mm: bounds.minY - pad_mm,
		width_mm: bounds.maxX - bounds.minX + 2 * pad_mm,
		height_mm: bounds.maxY - bounds.minY + 2 * pad_mm
	};
}

export function unionBounds(list: readonly Bounds[]): Bounds {
	return {
		minX: Math.min(...list.map((b) => b.minX)),
		minY: Math.min(...list.map((b) => b.minY)),
		maxX: Math.max(...list.map((b) => b.maxX)),
		maxY: Math.max(...list.map((b) => b.maxY))
	};
}

/** Millimetres with up to 3 decimals (µm resolution), trailing zeros dropped. */
export const mm = (v: number): string => `${Number(v.toFixed(3))} mm`;
