/**
 * The glass check on small hand-made designs whose answers follow from plain geometry, worked by
 * hand beside each case (rectangles grown by a margin, strips crossing strips).
 */
import { describe, expect, it } from 'vitest';
import { applyPatch } from '../../src/lib/core/commands/patch';
import { invertPatch } from '../../src/lib/core/commands/patch-algebra';
import { generateGlass } from '../../src/lib/core/commands/generate-glass';
import { addTrace, setGlassArt } from '../../src/lib/core/commands/set-glass-art';
import { CommandError } from '../../src/lib/core/commands/command-error';
import type { Design } from '../../src/lib/core/design/schema';
import { platePieces } from '../../src/lib/core/glass/back-plate-pieces';
import { checkGlass } from '../../src/lib/core/glass/check-glass';
import { planGlass } from '../../src/lib/core/glass/plan-glass';
import { glassExportFiles } from '../../src/lib/core/export/glass-export';
import { signedArea } from '../../src/lib/core/geometry/polygon';
import { expectWithin } from '../helpers/tolerance';
import { electrode } from '../commands/fixtures';
import { crossedPairGlass, twoElectrodeGlass } from './fixture';

const rect = (x: number, y: number, w: number, h: number) => [
	{ x, y },
	{ x: x + w, y },
	{ x: x + w, y: y + h },
	{ x, y: y + h }
];

const twoElectrodes = twoElectrodeGlass;

const codes = (d: Design) => checkGlass(d).findings.map((f) => f.code);

describe('back plates', () => {
	it('grow a rectangle by the overlap margin on every side', () => {
		const { pieces } = platePieces(twoElectrodes());
		// A 5 × 3 mm rectangle grown by 0.1 mm per side: 5.2 × 3.2 = 16.64 mm² (square mitred corners).
		expectWithin(
			pieces.map((p) => ({
				label: p.electrode.id,
				expected: 16.64,
				actual: Math.abs(signedArea(p.grown[0]))
			})),
			{ tolerance: 1e-9, unit: 'mm²', source: 'hand calculation: (5 + 2·0.1)(3 + 2·0.1)' }
		);
	});

	it('name the electrodes that force two commons to touch', () => {
		const d = twoElectrodes();
		// E2 moved to 0.02 mm from E1, below the 0.05 mm minimum gap.
		const close = {
			...d,
			electrodes: [d.electrodes[0], { ...d.electrodes[1], outline: rect(10.02, 5, 5, 3) }]
		};
		const f = checkGlass(close).findings.find((x) => x.code === 'glass.commons-touch');
		expect(f?.electrodes).toEqual(['e1', 'e2']);
		expect(f?.severity).toBe('fail');
	});
});

describe('generation', () => {
	it('names a glass too large to route at its pitch instead of failing inside the router', () => {
		// 2000 × 2000 mm at a 0.005 + 0.005 mm pitch: about (1999.4 / 0.01)² ≈ 4·10¹⁰ grid cells,
		// far above the router's 8 million.
		const d = twoElectrodes();
		const huge: Design = {
			...d,
			glass: { ...d.glass, width_mm: 2000, height_mm: 2000 },
			glassArt: { ...d.glassArt, traceWidth_mm: 0.005 },
			rules: { ...d.rules, minGap_mm: 0.005 }
		};
		const plan = planGlass(huge);
		expect(plan.glassArt.traces).toEqual([]);
		expect(plan.findings.map((f) => [f.code, f.severity])).toEqual([['glass.no-route', 'fail']]);
		expect(plan.findings[0].message).toContain('too large to route');
	});

	it('routes every electrode to its pad, passes the check, and undoes exactly', () => {
		const d = twoElectrodes();
		expect(codes(d)).toContain('glass.open');
		const patch = generateGlass(d);
		const after = applyPatch(d, patch);
		expect(after.glassArt.traces.length).toBeGreaterThan(0);
		expect(after.glassArt.transfers.map((t) => t.common)).toEqual(['com1', 'com2']);
		const report = checkGlass(after);
		expect(report.findings.filter((f) => f.severity === 'fail')).toEqual([]);
		expect(applyPatch(after, invertPatch(patch))).toEqual(d);
	});

	it('reports a named finding when no route exists', () => {
		const d = twoElectrodes();
		// A closed ring of SEG1 around an island of SEG2: the island has no way out on its plate.
		const ring = electrode('ring', rect(4, 4, 8, 6), {
			common: 'com1',
			line: 'seg1',
			holes: [rect(6, 6, 4, 2)]
		});
		const island = electrode('island', rect(7, 6.5, 2, 1), { common: 'com2', line: 'seg2' });
		const enclosed = {
			...d,
			electrodes: [ring, island, { ...d.electrodes[1], common: 'com2' as const }]
		};
		const plan = planGlass(enclosed);
		const noRoute = plan.findings.filter((f) => f.code === 'glass.no-route');
		expect(noRoute.flatMap((f) => f.electrodes)).toContain('island');
	});
});

