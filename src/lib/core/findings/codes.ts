/**
 * Every finding code sunglyph can report, with its meaning: the list the README's "Finding codes"
 * table and the code-registry test read. Each analysis area keeps its codes in its own file.
 */
import { DRIVE_AND_OPTICS_CODES } from './codes-drive-optics';
import { WIRING_CODES } from './codes-wiring';
import { RULE_CODES } from './codes-rules';
import { LEGIBILITY_CODES } from './codes-legibility';
import { VIEW_ANGLE_CODES } from './codes-viewangle';
import { LOAD_CODES } from './codes-load';
import { RELIABILITY_CODES } from './codes-reliability';
import { GLASS_CODES } from './codes-glass';
import { GLASS_OUTLINE_CODES } from './codes-glass-outline';
import { FLUID_CODES } from './codes-fluid';

export interface FindingCode {
	code: string;
	meaning: string;
}

export const FINDING_CODES: readonly FindingCode[] = [
	...DRIVE_AND_OPTICS_CODES,
	...WIRING_CODES,
	...RULE_CODES,
	...LOAD_CODES,
	...LEGIBILITY_CODES,
	...VIEW_ANGLE_CODES,
	...GLASS_CODES,
	...GLASS_OUTLINE_CODES,
	...RELIABILITY_CODES,
	...FLUID_CODES
];

const KNOWN = new Set(FINDING_CODES.map((c) => c.code));

export function isKnownFindingCode(code: string): boolean {
	return KNOWN.has(code);
}
