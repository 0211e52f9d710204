/**
 * The sunglyph design document, version 6: the schema is the single source of truth and the
 * TypeScript types are derived from it.
 *
 * Units: all lengths in millimetres (suffix `_mm`), voltages in volts (`_V`), frequencies in hertz
 * (`_Hz`), temperatures in degrees Celsius (`_C`). Coordinates are glass coordinates seen from the
 * viewer: x to the right, y downwards, origin at the glass's top-left corner.
 *
 * An electrode outline is one closed contour of points; a point may carry Bezier handles relative
 * to itself (`in` before the point, `out` after it). Holes are further closed contours cut out of
 * the outline (even-odd fill).
 */
import { z } from 'zod';
import { cellSchema, lightingSchema } from './cell-schema';
import { pinoutSchema, rulesSchema } from './rules-schema';
import { glassArtSchema } from './glass-art-schema';

export const DESIGN_FORMAT = 'sunglyph-design';
export const DESIGN_VERSION = 6;

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
const positive = () => finite().refine((v) => v > 0, 'expected a number greater than 0');
const id = () =>
	z
		.string()
		.min(1, 'expected a non-empty id')
		.max(64, 'expected an id of at most 64 characters')
		.regex(/^[A-Za-z0-9_.:-]+$/, 'expected an id of letters, digits and _ . : -');
const label = () => z.string().max(200, 'expected at most 200 characters');

const handle = z.tuple([finite(), finite()]);

export const pointSchema = z.strictObject({
	x: finite(),
	y: finite(),
	in: handle.optional(),
	out: handle.optional()
});

export const contourSchema = z.array(pointSchema).min(3, 'expected at least 3 points');

export const rectSchema = z.strictObject({
	x_mm: finite(),
	y_mm: finite(),
	width_mm: positive(),
	height_mm: positive()
});

export const glassSchema = z.strictObject({
	width_mm: positive(),
	height_mm: positive(),
	viewingArea: rectSchema
});

export const lineRefSchema = z.strictObject({ id: id(), name: label() });

export const electrodeKindSchema = z.enum(['segment', 'icon']);

export const electrodeSchema = z.strictObject({
	id: id(),
	name: label(),
	kind: electrodeKindSchema,
	outline: contourSchema,
	holes: z.array(contourSchema).default([]),
	/** Id of the common (back plate) this electrode faces, or null while unassigned. */
	common: id().nullable(),
	/** Id of the segment line (front plate pin) driving it, or null while unassigned. */
	line: id().nullable(),
	/** A locked assignment is kept as it is by automatic assignment. */
	locked: z.boolean().default(false)
});

export const generatorParamSchema = z.union([finite(), z.string().max(200), z.boolean()]);

export const groupSchema = z.strictObject({
	id: id(),
	name: label(),
	members: z.array(id()),
	/** Parameters a generator used, so the group can be regenerated after the fact. */
	generator: z
		.strictObject({ kind: z.string().min(1), params: z.record(z.string(), generatorParamSchema) })
		.optional()
});

export const inversionSchema = z.enum(['line', 'frame']);

export const driveSchema = z.strictObject({
	/** Number of commons N (duty 1/N); 1 is static drive. */
	commons: z.number().int('expected a whole number of commons').min(1).max(256),
	/** The bias divisor a in "bias 1/a"; ignored for static drive. */
	biasDivisor: finite().refine((v) => v >= 2, 'expected a bias divisor of at least 2 (bias 1/2)'),
	amplitude_V: positive(),
	frameRate_Hz: positive(),
	inversion: inversionSchema,
	temperature: z
		.strictObject({ min_C: finite(), max_C: finite() })
		.refine((t) => t.min_C <= t.max_C, 'expected min_C not above max_C')
});

export const thresholdSchema = z
	.strictObject({
		/** 'manual' uses the figures below; 'computed' lets the cell model supply them. */
		source: z.enum(['manual', 'computed']),
		v10_V: positive(),
		v90_V: positive(),
		reference_C: finite(),
		/** Change of V10 and V90 per kelvin, in mV/K (negative for ordinary TN fluids). */
		tempCoeff_mV_per_K: finite()
	})
	.refine((t) => t.v90_V > t.v10_V, 'expected v90_V above v10_V');

export const viewingSchema = z.strictObject({ distance_mm: positive() });

export const designSchema = z.strictObject({
	format: z.literal(DESIGN_FORMAT),
	version: z.literal(DESIGN_VERSION),
	name: label(),
	glass: glassSchema,
	commons: z.array(lineRefSchema),
	segmentLines: z.array(lineRefSchema),
	electrodes: z.array(electrodeSchema),
	groups: z.array(groupSchema).default([]),
	drive: driveSchema,
	thresholds: thresholdSchema,
	viewing: viewingSchema,
	cell: cellSchema,
	lighting: lightingSchema,
	rules: rulesSchema,
	pinout: pinoutSchema,
	glassArt: glassArtSchema
});

export type Point = z.infer<typeof pointSchema>;
export type Contour = z.infer<typeof contourSchema>;
export type Rect = z.infer<typeof rectSchema>;
export type LineRef = z.infer<typeof lineRefSchema>;
export type Electrode = z.infer<typeof electrodeSchema>;
export type ElectrodeKind = z.infer<typeof electrodeKindSchema>;
export type Group = z.infer<typeof groupSchema>;
export type DriveSettings = z.infer<typeof driveSchema>;
export type Inversion = z.infer<typeof inversionSchema>;
export type Thresholds = z.infer<typeof thresholdSchema>;
export type Design = z.infer<typeof designSchema>;
