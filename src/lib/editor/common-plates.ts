/**
 * The extent of each common on the back plate: the bounds of the electrodes it faces. Drawn as a
 * dashed frame per common so overlapping or far-flung commons stand out.
 */
import type { Design } from '$lib/core/design/schema';
import type { Bounds } from '$lib/core/geometry/bounds';
import { contourTightBounds } from '$lib/core/geometry/tight-bounds';
import { EMPTY_BOUNDS } from '$lib/core/geometry/bounds';

export function commonPlates(
	design: Design,
	colourOf: (index: number) => string
): { id: string; name: string; colour: string; bounds: Bounds }[] {
	return design.commons.map((c, i) => {
		const bounds = { ...EMPTY_BOUNDS };
		for (const e of design.electrodes) if (e.common === c.id) contourTightBounds(e.outline, bounds);
		return { id: c.id, name: c.name, colour: colourOf(i), bounds };
	});
}
