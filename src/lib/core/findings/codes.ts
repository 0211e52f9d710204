/**
 * Every finding code sunglyph can report, with its meaning: the list the README's "Finding codes"
 * table and the code-registry test read. Each analysis area keeps its codes in its own file.
 */
import { DRIVE_AND_OPTICS_CODES } from './codes-drive-optics';
import { GLASS_CODES } from './codes-glass';

export interface FindingCode {
	code: string;
	meaning: string;
}

export const FINDING_CODES: readonly FindingCode[] = [...DRIVE_AND_OPTICS_CODES, ...GLASS_CODES];

const KNOWN = new Set(FINDING_CODES.map((c) => c.code));

export function isKnownFindingCode(code: string): boolean {
	return KNOWN.has(code);
}
