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
import { legibilitySchema } from './legibility-schema';
import { orientationSchema } from './orientation-schema';
import { loadSettingsSchema } from '../load/load-settings';
import { bounded, boundedAbove, LIMITS } from './bounds';
import { glassArtSchema } from './glass-art-schema';

export const DESIGN_FORMAT = 'sunglyph-design';
export const DESIGN_VERSION = 6;

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
const id = () =>
	z
		.string()
		.min(1, 'expected a non-empty id')
		.max(64, 'expected an id of at most 64 characters')
		.regex(/^[A-Za-z0-9_.:-]+$/, 'expected an id of letters, digits and _ . : -');
const label = () => z.string().max(200, 'expected at most 200 characters');

const coordinate = () => bounded('coordinate_mm');
const handle = z.tuple([coordinate(), coordinate()]);

export const pointSchema = z.strictObject({
	x: coordinate(),
	y: coordinate(),
	in: handle.optional(),
	out: handle.optional()
});

export const contourSchema = z
	.array(pointSchema)
	.min(3, 'expected at least 3 points')
	.max(LIMITS.pointsPerContour, `expected at most ${LIMITS.pointsPerContour} points`);

export const rectSchema = z.strictObject({
	x_mm: coordinate(),
	y_mm: coordinate(),
	width_mm: boundedAbove('coordinate_mm'),
	height_mm: boundedAbove('coordinate_mm')
});

export const glassSchema = z.strictObject({
	width_mm: bounded('glassSize_mm'),
	height_mm: bounded('glassSize_mm'),
	viewingArea: rectSchema
});

export const lineRefSchema = z.strictObject({ id: id(), name: label() });

export const electrodeKindSchema = z.enum(['segment', 'icon']);

export const electrodeSchema = z.strictObject({
	id: id(),
	name: label(),
	kind: electrodeKindSchema,
	outline: contourSchema,
	holes: z
		.array(contourSchema)
		.max(LIMITS.holesPerElectrode, `expected at most ${LIMITS.holesPerElectrode} holes`)
		.default([]),
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
	members: z
		.array(id())
		.max(LIMITS.groupMembers, `expected at most ${LIMITS.groupMembers} members`),
	/** Parameters a generator used, so the group can be regenerated after the fact. */
	generator: z
		.strictObject({
			kind: z.string().min(1).max(64),
			params: z
				.record(z.string().max(64), generatorParamSchema)
				.refine(
					(p) => Object.keys(p).length <= LIMITS.generatorParams,
					`expected at most ${LIMITS.generatorParams} parameters`
				)
		})
		.optional()
});

export const inversionSchema = z.enum(['line', 'frame']);

export const driveSchema = z.strictObject({
	/** Number of commons N (duty 1/N); 1 is static drive. */
	commons: z.number().int('expected a whole number of commons').min(1).max(256),
	/** The bias divisor a in "bias 1/a"; ignored for static drive. */
	biasDivisor: bounded('biasDivisor'),
	amplitude_V: boundedAbove('voltage_V'),
	frameRate_Hz: bounded('frameRate_Hz'),
	inversion: inversionSchema,
	temperature: z
		.strictObject({ min_C: bounded('operating_C'), max_C: bounded('operating_C') })
		.refine((t) => t.min_C <= t.max_C, 'expected min_C not above max_C')
});

export const thresholdSchema = z
	.strictObject({
		/** 'manual' uses the figures below; 'computed' lets the cell model supply them. */
		source: z.enum(['manual', 'computed']),
		v10_V: boundedAbove('voltage_V'),
		v90_V: boundedAbove('voltage_V'),
		reference_C: bounded('operating_C'),
		/** Change of V10 and V90 per kelvin, in mV/K (negative for ordinary TN fluids). */
		tempCoeff_mV_per_K: bounded('tempCoeff_mV_per_K')
	})
	.refine((t) => t.v90_V > t.v10_V, 'expected v90_V above v10_V');

export const viewingSchema = z.strictObject({ distance_mm: bounded('viewingDistance_mm') });

export const designSchema = z.strictObject({
	format: z.literal(DESIGN_FORMAT),
	version: z.literal(DESIGN_VERSION),
	name: label(),
	glass: glassSchema,
	commons: z.array(lineRefSchema).max(LIMITS.lines, `expected at most ${LIMITS.lines} commons`),
	segmentLines: z
		.array(lineRefSchema)
		.max(LIMITS.lines, `expected at most ${LIMITS.lines} segment lines`),
	electrodes: z
		.array(electrodeSchema)
		.max(LIMITS.electrodes, `expected at most ${LIMITS.electrodes} electrodes`),
	groups: z
		.array(groupSchema)
		.max(LIMITS.groups, `expected at most ${LIMITS.groups} groups`)
		.default([]),
	drive: driveSchema,
	thresholds: thresholdSchema,
	viewing: viewingSchema,
	cell: cellSchema,
	lighting: lightingSchema,
	rules: rulesSchema,
	pinout: pinoutSchema,
	legibility: legibilitySchema,
	orientation: orientationSchema,
	/** Optional electrical-load inputs (battery, budget, ITO traces); defaults when absent. */
	load: loadSettingsSchema.optional(),
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
