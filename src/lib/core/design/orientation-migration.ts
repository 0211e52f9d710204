/**
 * Migration step 4 → 5: a document without a cell orientation gets the default one (rubbing
 * directions, right-handed twist, 0.7 mm rear glass). Nothing else changes; an orientation that
 * is already there is kept as it is.
 */
import { DEFAULT_ORIENTATION } from './orientation-schema';

export function addOrientation(doc: Record<string, unknown>): Record<string, unknown> {
	return { ...doc, orientation: doc.orientation ?? { ...DEFAULT_ORIENTATION } };
}
