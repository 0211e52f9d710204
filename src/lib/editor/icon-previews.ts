/** SVG path data of each library icon drawn in a 24 mm box, made once and kept for the picker. */
import { generateIcon } from '$lib/core/glyphs/icons/icon-library';
import { shapeToPathData } from '$lib/core/geometry/path-data';

const cache = new Map<string, string>();

export function iconPreviewPath(id: string): string {
	let d = cache.get(id);
	if (d === undefined) {
		d = generateIcon({ icon: id, size_mm: 24 })
			.parts.map((p) => shapeToPathData(p, 2))
			.join('');
		cache.set(id, d);
	}
	return d;
}
