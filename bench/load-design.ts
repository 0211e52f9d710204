/**
 * A synthetic 500-electrode design for the load benchmark: a grid of bars with rounded ends
 * (curved outlines, so the area pays for flattening), wired 8 commons × 63 segment lines.
 */
import { demoDesign } from '../src/lib/core/design/demo';
import type { Design, Electrode } from '../src/lib/core/design/schema';

export function loadBenchDesign(count = 500, commons = 8): Design {
	const base = demoDesign();
	const lines = Math.ceil(count / commons);
	const k = 0.5523 * 0.3; // cubic handle of a 0.3 mm quarter circle
	const electrodes: Electrode[] = Array.from({ length: count }, (_, i) => {
		const x = 1 + (i % 25) * 2.4;
		const y = 1 + Math.floor(i / 25) * 1.9;
		return {
			id: `e${i}`,
			name: `E${i}`,
			kind: 'segment',
			outline: [
				{ x: x + 0.3, y, in: [-k, 0] },
				{ x: x + 1.7, y },
				{ x: x + 2, y: y + 0.3, in: [0, -k], out: [0, k] },
				{ x: x + 1.7, y: y + 0.6 },
				{ x: x + 0.3, y: y + 0.6, out: [-k, 0] },
				{ x, y: y + 0.3, in: [0, k], out: [0, -k] }
			],
			holes: [],
			common: `c${i % commons}`,
			line: `l${Math.floor(i / commons)}`,
			locked: false
		};
	});
	return {
		...base,
		name: 'load benchmark',
		commons: Array.from({ length: commons }, (_, i) => ({ id: `c${i}`, name: `COM${i + 1}` })),
		segmentLines: Array.from({ length: lines }, (_, i) => ({ id: `l${i}`, name: `SEG${i + 1}` })),
		electrodes,
		groups: [],
		drive: { ...base.drive, commons }
	};
}
