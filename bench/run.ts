/**
 * Speed figures of the physics core, as medians over repeated runs (machines are shared and noisy:
 * compare medians and ratios, not single timings). Not a test: it prints, it never fails.
 *
 * Run: npm run bench
 */
import { GENERIC_REFLECTIVE_TN } from '../src/lib/core/lc/presets';
import { cellAt } from '../src/lib/core/lc/cell';
import { solveDirector } from '../src/lib/core/lc/director';
import { createCellOptics } from '../src/lib/core/cell/cell-optics';
import { electroOpticCurve } from '../src/lib/core/cell/electro-optic-curve';
import { DEFAULT_CELL, DEFAULT_LIGHTING } from '../src/lib/core/design/cell-schema';
import { createStackEvaluator, createStackSpectra } from '../src/lib/core/optics/stack-evaluator';
import { stackOfCell } from '../src/lib/core/cell/resolve-cell';
import { indicesAt } from '../src/lib/core/lc/temperature';
import { gridWavelengths_nm, VISIBLE_5NM_GRID } from '../src/lib/core/color/spectrum';
import { analyzeDrive } from '../src/lib/core/drive/analyze-drive';
import { demoDesign } from '../src/lib/core/design/demo';
import { buildSpatialIndex } from '../src/lib/core/geometry/spatial-index';
import { hitTest } from '../src/lib/core/geometry/hit-test';
import { ellipseContour } from '../src/lib/core/geometry/primitive-shapes';
import { autoAssign } from '../src/lib/core/commands/auto-assign';
import { wiringBenchDesign } from './wiring-design';
import { checkDesignRules } from '../src/lib/core/rules/check-design-rules';
import { largeDesign } from './large-design';
import { analyzeCell as cellReportOf } from '../src/lib/core/cell/analyze-cell';
import { analyzeLegibility } from '../src/lib/core/legibility/analyze-legibility';
import { legibilityMap } from '../src/lib/core/legibility/legibility-map';
import { viewAngleBenchmarks } from './view-angle-bench';
import { analyzeLoad } from '../src/lib/core/load/analyze-load';
import { loadBenchDesign } from './load-design';

/** `BENCH_ONLY=glass npm run bench` times only the rows whose name contains the text. */
const ONLY = process.env.BENCH_ONLY ?? '';

interface Row {
	name: string;
	target_ms: number | null;
	median_ms: number;
	p90_ms: number;
	runs: number;
}

function measure(
	name: string,
	target_ms: number | null,
	runs: number,
	body: (i: number) => void
): Row {
	if (ONLY && !name.includes(ONLY))
		return { name, target_ms, median_ms: NaN, p90_ms: NaN, runs: 0 };
	for (let i = 0; i < Math.min(20, runs); i++) body(i); // warm-up
	const times: number[] = [];
	for (let i = 0; i < runs; i++) {
		const start = performance.now();
		body(i);
		times.push(performance.now() - start);
	}
	times.sort((a, b) => a - b);
	return {
		name,
		target_ms,
		median_ms: times[runs >> 1],
		p90_ms: times[Math.floor(runs * 0.9)],
		runs
	};
}

const cell = cellAt({
	geometry: { gap_um: 5, twist_deg: 90, pretilt_deg: 2, gapToPitch: 0.1 },
	material: GENERIC_REFLECTIVE_TN,
	temperature_C: 25
});
const slices = 60;
const base = solveDirector({ cell, voltage_V: 2, slices });
const rows: Row[] = [];

rows.push(
	measure('director solve, one voltage, 60 slices (warm start)', 2, 400, (i) => {
		solveDirector({ cell, voltage_V: 2 + 0.01 * ((i % 20) + 1), start: base, slices });
	})
);
rows.push(
	measure('director solve, one voltage, 60 slices (cold, from 0 V)', null, 100, (i) => {
		solveDirector({ cell, voltage_V: 2 + 0.01 * (i % 20), slices });
	})
);