describe('ghosts, shorts and bad geometry', () => {
	/** The two-electrode glass (or another), generated, plus one hand-drawn SEG1 lead. */
	function withHandTrace(
		points: { x: number; y: number }[],
		width_mm: number,
		base: () => Design = twoElectrodes
	): Design {
		const d = base();
		const routed = applyPatch(d, generateGlass(d));
		return applyPatch(
			routed,
			addTrace(routed, { id: 'hand', plate: 'segment', net: 'seg1', width_mm, points })
		);
	}

	// The last run lies at y = 8.07 (band 8.05–8.09), inside COM2's plate margin under E2
	// (plate 14.9–20.1 × 4.9–8.1) and 0.05 mm clear of E2 itself: overlap 5.2 × 0.04 = 0.208 mm².
	const underE2 = [
		{ x: 9.9, y: 6.5 },
		{ x: 12, y: 6.5 },
		{ x: 12, y: 8.07 },
		{ x: 22, y: 8.07 }
	];

	/** The hand lead's one overlap: (COM2, SEG1) at `where`, 0.208 mm² by hand. */
	function expectHandOverlap(report: ReturnType<typeof checkGlass>, where: string) {
		const ghosts = report.ghosts.filter((g) => g.conductor === 'hand');
		expect(ghosts.map((g) => [g.commonName, g.lineName, g.where])).toEqual([
			['COM2', 'SEG1', where]
		]);
		expectWithin(
			[{ label: `${where} overlap area`, expected: 0.208, actual: ghosts[0].area_mm2 }],
			{
				tolerance: 1e-9,
				unit: 'mm²',
				source: 'hand calculation: 5.2 mm × 0.04 mm strip'
			}
		);
	}

	it("reports a hand lead across another common's back plate with its pair and area", () => {
		const d = withHandTrace(underE2, 0.04, crossedPairGlass);
		const report = checkGlass(d);
		expectHandOverlap(report, 'visible');
		const f = report.findings.find((x) => x.code === 'glass.ghost-visible');
		expect(f?.message).toContain('(COM2, SEG1)');
		expect(f?.electrodes).toContain('e2');
		const composite = glassExportFiles(d, ['svg']).find((x) => x.name.endsWith('-composite.svg'))!;
		expect(composite.content).toMatch(
			/<path id="ghost-\d+" data-pair="COM2\/SEG1" data-where="visible"/
		);
	});

	it('calls the same crossing idle when no electrode uses its pair, and draws no ghost for it', () => {
		// Without E3, (COM2, SEG1) drives nothing: the multiplexed drive never selects that pair, so
		// the overlap only sees the unselected voltage (common practice: leads cross such commons).
		const d = withHandTrace(underE2, 0.04);
		const report = checkGlass(d);
		expectHandOverlap(report, 'idle');
		const idle = report.findings.find((x) => x.code === 'glass.ghost-idle');
		expect(idle?.severity).toBe('pass');
		expect(idle?.message).toContain('(COM2, SEG1)');
		expect(report.findings.some((x) => x.code === 'glass.ghost-visible')).toBe(false);
		const composite = glassExportFiles(d, ['svg']).find((x) => x.name.endsWith('-composite.svg'))!;
		expect(composite.content).not.toContain('data-pair="COM2/SEG1"');
	});

	it('reports a lead that runs into another line as a short', () => {
		const d = withHandTrace(
			[
				{ x: 9.9, y: 6.5 },
				{ x: 17, y: 6.5 }
			],
			0.1
		);
		expect(codes(d)).toContain('glass.short');
		// The hand lead touches E1 (it serves it) and runs into E2.
		const short = checkGlass(d).findings.find((f) => f.code === 'glass.short');
		expect(short?.electrodes.sort()).toEqual(['e1', 'e2']);
	});

	it('names the electrodes on a common whose transfer point has lost its lead to the pad', () => {
		const d = twoElectrodes();
		const routed = applyPatch(d, generateGlass(d));
		const cut = {
			...routed,
			glassArt: {
				...routed.glassArt,
				traces: routed.glassArt.traces.filter((t) => !(t.plate === 'segment' && t.net === 'com1'))
			}
		};
		const opens = checkGlass(cut).findings.filter((f) => f.code === 'glass.open');
		// COM1's transfer point is cut off from its pad: E1 is the one electrode on COM1.
		expect(opens.map((f) => f.electrodes)).toEqual([['e1']]);
	});

	it('names a transfer point off the seal, and one off the back glass', () => {
		// The two-electrode glass (30 × 20 mm, ledge 3 mm at the bottom): the seal runs 0.5–1.5 mm
		// in from the back glass's edge, so (10, 10) lies in the viewing area, (1, 10) under the
		// seal, and (1e6, 10) far off the glass.
		const d = twoElectrodes();
		const routed = applyPatch(d, generateGlass(d));
		const moved = (x: number, y: number): Design => ({
			...routed,
			glassArt: {
				...routed.glassArt,
				transfers: routed.glassArt.transfers.map((t) =>
					t.common === 'com1' ? { ...t, x_mm: x, y_mm: y } : t
				)
			}
		});
		const off = (x: number, y: number) =>
			checkGlass(moved(x, y)).findings.filter((f) => f.code === 'glass.transfer-off-seal');
		expect(off(1, 10)).toEqual([]);
		const inFluid = off(10, 10);
		expect(inFluid.map((f) => [f.severity, f.electrodes])).toEqual([['warn', ['e1']]]);
		expect(inFluid[0].location).toBeDefined();
		const far = off(1e6, 10);
		expect(far.map((f) => [f.severity, f.electrodes])).toEqual([['fail', ['e1']]]);
		expect(far[0].location).toBeUndefined();
		expect(far[0].message).toContain('COM1');
	});

	it("names the electrodes of both leads when a lead runs into another line's lead", () => {
		// From E1 down to y = 12 and across the glass below E2, where SEG2's lead comes down
		// from E2 (15–20 mm) to its pad: the two leads touch, and each serves one electrode.
		const d = withHandTrace(
			[
				{ x: 9.9, y: 6.5 },
				{ x: 12, y: 6.5 },
				{ x: 12, y: 12 },
				{ x: 25, y: 12 }
			],
			0.1
		);
		const shorts = checkGlass(d).findings.filter(
			(f) => f.code === 'glass.short' && f.message.includes('(SEG2)')
		);
		expect(shorts.length).toBeGreaterThan(0);
		for (const f of shorts) expect(f.electrodes).toEqual(expect.arrayContaining(['e1', 'e2']));
	});

	it('names self-crossing, zero-area and off-glass electrodes', () => {
		const d = twoElectrodes();
		const bowTie = electrode('bow', [
			{ x: 5, y: 10 },
			{ x: 7, y: 12 },
			{ x: 7, y: 10 },
			{ x: 5, y: 12 }
		]);
		const flat = electrode('flat', [
			{ x: 20, y: 10 },
			{ x: 22, y: 10 },
			{ x: 24, y: 10 }
		]);
		const off = electrode('off', rect(28, 2, 5, 2));
		const report = checkGlass({ ...d, electrodes: [...d.electrodes, bowTie, flat, off] });
		const by = (code: string) =>
			report.findings.filter((f) => f.code === code).flatMap((f) => f.electrodes);
		expect(by('glass.bad-outline').sort()).toEqual(['bow', 'flat']);
		expect(by('glass.off-glass')).toEqual(['off']);
	});

	it('checks the ledge against its connector', () => {
		const d = twoElectrodes();
		const pins = applyPatch(d, setGlassArt(d, { ledge: { connector: 'metal-pin', depth_mm: 2 } }));
		expect(codes(pins)).toContain('glass.pitch-connector');
		expect(codes({ ...pins, pinout: { ...pins.pinout, pitch_mm: 2.54 } })).not.toContain(
			'glass.pitch-connector'
		);
		expect(
			codes(applyPatch(d, setGlassArt(d, { ledge: { connector: 'elastomeric', depth_mm: 2 } })))
		).toContain('glass.ledge-short');
		expect(() => setGlassArt(d, { overlapMargin_mm: 5 })).toThrow(CommandError);
		expect(() => setGlassArt(d, { overlapMargin_mm: 5 })).toThrow(/glassArt\.overlapMargin_mm/);
	});
});
