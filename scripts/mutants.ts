/**
 * Plausible one-line mistakes in the physics, drive and glass core (sign, square, constant, wrong
 * operand, off by one). `npm run mutate` applies each to a temporary copy of the project and runs
 * the tests that guard that code: a mutant that survives is a missing test.
 */
export interface Mutant {
	id: string;
	file: string;
	/** Exact text replaced; each must occur once in the file. */
	edits: ReadonlyArray<readonly [from: string, to: string]>;
	/** Test files or folders to run (vitest filters). */
	tests: readonly string[];
}

const DRIVE = ['tests/drive'];
const OPTICS = ['tests/optics', 'tests/cell'];
const COLOR = ['tests/color'];
const LC = ['tests/lc'];
const LEGIBILITY = ['tests/legibility'];
const LOAD = ['tests/load'];

export const MUTANTS: readonly Mutant[] = [
	{
		id: 'rms: off level not squared',
		file: 'src/lib/core/drive/rms-drive.ts',
		edits: [['(n - 1 + (a - 2) * (a - 2))', '(n - 1 + (a - 2))']],
		tests: DRIVE
	},
	{
		id: 'rms: bias step over a − 1',
		file: 'src/lib/core/drive/rms-drive.ts',
		edits: [['const step_V = amplitude_V / a;', 'const step_V = amplitude_V / (a - 1);']],
		tests: DRIVE
	},
	{
		id: 'Alt–Pleshko limit: wrong denominator',
		file: 'src/lib/core/drive/rms-drive.ts',
		edits: [['Math.sqrt((root + 1) / (root - 1))', 'Math.sqrt((root + 1) / root)']],
		tests: DRIVE
	},
	{
		id: 'optimal bias: off by one',
		file: 'src/lib/core/drive/rms-drive.ts',
		edits: [['return Math.sqrt(commons) + 1;', 'return Math.sqrt(commons);']],
		tests: DRIVE
	},
	{
		id: 'window: off-side percent over V90',
		file: 'src/lib/core/drive/operating-window.ts',
		edits: [
			[
				"consider('off', point.temperature_C, offMargin_V, point.v10_V);",
				"consider('off', point.temperature_C, offMargin_V, point.v90_V);"
			]
		],
		tests: DRIVE
	},
	{
		id: 'window: arithmetic instead of geometric mean',
		file: 'src/lib/core/drive/operating-window.ts',
		edits: [['Math.sqrt(window.min_V * window.max_V)', '(window.min_V + window.max_V) / 2']],
		tests: DRIVE
	},
	{
		id: 'window: upper limit over k_on',
		file: 'src/lib/core/drive/operating-window.ts',
		edits: [['point.v10_V / unit.off_V', 'point.v10_V / unit.on_V']],
		tests: DRIVE
	},
	{
		id: 'temperature shift: sign',
		file: 'src/lib/core/drive/threshold-at-temperature.ts',
		edits: [
			['(temperature_C - thresholds.reference_C)', '(thresholds.reference_C - temperature_C)']
		],
		tests: DRIVE
	},
	{
		id: 'twist threshold: K22 weight',
		file: 'src/lib/core/lc/threshold.ts',
		edits: [['(material.k33_N - 2 * material.k22_N)', '(material.k33_N - material.k22_N)']],
		tests: LC
	},
	{
		id: 'twist threshold: chiral term factor',
		file: 'src/lib/core/lc/threshold.ts',
		edits: [['4 * material.k22_N * gapToPitch * turns', '2 * material.k22_N * gapToPitch * turns']],
		tests: LC
	},
	{
		id: 'threshold: missing π',
		file: 'src/lib/core/lc/threshold.ts',
		edits: [['return Math.PI * Math.sqrt(', 'return Math.sqrt(']],
		tests: LC
	},
	{
		id: 'twisted layer: opposite time convention',
		file: 'src/lib/core/optics/twisted-layer.ts',
		edits: [
			['out[1] = -halfGamma * sx;', 'out[1] = halfGamma * sx;'],
			['out[7] = halfGamma * sx;', 'out[7] = -halfGamma * sx;']
		],
		tests: OPTICS
	},
	{
		id: 'twisted layer: full instead of half retardation',
		file: 'src/lib/core/optics/twisted-layer.ts',
		edits: [['const halfGamma = retardation_rad / 2;', 'const halfGamma = retardation_rad;']],
		tests: OPTICS
	},
	{
		id: 'retardation: missing factor 2',
		file: 'src/lib/core/optics/twisted-layer.ts',
		edits: [
			['(2 * Math.PI * birefringence * thickness_m)', '(Math.PI * birefringence * thickness_m)']
		],
		tests: OPTICS
	},
	{
		id: 'polarizer: off-diagonal sign of amplitudes',
		file: 'src/lib/core/optics/polarizer.ts',
		edits: [['const offDiagonal = (t1 - t2) * c * s;', 'const offDiagonal = (t1 + t2) * c * s;']],
		tests: OPTICS
	},
	{
		id: 'polarizer: amplitude not square-rooted',
		file: 'src/lib/core/optics/polarizer.ts',
		edits: [['const t2 = Math.sqrt(k2);', 'const t2 = k2;']],
		tests: OPTICS
	},
	{
		id: 'Fresnel: not squared',
		file: 'src/lib/core/optics/fresnel.ts',
		edits: [['return r * r;', 'return Math.abs(r);']],
		tests: OPTICS
	},
	{
		id: 'ΔE00: G without complement',
		file: 'src/lib/core/color/delta-e-2000.ts',
		edits: [
			[
				'const G = 0.5 * (1 - chromaWeight(meanChroma));',
				'const G = 0.5 * chromaWeight(meanChroma);'
			]
		],
		tests: COLOR
	},
	{
		id: 'ΔE00: rotation term sign',
		file: 'src/lib/core/color/delta-e-2000.ts',
		edits: [['const RT = -Math.sin(', 'const RT = Math.sin(']],
		tests: COLOR
	},
	{
		id: 'ΔE00: S_L constant',
		file: 'src/lib/core/color/delta-e-2000.ts',
		edits: [['(0.015 * Lbar50sq)', '(0.15 * Lbar50sq)']],
		tests: COLOR
	},
	{
		id: 'CIELAB: linear segment offset dropped',
		file: 'src/lib/core/color/cielab.ts',
		edits: [['t * LINEAR_SLOPE + LINEAR_OFFSET', 't * LINEAR_SLOPE']],
		tests: COLOR
	},
	{
		id: 'tristimulus: Z from the y weights',
		file: 'src/lib/core/color/spectrum-to-xyz.ts',
		edits: [['Z += z[i] * r;', 'Z += y[i] * r;']],
		tests: COLOR
	},
	{
		id: 'Lambertian luminance: missing π',
		file: 'src/lib/core/color/lambertian-luminance.ts',
		edits: [['(reflectance * illuminance_lx) / Math.PI', 'reflectance * illuminance_lx']],
		tests: COLOR
	},
	{
		id: 'Adrian: Ricco coefficient',
		file: 'src/lib/core/legibility/adrian-threshold.ts',
		edits: [['sqrtL: 0.05946 * lb ** 0.466', 'sqrtL: 0.5946 * lb ** 0.466']],
		tests: LEGIBILITY
	},
	{
		id: 'Adrian: age factor divisor',
		file: 'src/lib/core/legibility/adrian-threshold.ts',
		edits: [['(age_years - 19) ** 2 / 2160 + 0.99', '(age_years - 19) ** 2 / 216 + 0.99']],
		tests: LEGIBILITY
	},
	{
		id: 'visual angle: full size over distance',
		file: 'src/lib/core/legibility/visual-angle.ts',
		edits: [
			['Math.atan(projected_mm / (2 * distance_mm))', 'Math.atan(projected_mm / distance_mm)']
		],
		tests: LEGIBILITY
	},
	{
		id: 'capacitance: gap in mm instead of µm',
		file: 'src/lib/core/load/capacitance.ts',
		edits: [['/ (gap_um * M_PER_UM)', '/ (gap_um * M_PER_UM * 1000)']],
		tests: LOAD
	},
	{
		id: 'waveform energy: C·ΔV² without the half',
		file: 'src/lib/core/load/waveform-energy.ts',
		edits: [['if (a) kOn += p * 0.5 * dv * dv;', 'if (a) kOn += p * dv * dv;']],
		tests: LOAD
	},
	{
		id: 'stack: polarisation-kept return without the half',
		file: 'src/lib/core/optics/stack-evaluator.ts',
		edits: [
			[
				'const kept = 0.5 * frobeniusNormSquared(round);',
				'const kept = frobeniusNormSquared(round);'
			]
		],
		tests: ['tests/optics/reflective-stack.test.ts']
	},
	{
		id: 'director: twist elastic constant halved',
		file: 'src/lib/core/lc/director-kernel.ts',
		edits: [
			['ws.k22 = options.k22_N / options.k11_N;', 'ws.k22 = (0.5 * options.k22_N) / options.k11_N;']
		],
		tests: ['tests/cell/cell-cli.test.ts']
	},
	{
		id: 'fluid limits: a fluid clearing at the hottest temperature passes',
		file: 'src/lib/core/cell/fluid-limits.ts',
		edits: [['if (max_C < clearing_C) return [];', 'if (max_C <= clearing_C) return [];']],
		tests: ['tests/cell/fluid-limits.test.ts']
	},
	{
		id: 'fluid limits: the clearing point itself counted as nematic',
		file: 'src/lib/core/cell/fluid-limits.ts',
		edits: [['(t) => t < options.clearing_C', '(t) => t <= options.clearing_C']],
		tests: ['tests/cell/fluid-limits.test.ts']
	},
	{
		id: 'ghost check: a crossing of an unused pair counted as lit',
		file: 'src/lib/core/glass/ghost-check.ts',
		edits: [
			[
				"const where: GhostPlace = pair.length > 0 ? placed : 'idle';",
				'const where: GhostPlace = placed;'
			]
		],
		tests: ['tests/glass/glass-check.test.ts', 'tests/glass/ghost-electrodes.test.ts']
	},
	{
		id: 'ghost costs: a crossing behind the bezel as dear as in view',
		file: 'src/lib/core/glass/ghost-costs.ts',
		edits: [
			[
				'zone === ZONE_VIEW ? GHOST_COST_VIEW : GHOST_COST_BEZEL',
				'zone === ZONE_VIEW ? GHOST_COST_VIEW : GHOST_COST_VIEW'
			]
		],
		tests: ['tests/glass/ghost-costs.test.ts']
	},
	{
		id: "routing: a lead pays the ghost cost over its own electrode's back plate",
		file: 'src/lib/core/glass/grid-search.ts',
		edits: [
			['(home !== null && home[next] === net)', '(home !== null && home[next] === -net - 3)']
		],
		tests: ['tests/glass/grid-search.test.ts']
	},
	{
		id: 'routing: a straight run claims cells out to the clearance along one axis only',
		file: 'src/lib/core/glass/route-grid.ts',
		edits: [['if (dx * dx + dy * dy >= reach2) continue;', 'if (dx * dx >= reach2) continue;']],
		tests: ['tests/glass/grid-search.test.ts']
	}
];
