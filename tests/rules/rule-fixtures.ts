/** Small crafted designs for the design-rule tests: the demo's settings with chosen electrodes. */
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Contour, Design, Electrode } from '../../src/lib/core/design/schema';

export const box = (x: number, y: number, w: number, h: number): Contour => [
	{ x, y },
	{ x: x + w, y },
	{ x: x + w, y: y + h },
	{ x, y: y + h }
];

export const points = (...xy: number[]): Contour =>
	Array.from({ length: xy.length / 2 }, (_, i) => ({ x: xy[2 * i], y: xy[2 * i + 1] }));

let next = 0;
/** An electrode on its own (common, line) crossing unless told otherwise. */
export function electrode(
	outline: Contour,
	options: { id?: string; holes?: Contour[]; common?: string; line?: string } = {}
): Electrode {
	next += 1;
	return {
		id: options.id ?? `e${next}`,
		name: options.id ?? `E${next}`,
		kind: 'segment',
		outline,
		holes: options.holes ?? [],
		common: options.common ?? 'com1',
		line: options.line ?? `s${next}`,
		locked: false
	};
}

/** The demo's glass (66 × 42 mm, viewing area 4..62 × 3..35 mm) holding only `electrodes`. */
export function designWith(electrodes: Electrode[], overrides: Partial<Design> = {}): Design {
	const demo = demoDesign();
	const lines = [...new Set(electrodes.map((e) => e.line).filter((l): l is string => !!l))];
	const commons = [...new Set(electrodes.map((e) => e.common).filter((c): c is string => !!c))];
	return {
		...demo,
		commons: commons.map((id) => ({ id, name: id.toUpperCase() })),
		segmentLines: lines.map((id) => ({ id, name: id.toUpperCase() })),
		electrodes,
		groups: [],
		...overrides
	};
}
