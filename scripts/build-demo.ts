/**
 * Builds the demo design: the readout of a fictional battery-powered garden-water timer
 * ("Brookfern garden-water timer"). Four slanted 7-segment digits with decimal points and a colon, a ten-step
 * soil-moisture bar, a battery gauge and status icons, on four commons.
 *
 * Run: npx tsx scripts/build-demo.ts   (writes src/lib/core/design/demo-design.json)
 */
import { writeFileSync } from 'node:fs';
import type { Contour, Design, Electrode, Point } from '../src/lib/core/design/schema';
import { DESIGN_FORMAT, DESIGN_VERSION } from '../src/lib/core/design/schema';
import { generateSevenSegment } from '../src/lib/core/glyphs/seven-segment';
import { generateBarGraph } from '../src/lib/core/glyphs/bar-graph';
import { serializeDesign } from '../src/lib/core/design/parse-design';
import { DEFAULT_CELL } from '../src/lib/core/design/cell-schema';
import { DEFAULT_PINOUT, DEFAULT_RULES } from '../src/lib/core/design/rules-schema';
import { defaultLegibility } from '../src/lib/core/design/legibility-schema';
import { DEFAULT_ORIENTATION } from '../src/lib/core/design/orientation-schema';
import { DEFAULT_GLASS_ART } from '../src/lib/core/design/glass-art-schema';
import { planGlass } from '../src/lib/core/glass/plan-glass';
import { checkGlass } from '../src/lib/core/glass/check-glass';

const round = (v: number) => Math.round(v * 1e4) / 1e4;
const pt = (x: number, y: number, inH?: [number, number], outH?: [number, number]): Point => ({
	x: round(x),
	y: round(y),
	...(inH ? { in: inH } : {}),
	...(outH ? { out: outH } : {})
});
const rect = (x: number, y: number, w: number, h: number): Contour => [
	pt(x, y),
	pt(x + w, y),
	pt(x + w, y + h),
	pt(x, y + h)
];
const moved = (contour: Contour, dx: number, dy: number): Contour =>
	contour.map((p) => ({ ...p, x: round(p.x + dx), y: round(p.y + dy) }));
/** A circle of four cubic arcs (handle length 0.5523·r). */
const circle = (cx: number, cy: number, r: number): Contour => {
	const k = 0.5523 * r;
	return [
		pt(cx, cy - r, [-k, 0], [k, 0]),
		pt(cx + r, cy, [0, -k], [0, k]),
		pt(cx, cy + r, [k, 0], [-k, 0]),
		pt(cx - r, cy, [0, k], [0, -k])
	];
};

const electrodes: Electrode[] = [];
const groups: Design['groups'] = [];
function add(
	e: Omit<Electrode, 'holes' | 'common' | 'line' | 'locked'> & { holes?: Contour[] }
): string {
	electrodes.push({ holes: [], common: null, line: null, locked: false, ...e });
	return e.id;
}

// Digits: 12 mm high for reading across a garden shed at arm's length and beyond. Each digit is a
// regenerable group: its members are the generator's parts in order (a … g, dp).
const digit = {
	height_mm: 12,
	width_mm: 7,
	stroke_mm: 1.5,
	gap_mm: 0.35,
	slant_deg: 6,
	decimalPoint: true
};
const digitX = [8, 18, 31, 41];
const digitTop = 13;
digitX.forEach((x, index) => {
	const n = index + 1;
	const generated = generateSevenSegment({ ...digit, x_mm: x, y_mm: digitTop });
	const members = generated.parts.map((part) =>
		add({
			id: part.key === 'dp' ? `dp${n}` : `d${n}${part.key}`,
			name: part.key === 'dp' ? `DP${n}` : `${n}${part.key.toUpperCase()}`,
			kind: 'segment',
			outline: part.outline
		})
	);
	groups.push({
		id: `digit${n}`,
		name: `Digit ${n}`,
		members,
		generator: { kind: generated.kind, params: generated.params }
	});
});
add({
	id: 'colU',
	name: 'COL upper',
	kind: 'segment',
	outline: rect(27.9, digitTop + 2.8, 1.4, 1.4)
});
add({
	id: 'colL',
	name: 'COL lower',
	kind: 'segment',
	outline: rect(27.2, digitTop + 7.8, 1.4, 1.4)
});

// Ten-step soil-moisture bar under the digits.
const moisture = generateBarGraph({
	count: 10,
	x_mm: 8,
	y_mm: 29.5,
	width_mm: 4.2,
	height_mm: 2.2,
	spacing_mm: 0.6
});
const bars = moisture.parts.map((part, i) =>
	add({ id: `bar${i + 1}`, name: `BAR${i + 1}`, kind: 'segment', outline: part.outline })
);
groups.push({
	id: 'moisture',
	name: 'Moisture bar',
	members: bars,
	generator: { kind: moisture.kind, params: moisture.params }
});

