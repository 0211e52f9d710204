/*
 * Named CIE illuminants. A comes from its formula (illuminant-a.ts), the D series from the
 * daylight basis (daylight-illuminant.ts), F2, F11 and E from the CIE tables (data/). Tabulated
 * powers are converted to the published units (colord stores them divided by 100).
 * Source: CIE 15:2004 (illuminants A, D, F), CIE S 014-2:2006.
 */
import { CIE_F11, CIE_F2 } from './data/fluorescent-f2-f11';
import { CIE_E_TABLE } from './data/standard-illuminant-tables';
import type { SpectralTable } from './data/table-types';
import {
	DAYLIGHT_CCT_MAX_K,
	DAYLIGHT_CCT_MIN_K,
	daylightByNominalCct,
	daylightCctFromNominal_K
} from './daylight-illuminant';
import { illuminantA } from './illuminant-a';
import { spectrumFromTable } from './spectrum';
import type { Illuminant } from './types';

/** Illuminants with a fixed name; any D<nn> in the daylight range is accepted as well. */
export const FIXED_ILLUMINANT_NAMES = ['A', 'D50', 'D65', 'E', 'F2', 'F11'] as const;

const DAYLIGHT_NAME = /^D(\d{2,3})$/;
const NOMINAL_STEP_K = 100;

function fromTable(source: { name: string; table: SpectralTable; cct_K?: number }): Illuminant {
	const { name, table, cct_K } = source;
	const spectrum = spectrumFromTable({ ...table, scale: table.toPublishedUnits });
	return cct_K === undefined ? { name, spectrum } : { name, spectrum, cct_K };
}

/** F2 and F11 carry the CCTs CIE 15:2004 lists for them, K. */
const BUILDERS: Record<string, () => Illuminant> = {
	A: illuminantA,
	E: () => fromTable({ name: 'E', table: CIE_E_TABLE }),
	F2: () => fromTable({ name: 'F2', table: CIE_F2, cct_K: 4230 }),
	F11: () => fromTable({ name: 'F11', table: CIE_F11, cct_K: 4000 })
};

/** D<nn> names whose corrected CCT (nn·100 K · 1.4388/1.4380) lies inside the daylight fits. */
const DAYLIGHT_NAME_MIN = Math.ceil(DAYLIGHT_CCT_MIN_K / daylightCctFromNominal_K(NOMINAL_STEP_K));
const DAYLIGHT_NAME_MAX = Math.floor(DAYLIGHT_CCT_MAX_K / daylightCctFromNominal_K(NOMINAL_STEP_K));

const VALID_NAMES =
	`${FIXED_ILLUMINANT_NAMES.join(', ')}, or D${DAYLIGHT_NAME_MIN}…D${DAYLIGHT_NAME_MAX} ` +
	'(CIE daylight at a nominal nn·100 K, e.g. D75)';

function build(name: string): Illuminant {
	const builder = BUILDERS[name];
	if (builder) return builder();
	const daylight = DAYLIGHT_NAME.exec(name);
	const nn = daylight ? Number(daylight[1]) : NaN;
	if (nn >= DAYLIGHT_NAME_MIN && nn <= DAYLIGHT_NAME_MAX)
		return daylightByNominalCct(nn * NOMINAL_STEP_K);
	throw new Error(`Unknown illuminant "${name}". Valid names: ${VALID_NAMES}.`);
}

const byName = new Map<string, Illuminant>();

/**
 * The illuminant called `name` ('A', 'D50', 'D65', 'D75', 'E', 'F2', 'F11', case-insensitive).
 * Returns the same object for the same name, so weights cached per illuminant are shared.
 */
export function illuminantByName(name: string): Illuminant {
	const key = name.trim().toUpperCase();
	let illuminant = byName.get(key);
	if (!illuminant) {
		illuminant = build(key);
		byName.set(key, illuminant);
	}
	return illuminant;
}
