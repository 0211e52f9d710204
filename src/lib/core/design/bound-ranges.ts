/**
 * The ranges themselves, free of the schema library so light commands can read them. Physical and practical bounds of every quantity a design document holds, so no input can drive
 * unbounded work (a 1e18 °C range, a million-point outline). Each bound is a range a real
 * reflective segment display can take, with a margin; the message names the range and its unit.
 *
 * Sources: temperatures — absolute zero is −273.15 °C (SI); nematic mixtures for displays are used
 * from about −40 °C to their clearing point, rarely above 120 °C (common practice), so operating
 * ranges are bounded to −100…200 °C and clearing points to −50…250 °C. Gaps of TN cells are
 * 2–20 µm (common practice), bounded to 0.5…100 µm. Drive supplies of segment drivers are 1.8–15 V
 * (common practice), bounded to 100 V. Illuminance of direct sunlight is about 100 klx (common
 * practice), bounded to 200 klx. Counts are capped so a document's work stays proportional to
 * what a glass can carry.
 */
export const ABSOLUTE_ZERO_C = -273.15;

export const BOUNDS = {
	operating_C: { min: -100, max: 200, unit: '°C' },
	clearing_C: { min: -50, max: 250, unit: '°C' },
	coordinate_mm: { min: -10_000, max: 10_000, unit: 'mm' },
	glassSize_mm: { min: 0.1, max: 2_000, unit: 'mm' },
	gap_um: { min: 0.5, max: 100, unit: 'µm' },
	voltage_V: { min: 0, max: 100, unit: 'V' },
	frameRate_Hz: { min: 1, max: 10_000, unit: 'Hz' },
	biasDivisor: { min: 2, max: 100, unit: '' },
	tempCoeff_mV_per_K: { min: -1_000, max: 1_000, unit: 'mV/K' },
	viewingDistance_mm: { min: 10, max: 100_000, unit: 'mm' },
	illuminance_lx: { min: 0, max: 200_000, unit: 'lx' },
	switchingLimit_s: { min: 0, max: 3_600, unit: 's' },
	elastic_pN: { min: 0.01, max: 200, unit: 'pN' },
	permittivity: { min: 1, max: 500, unit: '' },
	viscosity_Pas: { min: 0, max: 1_000, unit: 'Pa·s' },
	activation_eV: { min: 0, max: 5, unit: 'eV' },
	orderExponent: { min: 0, max: 5, unit: '' },
	cauchyA: { min: 1, max: 3, unit: '' },
	cauchyB_um2: { min: -1, max: 1, unit: 'µm²' },
	cauchyC_um4: { min: -1, max: 1, unit: 'µm⁴' }
} as const;

/** Counts a document may hold; beyond them work (and the screen) stops being useful. */
export const LIMITS = {
	electrodes: 20_000,
	pointsPerContour: 100_000,
	holesPerElectrode: 1_000,
	lines: 1_024,
	groups: 20_000,
	groupMembers: 20_000,
	generatorParams: 200
} as const;

export type BoundName = keyof typeof BOUNDS;