// Battery gauge: a frame with a terminal nub, and three level cells inside. The frame is open for
// 1 mm in the middle of its top side, where the cells' leads leave; the cells sit 0.6 mm below
// the frame's top so the leads can run above them to that opening.
const bx = 6;
const by = 5.5;
const breakL = bx + 2.7;
const breakR = bx + 3.7;
add({
	id: 'batFrame',
	name: 'Battery frame',
	kind: 'icon',
	outline: [
		pt(breakR, by),
		pt(bx + 6.4, by),
		pt(bx + 6.4, by + 1),
		pt(bx + 7, by + 1),
		pt(bx + 7, by + 2.6),
		pt(bx + 6.4, by + 2.6),
		pt(bx + 6.4, by + 3.6),
		pt(bx, by + 3.6),
		pt(bx, by),
		pt(breakL, by),
		pt(breakL, by + 0.45),
		pt(bx + 0.45, by + 0.45),
		pt(bx + 0.45, by + 3.15),
		pt(bx + 5.95, by + 3.15),
		pt(bx + 5.95, by + 0.45),
		pt(breakR, by + 0.45)
	]
});
for (let i = 0; i < 3; i++) {
	add({
		id: `bat${i + 1}`,
		name: `Battery ${i + 1}`,
		kind: 'icon',
		outline: rect(bx + 0.7 + i * 1.72, by + 1.05, 1.55, 1.85)
	});
}

// Droplet (watering active): a pointed top and a round belly.
add({
	id: 'drop',
	name: 'Droplet',
	kind: 'icon',
	outline: moved(
		[
			pt(2.2, 0),
			pt(4.1, 3.5, [-0.55, -1.1], [0.45, 0.95]),
			pt(2.2, 5.4, [1.15, 0], [-1.15, 0]),
			pt(0.3, 3.5, [-0.45, 0.95], [0.55, -1.1])
		],
		17,
		4.6
	)
});

// Clock (schedule): a disc with its hands cut out.
add({
	id: 'clock',
	name: 'Clock',
	kind: 'icon',
	outline: circle(27.4, 7.3, 2.7),
	holes: [
		[pt(27.1, 5.3), pt(27.7, 5.3), pt(27.7, 7.0), pt(29.2, 7.0), pt(29.2, 7.6), pt(27.1, 7.6)]
	]
});

// Alarm bell with its clapper joined to the rim.
add({
	id: 'alarm',
	name: 'Alarm',
	kind: 'icon',
	outline: moved(
		[
			pt(2.6, 0.2, [-1.2, 0], [1.2, 0]),
			pt(4.4, 3.8, [0, -2.3], [0, 0.4]),
			pt(5.2, 4.6, [-0.5, -0.2]),
			pt(3.3, 4.6),
			pt(2.6, 5.5, [0.6, 0], [-0.6, 0]),
			pt(1.9, 4.6),
			pt(0, 4.6, undefined, [0.5, -0.2]),
			pt(0.8, 3.8, [0, 0.4], [0, -2.3])
		],
		34,
		4.6
	)
});

// Units: "L" for litres beside the last digit.
add({
	id: 'unitL',
	name: 'Unit L',
	kind: 'icon',
	outline: [pt(52.5, 19), pt(53.7, 19), pt(53.7, 23.8), pt(56.3, 23.8), pt(56.3, 25), pt(52.5, 25)]
});
// Rain pause: an open umbrella, watering is suspended while it rains.
add({
	id: 'rain',
	name: 'Rain pause',
	kind: 'icon',
	outline: [
		pt(44, 8.6, undefined, [0, -3.6]),
		pt(51, 8.6, [0, -3.6]),
		pt(47.8, 8.6),
		pt(47.8, 10.4, undefined, [0, 0.9]),
		pt(45.8, 10.4, [0, 0.9], [0, -0.3]),
		pt(46.4, 10.1, [0, -0.3], [0, 0.5]),
		pt(47.2, 10.1, [0, 0.5]),
		pt(47.2, 8.6)
	]
});