const wavelengths_nm = gridWavelengths_nm(VISIBLE_5NM_GRID);
const ne = Float64Array.from(
	wavelengths_nm,
	(w) => indicesAt({ material: GENERIC_REFLECTIVE_TN, temperature_C: 25, wavelength_nm: w }).ne
);
const no = Float64Array.from(
	wavelengths_nm,
	(w) => indicesAt({ material: GENERIC_REFLECTIVE_TN, temperature_C: 25, wavelength_nm: w }).no
);
const evaluator = createStackEvaluator({
	wavelengths_nm,
	indicesAt: { ne, no },
	stack: stackOfCell(DEFAULT_CELL)
});
const offProfile = solveDirector({ cell, voltage_V: 0, slices });
const onProfile = solveDirector({ cell, voltage_V: 3, slices });
const offOut = createStackSpectra(wavelengths_nm.length);
const onOut = createStackSpectra(wavelengths_nm.length);
rows.push(
	measure(`on/off spectra, ${wavelengths_nm.length} wavelengths, normal incidence`, 1, 400, () => {
		evaluator.evaluate(offProfile, offOut);
		evaluator.evaluate(onProfile, onOut);
	})
);

const opticsAt = [-10, 25, 60].map((temperature_C) =>
	createCellOptics({ cell: DEFAULT_CELL, lighting: DEFAULT_LIGHTING, temperature_C })
);
rows.push(
	measure('electro-optic curves, 28 voltages × 3 temperatures, refined', 150, 15, () => {
		for (const optics of opticsAt)
			electroOpticCurve({
				optics,
				withSlices: (slices) =>
					createCellOptics({
						cell: DEFAULT_CELL,
						lighting: DEFAULT_LIGHTING,
						temperature_C: optics.temperature_C,
						slices
					})
			});
	})
);
rows.push(
	measure('electro-optic curves incl. building the 3 cell models', null, 15, () => {
		for (const temperature_C of [-10, 25, 60]) {
			electroOpticCurve({
				optics: createCellOptics({ cell: DEFAULT_CELL, lighting: DEFAULT_LIGHTING, temperature_C })
			});
		}
	})
);
const demo = demoDesign();
rows.push(
	measure('drive check of the demo design', null, 400, () => {
		analyzeDrive({ drive: demo.drive, thresholds: demo.thresholds });
	})
);
const wiringBench = wiringBenchDesign();
rows.push(
	measure('automatic wiring, 500 electrodes at 4 commons', 100, 100, () => {
		autoAssign(wiringBench, { commons: 4 });
	})
);

const curvedElectrodes = Array.from({ length: 320 }, (_, i) => ({
	id: `d${i}`,
	name: `d${i}`,
	kind: 'segment' as const,
	outline: ellipseContour({
		cx_mm: (i % 20) * 5,
		cy_mm: Math.floor(i / 20) * 5,
		rx_mm: 2,
		ry_mm: 1.5
	}),
	holes: [],
	common: null,
	line: null,
	locked: false
}));
rows.push(
	measure('spatial index: 320 curved electrodes, build + 1000 hit tests', 50, 30, () => {
		const index = buildSpatialIndex(curvedElectrodes);
		for (let k = 0; k < 1000; k++) hitTest(index, { x: (k * 7.3) % 100, y: (k * 3.1) % 80 }, 0.2);
	})
);

const large = largeDesign(500);
rows.push(
	measure('design-rule check, 500 electrodes (62 digits + bars)', 100, 40, () => {
		checkDesignRules(large);
	})
);

const demoCell = cellReportOf(demo);
const legibility = analyzeLegibility({ design: demo, cell: demoCell });
rows.push(
	measure('legibility: every scenario of the demo, given the cell report', 5, 200, () => {
		analyzeLegibility({ design: demo, cell: demoCell });
	})
);
rows.push(
	measure('legibility map, 48 × 24 points', 50, 200, () => {
		const office = legibility.scenarios[1];
		legibilityMap({
			scenario: office.scenario,
			light: office.light,
			frontSurfaceReflectance: demo.cell.frontSurfaceReflectance,
			groups: legibility.groups,
			settings: demo.legibility,
			columns: 48,
			rows: 24
		});
	})
);

