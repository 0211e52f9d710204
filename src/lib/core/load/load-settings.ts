/**
 * The optional `load` section of a design: what the designer enters for the electrical load
 * estimate. Absent in older files and in version 3 documents; every field has a default, so the
 * document version does not change.
 *
 * Units: capacity in mAh, currents in µA, sheet resistance in Ω/□, trace lengths in mm. The
 * default sheet resistance is the top of the usual 20–100 Ω/□ range of display ITO [common
 * practice: glass-maker design guides], the safe side for a settling check.
 */
import { z } from 'zod';

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
const positive = () => finite().refine((v) => v > 0, 'expected a number greater than 0');

export const LOAD_PATTERNS = ['all-on', 'all-off', 'reading'] as const;
export type LoadPattern = (typeof LOAD_PATTERNS)[number];

export const DEFAULT_SHEET_RESISTANCE_OHM_PER_SQ = 100;

export const traceSchema = z.strictObject({
	/** Id of the electrode the trace feeds. */
	electrode: z.string().min(1).max(64),
	length_mm: positive().refine((v) => v <= 1000, 'expected a trace of at most 1000 mm'),
	width_mm: positive().refine((v) => v <= 100, 'expected a trace at most 100 mm wide')
});

export const loadSettingsSchema = z.strictObject({
	/** Battery capacity; no battery-life figure without it. */
	battery_mAh: positive()
		.refine((v) => v <= 1e7, 'expected at most 10 000 000 mAh')
		.optional(),
	/** Current the driver draws with the display idle (its own supply and bias ladder). */
	quiescent_uA: finite()
		.refine((v) => v >= 0 && v <= 1e6, 'expected 0 to 1 000 000 µA')
		.default(0),
	/** A current the display must stay under; no check without it. */
	budget_uA: positive()
		.refine((v) => v <= 1e6, 'expected at most 1 000 000 µA')
		.optional(),
	sheetResistance_ohm_per_sq: finite()
		.refine((v) => v >= 1 && v <= 1e5, 'expected 1 to 100 000 Ω/□')
		.default(DEFAULT_SHEET_RESISTANCE_OHM_PER_SQ),
	pattern: z.enum(LOAD_PATTERNS).default('reading'),
	/** ITO traces from the contact ledge to electrodes, when they are known. */
	traces: z.array(traceSchema).max(10000, 'expected at most 10 000 traces').default([])
});

export type LoadSettings = z.infer<typeof loadSettingsSchema>;

export const DEFAULT_LOAD_SETTINGS: LoadSettings = {
	quiescent_uA: 0,
	sheetResistance_ohm_per_sq: DEFAULT_SHEET_RESISTANCE_OHM_PER_SQ,
	pattern: 'reading',
	traces: []
};

/** The design's load section with every default filled in. */
export function loadSettingsOf(design: { load?: Partial<LoadSettings> }): LoadSettings {
	return { ...DEFAULT_LOAD_SETTINGS, ...(design.load ?? {}) };
}
