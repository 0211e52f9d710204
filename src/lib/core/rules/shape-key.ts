/**
 * A key that is equal for two electrodes exactly when one is the other moved (translated) on the
 * 10 nm grid of the integer clipper: the rings relative to their bounds' corner. Results that do
 * not depend on position (width, stroke) are computed once per key within one check, so a row of
 * identical digits costs one digit. Lengths in millimetres.
 */
import { CLIP_UNITS_PER_mm } from '../geometry/polygon-clipper';
import type { IndexedElectrode } from '../geometry/spatial-index';

export function translationKey(entry: IndexedElectrode): string {
	const x0 = entry.bounds.minX;
	const y0 = entry.bounds.minY;
	const parts: string[] = [];
	for (const ring of entry.rings) {
		const coords: number[] = new Array(ring.length);
		for (let i = 0; i < ring.length; i += 2) {
			coords[i] = Math.round((ring[i] - x0) * CLIP_UNITS_PER_mm);
			coords[i + 1] = Math.round((ring[i + 1] - y0) * CLIP_UNITS_PER_mm);
		}
		parts.push(coords.join(','));
	}
	return parts.join('|');
}

/** Memoizes `compute` by translation key for the lifetime of one check. */
export function perShape<T>(compute: (entry: IndexedElectrode) => T) {
	const cache = new Map<string, T>();
	return (entry: IndexedElectrode): T => {
		const key = translationKey(entry);
		let value = cache.get(key);
		if (value === undefined) {
			value = compute(entry);
			cache.set(key, value);
		}
		return value;
	};
}
