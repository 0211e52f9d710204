/**
 * The cell and light sections of the design document (added in version 2): the fluid, the stack
 * of polarizers and reflector, and the ambient light the readout is judged under.
 *
 * Units: gap in µm, angles in degrees, times in seconds, illuminance in lux. Reflectances and
 * transmittances are fractions 0…1.
 */
import { z } from 'zod';
import { CELL_FIELDS, LIGHTING_FIELDS } from './cell-fields';
import { quantitySchema } from './quantity-schema';
import { bounded, boundedAbove } from './bounds';
import { illuminantProblem } from './illuminant-name';
import { LC_PRESETS, presetById } from '../lc/presets';

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
const fraction = () => finite().refine((v) => v >= 0 && v <= 1, 'expected a fraction from 0 to 1');

const cauchySchema = z.strictObject({
	a: bounded('cauchyA'),
	b_um2: bounded('cauchyB_um2'),
	c_um4: bounded('cauchyC_um4')
});

/** A user-defined nematic fluid; every field as in the material model (lc/material.ts). */
export const customMaterialSchema = z
	.strictObject({
		id: z.string().min(1).max(64),
		label: z.string().max(200),
		source: z.string().max(2000),
		reference_C: bounded('operating_C'),
		clearing_C: bounded('clearing_C'),
		orderExponent: boundedAbove('orderExponent'),
		extraordinary: cauchySchema,
		ordinary: cauchySchema,
		k11_pN: bounded('elastic_pN'),
		k22_pN: bounded('elastic_pN'),
		k33_pN: bounded('elastic_pN'),
		epsParallel: bounded('permittivity'),
		epsPerpendicular: bounded('permittivity'),
		gamma1_Pas: boundedAbove('viscosity_Pas'),
		activation_eV: bounded('activation_eV'),
		viscosityLaw: z.enum(['order-arrhenius', 'arrhenius'])
	})
	.refine((m) => m.clearing_C > m.reference_C, 'expected clearing_C above reference_C')
	.refine(
		(m) => m.epsParallel > m.epsPerpendicular,
		'a TN fluid needs epsParallel above epsPerpendicular'
	);

export const materialChoiceSchema = z.union([
	z.strictObject({
		preset: z
			.string()
			.min(1)
			.max(64)
			.refine(
				(id) => presetById(id) !== undefined,
				`expected a known fluid preset (${LC_PRESETS.map((m) => m.id).join(', ')})`
			)
	}),
	z.strictObject({ custom: customMaterialSchema })
]);

export const polarizerChoiceSchema = z.discriminatedUnion('kind', [
	/** The tool's neutral-grey iodine-PVA-like model (typical values). */
	z.strictObject({ kind: z.literal('neutral-grey') }),
	z.strictObject({ kind: z.literal('ideal') }),
	/** Constant principal intensity transmittances: pass k1, block k2. */
	z.strictObject({ kind: z.literal('custom'), k1: fraction(), k2: fraction() })
]);

export const reflectorChoiceSchema = z.strictObject({
	kind: z.enum(['diffuse-white', 'brushed-metal', 'transflective']),
	reflectance: fraction().optional(),
	depolarizedFraction: fraction().optional(),
	transmittance: fraction().optional()
});

export const cellSchema = z.strictObject({
	material: materialChoiceSchema,
	gap_um: quantitySchema(CELL_FIELDS.gap_um),
	twist_deg: quantitySchema(CELL_FIELDS.twist_deg),
	pretilt_deg: quantitySchema(CELL_FIELDS.pretilt_deg),
	/** Gap-to-pitch ratio d/p of the chiral dopant. */
	gapToPitch: quantitySchema(CELL_FIELDS.gapToPitch),
	/** Positive: dark segments on a light ground; negative: light segments on a dark ground. */
	mode: z.enum(['positive', 'negative']),
	polarizer: polarizerChoiceSchema,
	reflector: reflectorChoiceSchema,
	frontSurfaceReflectance: quantitySchema(CELL_FIELDS.frontSurfaceReflectance),
	/** Switching slower than this (e.g. when cold) is flagged. */
	switchingLimit_s: quantitySchema(CELL_FIELDS.switchingLimit_s)
});

export const lightingSchema = z.strictObject({
	/** 'A', 'D50', 'D65', 'D<cct>' such as 'D75', 'F2', 'F11' or 'E'. */
	illuminant: z
		.string()
		.min(1)
		.max(16)
		.superRefine((name, ctx) => {
			const problem = illuminantProblem(name);
			if (problem) ctx.addIssue({ code: 'custom', message: problem });
		}),
	observer: z.union([z.literal(2), z.literal(10)]),
	illuminance_lx: quantitySchema(LIGHTING_FIELDS.illuminance_lx)
});

export type CellSettings = z.infer<typeof cellSchema>;
export type Lighting = z.infer<typeof lightingSchema>;
export type CustomMaterial = z.infer<typeof customMaterialSchema>;

/** The one default cell of the app, the command line and migrated documents. */
export const DEFAULT_CELL: CellSettings = {
	material: { preset: 'generic-reflective-tn' },
	gap_um: CELL_FIELDS.gap_um.default,
	twist_deg: CELL_FIELDS.twist_deg.default,
	pretilt_deg: CELL_FIELDS.pretilt_deg.default,
	gapToPitch: CELL_FIELDS.gapToPitch.default,
	mode: 'positive',
	polarizer: { kind: 'neutral-grey' },
	reflector: { kind: 'brushed-metal' },
	frontSurfaceReflectance: CELL_FIELDS.frontSurfaceReflectance.default,
	switchingLimit_s: CELL_FIELDS.switchingLimit_s.default
};

export const DEFAULT_LIGHTING: Lighting = {
	illuminant: 'D65',
	observer: 2,
	illuminance_lx: LIGHTING_FIELDS.illuminance_lx.default
};
