/**
 * Small designs for command tests: a handful of square electrodes, two commons, two lines and one
 * group, plus helpers to run commands and read electrodes back.
 */
import { DEFAULT_CELL, DEFAULT_LIGHTING } from '../../src/lib/core/design/cell-schema';
import { DEFAULT_PINOUT, DEFAULT_RULES } from '../../src/lib/core/design/rules-schema';
import { defaultLegibility } from '../../src/lib/core/design/legibility-schema';
import { DEFAULT_ORIENTATION } from '../../src/lib/core/design/orientation-schema';
import { DEFAULT_GLASS_ART } from '../../src/lib/core/design/glass-art-schema';
import {
	DESIGN_FORMAT,
	DESIGN_VERSION,
	type Contour,
	type Design,
	type Electrode
} from '../../src/lib/core/design/schema';
import { applyPatch, type Patch } from '../../src/lib/core/commands/patch';

export const square = (x: number, y: number, side = 2): Contour => [
	{ x, y },
	{ x: x + side, y },
	{ x: x + side, y: y + side },
	{ x, y: y + side }
];

export function electrode(id: string, outline: Contour, extra: Partial<Electrode> = {}): Electrode {
	return {
		id,
		name: id.toUpperCase(),
		kind: 'segment',
		outline,
		holes: [],
		common: null,
		line: null,
		locked: false,
		...extra
	};
}

export function emptyDesign(): Design {
	return {
		format: DESIGN_FORMAT,
		version: DESIGN_VERSION,
		name: 'test',
		glass: {
			width_mm: 60,
			height_mm: 40,
			viewingArea: { x_mm: 2, y_mm: 2, width_mm: 56, height_mm: 36 }
		},
		commons: [],
		segmentLines: [],
		electrodes: [],
		groups: [],
		drive: {
			commons: 2,
			biasDivisor: 2,
			amplitude_V: 3,
			frameRate_Hz: 64,
			inversion: 'frame',
			temperature: { min_C: 0, max_C: 50 }
		},
		thresholds: {
			source: 'manual',
			v10_V: 1.2,
			v90_V: 1.6,
			reference_C: 25,
			tempCoeff_mV_per_K: -4
		},
		viewing: { distance_mm: 500 },
		cell: structuredClone(DEFAULT_CELL),
		lighting: { ...DEFAULT_LIGHTING },
		rules: { ...DEFAULT_RULES },
		pinout: { ...DEFAULT_PINOUT },
		legibility: defaultLegibility({ distance_mm: 500, transflective: false }),
		orientation: { ...DEFAULT_ORIENTATION },
		glassArt: structuredClone(DEFAULT_GLASS_ART)
	};
}

/** Five squares e1…e5 in a row (x = 0, 4, 8, 12, 16), e1/e2 grouped, e1 wired to com1/seg1. */
export function testDesign(): Design {
	return {
		...emptyDesign(),
		commons: [
			{ id: 'com1', name: 'COM1' },
			{ id: 'com2', name: 'COM2' }
		],
		segmentLines: [
			{ id: 'seg1', name: 'SEG1' },
			{ id: 'seg2', name: 'SEG2' }
		],
		electrodes: [0, 1, 2, 3, 4].map((k) =>
			electrode(`e${k + 1}`, square(4 * k, 0), k === 0 ? { common: 'com1', line: 'seg1' } : {})
		),
		groups: [{ id: 'g1', name: 'Pair', members: ['e1', 'e2'] }]
	};
}

export const run = (design: Design, patch: Patch): Design => applyPatch(design, patch);

export const byId = (design: Design, id: string): Electrode => {
	const e = design.electrodes.find((x) => x.id === id);
	if (!e) throw new Error(`no electrode ${id}`);
	return e;
};

export const ids = (design: Design): string[] => design.electrodes.map((e) => e.id);
