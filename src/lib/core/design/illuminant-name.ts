/**
 * Checks a design's illuminant name against the illuminants the colour model can build, so an
 * unknown name is refused when the document is read (with its JSON path) instead of failing later
 * inside the optics.
 */
import { illuminantByName } from '../color/illuminant-by-name';

/** Null when `name` names a known illuminant, else the reason, listing the valid names. */
export function illuminantProblem(name: string): string | null {
	try {
		illuminantByName(name);
		return null;
	} catch (error) {
		return error instanceof Error ? error.message : String(error);
	}
}
