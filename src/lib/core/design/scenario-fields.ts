/**
 * Each number of a light scenario declared once: label, unit, range. The document schema checks
 * against these ranges and the scenario editor builds its fields from them, so a limit can never
 * differ between the file and the screen.
 *
 * Units: lux, cd/m², millimetres, degrees off the display normal, years.
 */

export type ScenarioNumberKey =
	| 'illuminance_lx'
	| 'mirrored_cdm2'
	| 'distance_mm'
	| 'viewAngle_deg'
	| 'age_years'
	| 'backlight_cdm2';

export interface ScenarioField {
	key: ScenarioNumberKey;
	label: string;
	unit: string;
	min: number;
	max: number;
	/** Stable handle for tests and for linking a message to its field. */
	testid: string;
}

/** Adrian's age factor is defined for 23 to 75 years. */
export const AGE_RANGE_YEARS = { min: 23, max: 75 } as const;

export const SCENARIO_FIELDS: Readonly<Record<ScenarioNumberKey, ScenarioField>> = {
	illuminance_lx: {
		key: 'illuminance_lx',
		label: 'Illuminance',
		unit: 'lx',
		min: 0.01,
		max: 150_000,
		testid: 'scenario-illuminance'
	},
	mirrored_cdm2: {
		key: 'mirrored_cdm2',
		label: 'Mirrored luminance',
		unit: 'cd/m²',
		min: 0,
		max: 2e9,
		testid: 'scenario-mirrored'
	},
	distance_mm: {
		key: 'distance_mm',
		label: 'Reading distance',
		unit: 'mm',
		min: 50,
		max: 20_000,
		testid: 'scenario-distance'
	},
	viewAngle_deg: {
		key: 'viewAngle_deg',
		label: 'Viewing angle off normal',
		unit: '°',
		min: 0,
		max: 80,
		testid: 'scenario-view-angle'
	},
	age_years: {
		key: 'age_years',
		label: "Reader's age",
		unit: 'years',
		min: AGE_RANGE_YEARS.min,
		max: AGE_RANGE_YEARS.max,
		testid: 'scenario-age'
	},
	backlight_cdm2: {
		key: 'backlight_cdm2',
		label: 'Backlight (0 = none)',
		unit: 'cd/m²',
		min: 0,
		max: 10_000,
		testid: 'scenario-backlight'
	}
};
