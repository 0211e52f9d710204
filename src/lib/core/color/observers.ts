/*
 * CIE standard colorimetric observers as colour-matching functions x̄(λ), ȳ(λ), z̄(λ):
 * the CIE 1931 2° observer (fields up to about 4°, e.g. a segment seen at reading distance)
 * and the CIE 1964 10° observer (larger fields). Tables at 5 nm, 360–830 nm, from data/.
 * Source: CIE 15:2004, CIE S 014-1:2006 (ISO/CIE 11664-1).
 */
import { CIE1931_2DEG_CMF } from './data/cie1931-2deg';
import { CIE1964_10DEG_CMF } from './data/cie1964-10deg';
import type { ColorMatchingTable } from './data/table-types';
import { spectrumFromTable, type Spectrum } from './spectrum';

export const OBSERVER_NAMES = ['CIE1931-2deg', 'CIE1964-10deg'] as const;
export type ObserverName = (typeof OBSERVER_NAMES)[number];

/** The default observer for colour of small display segments. */
export const DEFAULT_OBSERVER: ObserverName = 'CIE1931-2deg';

export interface ColorMatchingFunctions {
	readonly observer: ObserverName;
	readonly xBar: Spectrum;
	readonly yBar: Spectrum;
	readonly zBar: Spectrum;
}

const TABLES: Record<ObserverName, ColorMatchingTable> = {
	'CIE1931-2deg': CIE1931_2DEG_CMF,
	'CIE1964-10deg': CIE1964_10DEG_CMF
};

const built = new Map<ObserverName, ColorMatchingFunctions>();

/** The colour-matching functions of an observer (built once, then shared). */
export function colorMatchingFunctions(observer: ObserverName): ColorMatchingFunctions {
	const table = TABLES[observer];
	if (!table)
		throw new Error(
			`Unknown observer "${observer}". Valid observers: ${OBSERVER_NAMES.join(', ')}.`
		);
	let cmfs = built.get(observer);
	if (!cmfs) {
		const { start_nm, step_nm } = table;
		cmfs = {
			observer,
			xBar: spectrumFromTable({ start_nm, step_nm, values: table.xBar }),
			yBar: spectrumFromTable({ start_nm, step_nm, values: table.yBar }),
			zBar: spectrumFromTable({ start_nm, step_nm, values: table.zBar })
		};
		built.set(observer, cmfs);
	}
	return cmfs;
}
