/**
 * The wiring and geometry-rule sections of the design document (added in version 3).
 *
 * `rules`: the limits the design-rule check applies. Defaults are common practice from glass-maker
 * design guides (segment gap ≥ 0.05 mm recommended, 0.03 mm possible; segment edge to glass edge
 * 1.5–2.0 mm recommended, ≥ 1.3 mm possible). Every limit is editable per design.
 *
 * `pinout`: how the pins are laid along the glass's contact edge — which edge, commons first,
 * last or split to both ends, and the pitch.
 *
 * Units: millimetres (`_mm`), arcminutes (`_arcmin`).
 */
import { z } from 'zod';

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
const lengthIn = (min_mm: number, max_mm: number) =>
	finite().refine(
		(v) => v >= min_mm && v <= max_mm,
		`expected a length from ${min_mm} to ${max_mm} mm`
	);

export const rulesSchema = z.strictObject({
	/** Smallest gap between two electrodes of one plate. */
	minGap_mm: lengthIn(0.001, 10),
	/** Smallest width of any part of an electrode. */
	minWidth_mm: lengthIn(0.001, 10),
	/** Smallest distance from an electrode to the glass edge. */
	edgeMargin_mm: lengthIn(0, 50),
	/** Smallest character height, as a visual angle at the design's viewing distance. */
	minCharacterHeight_arcmin: finite().refine(
		(v) => v > 0 && v <= 600,
		'expected an angle from 0 to 600 arcmin'
	),
	/** Smallest stroke width, as a visual angle at the design's viewing distance. */
	minStroke_arcmin: finite().refine(
		(v) => v > 0 && v <= 600,
		'expected an angle from 0 to 600 arcmin'
	)
});

export const pinEdgeSchema = z.enum(['top', 'bottom', 'left', 'right']);
export const pinOrderSchema = z.enum(['commons-first', 'commons-last', 'commons-split']);

export const pinoutSchema = z.strictObject({
	edge: pinEdgeSchema,
	order: pinOrderSchema,
	pitch_mm: lengthIn(0.05, 10)
});

export type DesignRules = z.infer<typeof rulesSchema>;
export type Pinout = z.infer<typeof pinoutSchema>;
export type PinEdge = z.infer<typeof pinEdgeSchema>;
export type PinOrder = z.infer<typeof pinOrderSchema>;

/**
 * Character height 16′ is the minimum of ISO 9241-3 (and NUREG-0700); a stroke of about 1/6 of the
 * height (DOD-HDBK-791 §6-5.3.2) gives ≈ 2.7′, rounded down to 2.5′ for a warning threshold.
 */
export const DEFAULT_RULES: DesignRules = {
	minGap_mm: 0.05,
	minWidth_mm: 0.05,
	edgeMargin_mm: 1.5,
	minCharacterHeight_arcmin: 16,
	minStroke_arcmin: 2.5
};

/** Elastomeric connector: pitch ≥ 0.5 mm is common practice; 1 mm is a comfortable default. */
export const DEFAULT_PINOUT: Pinout = { edge: 'bottom', order: 'commons-first', pitch_mm: 1 };
