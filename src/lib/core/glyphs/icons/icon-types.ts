/**
 * An icon of the library: an id, a display name, search keywords, and a builder that draws it in
 * a square box of side `size_mm` with its top-left at (x_mm, y_mm). Icons are drawn on a 24-unit
 * grid (1 unit = size/24) and may consist of several electrodes, each one outline plus holes.
 */
import type { ElectrodeDraft } from '../glyph-types';

export interface IconPlacement {
	x_mm: number;
	y_mm: number;
	size_mm: number;
}

export interface IconDefinition {
	readonly id: string;
	readonly name: string;
	readonly keywords: readonly string[];
	build(placement: IconPlacement): ElectrodeDraft[];
}

/** Side of the drawing grid icons are designed on. */
export const ICON_GRID_UNITS = 24;
