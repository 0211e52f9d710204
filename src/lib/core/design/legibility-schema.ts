/**
 * The legibility section of the design document (added in version 4): the light scenarios the
 * readout is judged under, who reads it from where, the visibility level asked for, whether a
 * misreading can hurt someone, and the reading the preview shows.
 *
 * Units: illuminance in lux (`_lx`), luminance in cd/m² (`_cdm2`), distance in millimetres
 * (`_mm`), angles in degrees off the display normal (`_deg`), age in years.
 *
 * Default scenario values come from published tabulations (physics notes §8): living room 50 lx,
 * office 320–500 lx, daylight not direct sun 10–25 klx, overcast day 1 000 lx, direct sun
 * 32–100 klx. Mirrored luminances follow L = ρE/π for a matt surface (a ceiling ρ 0.7 at 300 lx
 * ≈ 67 cd/m², a white wall ρ 0.8 at 500 lx ≈ 127 cd/m²) and L ≈ E/π for a uniform overcast sky;
 * a clear sky away from the sun is 2 000–8 000 cd/m², sunlit white cloud 10 000–30 000 cd/m²
 * [from memory].
 */
import { z } from 'zod';
import { illuminantByName } from '../color/illuminant-by-name';
import { SCENARIO_FIELDS, type ScenarioNumberKey } from './scenario-fields';

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
const between = (min: number, max: number, unit: string) =>
	finite().refine((v) => v >= min && v <= max, `expected ${min} to ${max}${unit}`);

const UNIT_SUFFIX: Record<string, string> = { '°': '°' };
/** A scenario number checked against its declared range. */
const scenarioNumber = (key: ScenarioNumberKey) => {
	const f = SCENARIO_FIELDS[key];
	return between(f.min, f.max, UNIT_SUFFIX[f.unit] ?? ` ${f.unit}`);
};

const illuminantName = () =>
	z
		.string()
		.min(1)
		.max(8)
		.refine((name) => {
			try {
				illuminantByName(name);
				return true;
			} catch {
				return false;
			}
		}, 'expected an illuminant the colour core knows (A, D50, D65, D75, E, F2, F11 …)');

export { AGE_RANGE_YEARS } from './scenario-fields';

export const scenarioSchema = z.strictObject({
	name: z.string().min(1, 'expected a name').max(60, 'expected at most 60 characters'),
	illuminance_lx: scenarioNumber('illuminance_lx'),
	illuminant: illuminantName(),
	/** Luminance of what the front surface mirrors toward the reader. */
	mirrored_cdm2: scenarioNumber('mirrored_cdm2'),
	distance_mm: scenarioNumber('distance_mm'),
	viewAngle_deg: scenarioNumber('viewAngle_deg'),
	age_years: scenarioNumber('age_years'),
	/** Backlight luminance seen through the background, for a transflective reflector at night. */
	backlight_cdm2: scenarioNumber('backlight_cdm2').optional()
});

export const readingSchema = z.strictObject({
	/** Characters shown on the character groups in order, e.g. "12:34". */
	text: z.string().max(40, 'expected at most 40 characters'),
	/** Lit steps of each bar graph. */
	bars: z.number().int('expected a whole number of bars').min(0).max(1000),
	/** Icon electrodes shown lit. */
	icons: z.array(z.string().max(64)).max(500)
});

export const legibilitySchema = z.strictObject({
	scenarios: z
		.array(scenarioSchema)
		.min(1, 'expected at least one scenario')
		.max(12, 'expected at most 12 scenarios')
		.refine(
			(list) => new Set(list.map((s) => s.name)).size === list.length,
			'expected every scenario to have its own name'
		),
	/** Visibility level ΔL/ΔL_th asked for comfortable reading of numerals (the field factor). */
	readableVL: between(1, 100, ''),
	/** Below this visibility level a group counts as not readable. */
	marginalVL: between(1, 100, ''),
	/** The readout can hurt someone if misread (dosage, pressure, temperature of a heater …). */
	safetyRelevant: z.boolean(),
	reading: readingSchema
});

export type Scenario = z.infer<typeof scenarioSchema>;
export type Reading = z.infer<typeof readingSchema>;
export type LegibilitySettings = z.infer<typeof legibilitySchema>;

/**
 * Visibility levels of ≈ 8–10 are quoted in lighting practice for comfortable reading of small
 * numerals [from memory, low authority]: 8 is the default field factor, half of it the floor.
 */
export const DEFAULT_READABLE_VL = 8;
export const DEFAULT_MARGINAL_VL = 4;

export const DEFAULT_READING: Reading = { text: '12:34', bars: 6, icons: [] };

/** The default scenarios at a reading distance (the design's viewing distance). */
export function defaultScenarios(options: {
	distance_mm: number;
	transflective: boolean;
}): Scenario[] {
	const at = { distance_mm: options.distance_mm, viewAngle_deg: 15, age_years: 45 };
	const list: Scenario[] = [
		// living room 50 lx; a dark ceiling (ρ 0.3 at 50 lx → ≈ 5 cd/m²) mirrored
		{ name: 'Dim room', illuminance_lx: 50, illuminant: 'A', mirrored_cdm2: 5, ...at },
		// office 320–500 lx; a white wall ρ 0.8 at 500 lx ≈ 127 cd/m² mirrored
		{ name: 'Office', illuminance_lx: 500, illuminant: 'F11', mirrored_cdm2: 127, ...at },
		// daylight in shade ≈ 10 klx lower end; a lit facade ρ 0.3 at 10 klx ≈ 950 cd/m²
		{
			name: 'Shade outdoors',
			illuminance_lx: 10_000,
			illuminant: 'D75',
			mirrored_cdm2: 950,
			...at
		},
		// overcast day at midday 10–25 klx; a uniform overcast sky mirrored: L ≈ E/π
		{
			name: 'Overcast day',
			illuminance_lx: 15_000,
			illuminant: 'D65',
			mirrored_cdm2: 4_800,
			...at
		},
		// direct sun 32–100 klx; a bright sky of sunlit white cloud mirrored (10–30 klx cd/m², from memory)
		{ name: 'Direct sun', illuminance_lx: 100_000, illuminant: 'D55', mirrored_cdm2: 30_000, ...at }
	];
	if (options.transflective) {
		// civil twilight limit 3.4 lx; a dark room mirrored; a modest backlight [common practice]
		list.push({
			name: 'Night, backlit',
			illuminance_lx: 1,
			illuminant: 'A',
			mirrored_cdm2: 0.1,
			backlight_cdm2: 20,
			...at
		});
	}
	return list;
}

export function defaultLegibility(options: {
	distance_mm: number;
	transflective: boolean;
}): LegibilitySettings {
	return {
		scenarios: defaultScenarios(options),
		readableVL: DEFAULT_READABLE_VL,
		marginalVL: DEFAULT_MARGINAL_VL,
		safetyRelevant: false,
		reading: { ...DEFAULT_READING, icons: [] }
	};
}

/** Migration step 3 → 4: scenarios at the stored viewing distance, a night case if transflective. */
export function addLegibilitySection(doc: Record<string, unknown>): Record<string, unknown> {
	if (doc.legibility !== undefined) return doc;
	const viewing = doc.viewing as { distance_mm?: unknown } | undefined;
	const distance = Number(viewing?.distance_mm);
	const cell = doc.cell as { reflector?: { kind?: unknown } } | undefined;
	return {
		...doc,
		legibility: defaultLegibility({
			distance_mm:
				Number.isFinite(distance) && distance >= 50 && distance <= 20_000 ? distance : 600,
			transflective: cell?.reflector?.kind === 'transflective'
		})
	};
}