// Wiring in bands, as multiplexed glass is usually laid out so that each common's back plate can
// run across the glass without crossing another: COM1 along the top (the icon row and each digit's
// a and b), COM2 and COM3 through the middle of the digits (f, g / e, c), COM4 along the bottom
// (d, DP, the moisture bar and the unit). Digit k uses two lines, a, f, e, d on the first and
// b, g, c, DP on the second; every icon, bar step and colon dot has a line of its own, so its
// lead may cross the other commons' plates where no electrode uses the crossing pair.
// Pins follow the leads: each line's pin sits where its lead comes down, so leads run to the ledge
// without crossing. The digits and the bar steps come down through the gaps of the bar in order
// across the glass (a line's place is the centre of its lowest electrode); the icons' leads run
// over the top and down the right side, so their pins close the row, the rightmost icon's first.
// The colon's upper dot sends its lead up between the digits and joins the icons' leads.
const commons = ['COM1', 'COM2', 'COM3', 'COM4'].map((name, i) => ({ id: `com${i + 1}`, name }));
const lineWiring: (string | null)[][] = [];
for (let n = 1; n <= 10; n++) lineWiring.push([null, null, null, `bar${n}`]);
lineWiring.push([null, null, 'colL', null], [null, null, null, 'unitL']);
for (let n = 1; n <= 4; n++)
	lineWiring.push(
		[`d${n}a`, `d${n}f`, `d${n}e`, `d${n}d`],
		[`d${n}b`, `d${n}g`, `d${n}c`, `dp${n}`]
	);
const lowestCentre = (wiring: readonly (string | null)[]): number => {
	const outlines = wiring
		.filter((id): id is string => id !== null)
		.map((id) => electrodes.find((e) => e.id === id)!.outline);
	const lowest = outlines.reduce((a, b) =>
		Math.max(...a.map((p) => p.y)) >= Math.max(...b.map((p) => p.y)) ? a : b
	);
	return (Math.min(...lowest.map((p) => p.x)) + Math.max(...lowest.map((p) => p.x))) / 2;
};
lineWiring.sort((a, b) => lowestCentre(a) - lowestCentre(b));
for (const id of ['rain', 'alarm', 'colU', 'clock', 'drop', 'bat3', 'bat2', 'bat1', 'batFrame'])
	lineWiring.push(id === 'colU' ? [null, id, null, null] : [id, null, null, null]);
const lines: { id: string; name: string }[] = [];
lineWiring.forEach((wiring, k) => {
	const line = { id: `seg${k + 1}`, name: `SEG${k + 1}` };
	lines.push(line);
	wiring.forEach((id, i) => {
		if (id === null) return;
		const e = electrodes.find((x) => x.id === id)!;
		e.common = commons[i].id;
		e.line = line.id;
	});
});

const design: Design = {
	format: DESIGN_FORMAT,
	version: DESIGN_VERSION,
	name: 'Brookfern garden-water timer (demo)',
	glass: {
		width_mm: 66,
		height_mm: 42,
		viewingArea: { x_mm: 4, y_mm: 3, width_mm: 58, height_mm: 32 }
	},
	commons,
	segmentLines: lines,
	electrodes,
	groups,
	drive: {
		commons: 4,
		biasDivisor: 3,
		amplitude_V: 4.7,
		frameRate_Hz: 64,
		inversion: 'line',
		temperature: { min_C: 0, max_C: 40 }
	},
	thresholds: {
		source: 'computed',
		v10_V: 1.79,
		v90_V: 2.38,
		reference_C: 25,
		tempCoeff_mV_per_K: -5.5
	},
	viewing: { distance_mm: 600 },
	cell: DEFAULT_CELL,
	lighting: { illuminant: 'D65', observer: 2, illuminance_lx: 500 },
	rules: DEFAULT_RULES,
	// 29 lines and 4 commons on a 1.5 mm elastomeric pitch: the pads spread under the readout.
	pinout: { ...DEFAULT_PINOUT, pitch_mm: 1.5 },
	legibility: {
		...defaultLegibility({ distance_mm: 600, transflective: false }),
		reading: { text: '12:34', bars: 6, icons: ['batFrame', 'bat1', 'bat2', 'drop', 'clock'] }
	},
	orientation: DEFAULT_ORIENTATION,
	// Fine leads (50 µm) and a 50 µm back-plate margin, so leads pass through the 0.35 mm gaps
	// where the digits' segments meet.
	glassArt: { ...DEFAULT_GLASS_ART, overlapMargin_mm: 0.05, traceWidth_mm: 0.05 }
};

// The demo ships without a glass drawing: opening it, a designer generates the plates and traces
// in the Glass tab. The generator must give a drawing that passes every glass rule; this script
// refuses to write a demo for which it does not.
const plan = planGlass(design);
const glassFaults = [
	...plan.findings,
	...checkGlass({ ...design, glassArt: plan.glassArt }).findings
].filter((f) => f.severity !== 'pass');
if (glassFaults.length > 0) {
	console.error(
		`the generated glass drawing does not pass: ${glassFaults.length} glass findings (${[...new Set(glassFaults.map((f) => f.code))].join(', ')})`
	);
	process.exit(1);
}

const target = new URL('../src/lib/core/design/demo-design.json', import.meta.url);
writeFileSync(target, serializeDesign(design));
console.log(`wrote ${electrodes.length} electrodes on ${lines.length} lines to ${target.pathname}`);
