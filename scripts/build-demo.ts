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
	gap_mm: 0.12,
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

// Battery gauge: a frame with a terminal nub, and three level cells inside.
const bx = 6;
const by = 5.5;
add({
	id: 'batFrame',
	name: 'Battery frame',
	kind: 'icon',
	outline: [
		pt(bx, by),
		pt(bx + 6.4, by),
		pt(bx + 6.4, by + 1),
		pt(bx + 7, by + 1),
		pt(bx + 7, by + 2.6),
		pt(bx + 6.4, by + 2.6),
		pt(bx + 6.4, by + 3.6),
		pt(bx, by + 3.6)
	],
	holes: [rect(bx + 0.45, by + 0.45, 5.5, 2.7)]
});
for (let i = 0; i < 3; i++) {
	add({
		id: `bat${i + 1}`,
		name: `Battery ${i + 1}`,
		kind: 'icon',
		outline: rect(bx + 0.7 + i * 1.72, by + 0.7, 1.55, 2.2)
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

// Wiring: digit k uses two lines; a, f, e, d on the first and b, g, c, DP on the second.
const commons = ['COM1', 'COM2', 'COM3', 'COM4'].map((name, i) => ({ id: `com${i + 1}`, name }));
const lines: { id: string; name: string }[] = [];
const assign = (ids: readonly string[]) => {
	const line = { id: `seg${lines.length + 1}`, name: `SEG${lines.length + 1}` };
	lines.push(line);
	ids.forEach((id, i) => {
		const e = electrodes.find((x) => x.id === id)!;
		e.common = commons[i].id;
		e.line = line.id;
	});
};
for (let n = 1; n <= 4; n++) {
	assign([`d${n}a`, `d${n}f`, `d${n}e`, `d${n}d`]);
	assign([`d${n}b`, `d${n}g`, `d${n}c`, `dp${n}`]);
}
assign(['bar1', 'bar2', 'bar3', 'bar4']);
assign(['bar5', 'bar6', 'bar7', 'bar8']);
assign(['bar9', 'bar10', 'colU', 'colL']);
assign(['batFrame', 'bat1', 'bat2', 'bat3']);
assign(['drop', 'clock', 'alarm', 'unitL']);
assign(['rain']);

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
	pinout: DEFAULT_PINOUT,
	legibility: {
		...defaultLegibility({ distance_mm: 600, transflective: false }),
		reading: { text: '12:34', bars: 6, icons: ['batFrame', 'bat1', 'bat2', 'drop', 'clock'] }
	},
	orientation: DEFAULT_ORIENTATION,
	glassArt: DEFAULT_GLASS_ART
};

// The glass drawing (transfer points and traces) is generated for the drawing above and stored
// only when it passes the glass check: the demo must pass every check it is judged by.
const plan = planGlass(design);
const planned: Design = { ...design, glassArt: plan.glassArt };
const glassFaults = [...plan.findings, ...checkGlass(planned).findings].filter(
	(f) => f.severity !== 'pass'
);
const withGlass: Design = glassFaults.length === 0 ? planned : design;
if (glassFaults.length > 0)
	console.log(
		`glass drawing not stored: ${glassFaults.length} open glass findings (${[...new Set(glassFaults.map((f) => f.code))].join(', ')})`
	);

const target = new URL('../src/lib/core/design/demo-design.json', import.meta.url);
writeFileSync(target, serializeDesign(withGlass));
console.log(`wrote ${electrodes.length} electrodes on ${lines.length} lines to ${target.pathname}`);
