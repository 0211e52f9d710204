import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';
import { planGlass } from '../../src/lib/core/glass/plan-glass';
import { electrode, emptyDesign } from '../commands/fixtures';

let routed: Design | null = null;

/** The demo with its glass drawing generated (transfer points and traces), computed once. */
export function routedDemo(): Design {
	if (!routed) {
		const demo = demoDesign();
		routed = { ...demo, glassArt: planGlass(demo).glassArt };
	}
	return routed;
}

const box = (x: number, y: number, w: number, h: number) => [
	{ x, y },
	{ x: x + w, y },
	{ x: x + w, y: y + h },
	{ x, y: y + h }
];

/**
 * The two-electrode glass plus E3 (COM2, SEG1), 3 × 1 mm at (16, 3.4) just above E2: the pair
 * (COM2, SEG1) now drives an electrode, so a SEG1 lead over COM2's plate lights a ghost.
 */
export function crossedPairGlass(): Design {
	const d = twoElectrodeGlass();
	return {
		...d,
		electrodes: [
			...d.electrodes,
			electrode('e3', box(16, 3.4, 3, 1), { common: 'com2', line: 'seg1' })
		]
	};
}

/**
 * Glass 30 × 20 mm, ledge at the bottom; E1 (COM1, SEG1) at (5, 5) and E2 (COM2, SEG2) at (15, 5),
 * both 5 × 3 mm, 5 mm apart: a drawing every part of the glass check can be worked by hand on.
 */
export function twoElectrodeGlass(): Design {
	return {
		...emptyDesign(),
		glass: {
			width_mm: 30,
			height_mm: 20,
			viewingArea: { x_mm: 3, y_mm: 3, width_mm: 24, height_mm: 11 }
		},
		commons: [
			{ id: 'com1', name: 'COM1' },
			{ id: 'com2', name: 'COM2' }
		],
		segmentLines: [
			{ id: 'seg1', name: 'SEG1' },
			{ id: 'seg2', name: 'SEG2' }
		],
		electrodes: [
			electrode('e1', box(5, 5, 5, 3), { common: 'com1', line: 'seg1' }),
			electrode('e2', box(15, 5, 5, 3), { common: 'com2', line: 'seg2' })
		]
	};
}