for (const b of viewAngleBenchmarks(demo)) rows.push(measure(b.name, b.target_ms, b.runs, b.body));
const fresh = (d: typeof demo) => ({ ...d, electrodes: d.electrodes.map((e) => ({ ...e })) });
rows.push(
	measure('electrical load of the demo, areas flattened afresh', null, 100, () =>
		analyzeLoad(fresh(demo))
	)
);
const bigLoad = loadBenchDesign(500);
rows.push(
	measure('electrical load, 500 electrodes, areas flattened afresh', null, 20, () =>
		analyzeLoad(fresh(bigLoad))
	)
);
rows.push(
	measure('electrical load, 500 electrodes, areas known (an edit)', null, 40, () =>
		analyzeLoad(bigLoad)
	)
);

{
	// Glass drawing of 500 electrodes (a column bar graph at 1/8 duty): back plates, traces of both
	// plates, ghost check; and the router on a crowded glass it cannot finish, for its give-up time.
	const { benchGlassDesign, crowdedGlassDesign } = await import('./glass-design');
	const { platePieces } = await import('../src/lib/core/glass/back-plate-pieces');
	const { planGlass } = await import('../src/lib/core/glass/plan-glass');
	const { buildArtwork } = await import('../src/lib/core/glass/artwork');
	const { ghostCheck } = await import('../src/lib/core/glass/ghost-check');
	const glass = benchGlassDesign(500);
	const plan = planGlass(glass);
	if (plan.findings.length > 0)
		throw new Error(`the bench glass no longer routes whole: ${plan.findings[0].message}`);
	const planned = { ...glass, glassArt: plan.glassArt };
	rows.push(measure('glass: back plates of 500 electrodes', 300, 5, () => void platePieces(glass)));
	rows.push(
		measure('glass: route both plates, 500 electrodes', 300, 5, () => void planGlass(glass))
	);
	rows.push(
		measure('glass: artwork + ghost check, 500 electrodes', 300, 5, () => {
			ghostCheck(planned, buildArtwork(planned));
		})
	);
	rows.push(
		measure('glass: plates, leads and ghost check together, 500', 300, 5, () => {
			platePieces(glass);
			const routed = { ...glass, glassArt: planGlass(glass).glassArt };
			ghostCheck(routed, buildArtwork(routed));
		})
	);
	const crowded = crowdedGlassDesign(500);
	rows.push(
		measure('glass: route a crowded glass it cannot finish, 500', null, 3, () => {
			planGlass(crowded);
		})
	);
}

const pad = (text: string, width: number) => text.padEnd(width);
console.log(`Node ${process.version}, ${new Date().toISOString()}`);
console.log(
	`${pad('benchmark', 58)}${'median'.padStart(11)}${'p90'.padStart(11)}${'target'.padStart(10)}${'ratio'.padStart(8)}  runs`
);
for (const r of rows) {
	if (r.runs === 0) continue;
	const ratio = r.target_ms === null ? '' : (r.median_ms / r.target_ms).toFixed(2);
	console.log(
		`${pad(r.name, 58)}${(r.median_ms.toFixed(3) + ' ms').padStart(11)}${(r.p90_ms.toFixed(3) + ' ms').padStart(11)}` +
			`${(r.target_ms === null ? '—' : r.target_ms + ' ms').padStart(10)}${ratio.padStart(8)}  ${r.runs}`
	);
}
console.log('ratio = median / target; below 1 meets the target.');

// Memory: heap held by a full design analysis (three cell models, curves, report), as the
// difference of heap use around it after garbage collection where the runtime allows it.
const gc = (globalThis as { gc?: () => void }).gc;
const { analyzeCell } = await import('../src/lib/core/cell/analyze-cell');
analyzeCell(demo);
gc?.();
const before_MB = process.memoryUsage().heapUsed / 2 ** 20;
const kept = analyzeCell(demo);
gc?.();
const after_MB = process.memoryUsage().heapUsed / 2 ** 20;
console.log(
	`\nheap held by one cell report of the demo: ${((after_MB - before_MB) * 1024).toFixed(0)} kB ` +
		`(${kept.curves.length} curves; total heap ${after_MB.toFixed(1)} MB, RSS ${(process.memoryUsage().rss / 2 ** 20).toFixed(0)} MB` +
		`${gc ? '' : '; run with node --expose-gc for a settled figure'})`
);

// Start-up of the command line, beside a bare Node start.
await import('./cli');
