import { describe, expect, it } from 'vitest';
import { analyzeCell } from '../../src/lib/core/cell/analyze-cell';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';
import { analyzeDesign } from '../../src/lib/core/analyze-design';
import { analyzeLegibility } from '../../src/lib/core/legibility/analyze-legibility';
import { legibilityMap } from '../../src/lib/core/legibility/legibility-map';
import { isKnownFindingCode } from '../../src/lib/core/findings/codes';

const demo = demoDesign();
const cell = analyzeCell(demo);

/** The demo with every digit regenerated at `height_mm` and one scenario's distance changed. */
function withDigits(design: Design, height_mm: number, distance_mm: number): Design {
	return {
		...design,
		groups: design.groups.map((g) =>
			g.generator?.kind === 'seven-segment'
				? {
						...g,
						generator: {
							...g.generator,
							params: {
								...g.generator.params,
								height_mm,
								width_mm: height_mm * 0.6,
								stroke_mm: height_mm / 8
							}
						}
					}
				: g
		),
		legibility: {
			...design.legibility,
			scenarios: design.legibility.scenarios.map((s) => ({ ...s, distance_mm }))
		}
	};
}

describe('legibility of the demo readout', () => {
	const report = analyzeLegibility({ design: demo, cell });
	const byName = (name: string) => report.scenarios.find((s) => s.scenario.name === name)!;

	it('loses contrast in direct sun with a bright sky mirrored, against the office', () => {
		expect(byName('Direct sun').contrastRatio).toBeLessThan(byName('Office').contrastRatio);
		// the veil, not the cell, sets it: without the veil the two are alike
		expect(byName('Direct sun').contrastRatioWithoutVeil).toBeGreaterThan(
			3 * byName('Direct sun').contrastRatio
		);
		for (const s of report.scenarios)
			for (const g of s.groups) expect(Number.isFinite(g.visibilityLevel)).toBe(true);
	});

	it('turns 2 mm digits at 1 m into "not readable, too small for the distance"', () => {
		const small = withDigits(demo, 2, 1000);
		const r = analyzeLegibility({ design: small, cell });
		for (const s of r.scenarios) {
			expect(s.verdict).toBe('not readable');
			expect(s.groups[0].reasons[0].code).toBe('legibility.too-small');
			expect(s.groups[0].reasons[0].text).toMatch(/too small for the distance/);
		}
		const tooSmall = r.findings.filter((f) => f.code === 'legibility.too-small');
		expect(tooSmall).toHaveLength(r.scenarios.length);
		expect(tooSmall[0].severity).toBe('fail');
		expect(tooSmall[0].electrodes).toContain('d1a');
		// 16′ at 1 m needs 4.65 mm face on (physics notes §8), more at 15° off axis
		expect(tooSmall[0].fix).toMatch(/4\.8 mm/);
		// the design report carries it into the overall severity
		expect(analyzeDesign(small, { cell }).severity).toBe('fail');
	});

	it('reads differently at 20 lx and at 100 000 lx', () => {
		const two = {
			...demo,
			legibility: {
				...demo.legibility,
				scenarios: [
					{ ...byName('Dim room').scenario, name: 'dusk', illuminance_lx: 20, mirrored_cdm2: 2 },
					{ ...byName('Direct sun').scenario, name: 'noon' }
				]
			}
		};
		const [dusk, noon] = analyzeLegibility({ design: two, cell }).scenarios;
		expect(
			noon.light.background.luminance_cdm2 / dusk.light.background.luminance_cdm2
		).toBeGreaterThan(1000);
		expect(dusk.groups[0].threshold_cdm2).toBeLessThan(noon.groups[0].threshold_cdm2);
		expect(dusk.groups[0].visibilityLevel).not.toBeCloseTo(noon.groups[0].visibilityLevel, 0);
		expect(dusk.contrastRatio).not.toBeCloseTo(noon.contrastRatio, 0);
		// a dark evening with thin strokes: below threshold in the dark
		const thin = withDigits(
			{
				...two,
				legibility: {
					...two.legibility,
					scenarios: [{ ...two.legibility.scenarios[0], illuminance_lx: 0.05, mirrored_cdm2: 0 }]
				}
			},
			5,
			1000
		);
		const night = analyzeLegibility({ design: thin, cell }).scenarios[0];
		expect(night.groups[0].reasons.map((r) => r.text).join()).toMatch(/threshold in the dark/);
	});

	it('registers every code it reports, and cautions safety-relevant readouts', () => {
		const safety = { ...demo, legibility: { ...demo.legibility, safetyRelevant: true } };
		const r = analyzeLegibility({ design: safety, cell });
		expect(r.findings.every((f) => isKnownFindingCode(f.code))).toBe(true);
		const caution = r.findings.find((f) => f.code === 'legibility.safety-caution');
		expect(caution?.message).toMatch(/measured samples/);
		expect(caution?.message).toMatch(/product standards and local regulations/);
		expect(report.findings.some((f) => f.code === 'legibility.safety-caution')).toBe(false);
	});

	it('maps the visibility level over illuminance and distance, readable up close in good light', () => {
		const office = byName('Office');
		const map = legibilityMap({
			scenario: office.scenario,
			light: office.light,
			frontSurfaceReflectance: demo.cell.frontSurfaceReflectance,
			groups: report.groups,
			settings: demo.legibility,
			columns: 40,
			rows: 20
		});
		expect(map.illuminances_lx[0]).toBeCloseTo(1, 9);
		expect(map.illuminances_lx[39]).toBeCloseTo(120_000, 3);
		expect(map.visibilityLevel).toHaveLength(800);
		// brighter light raises VL at every distance; farther away lowers it
		for (let r = 0; r < 20; r++)
			expect(map.visibilityLevel[r * 40 + 39]).toBeGreaterThan(map.visibilityLevel[r * 40]);
		expect(map.visibilityLevel[19 * 40 + 20]).toBeLessThan(map.visibilityLevel[20]);
		expect(map.readable[20]).toBe(1);
		// 12 mm digits at 6 m subtend ≈ 6.6′ < 16′: never readable there
		expect(map.readable.slice(19 * 40, 20 * 40).every((v) => v === 0)).toBe(true);
	});

	it('reads at night only with the backlight of a transflective night case', () => {
		const night = {
			...byName('Dim room').scenario,
			name: 'night',
			illuminance_lx: 0.05,
			mirrored_cdm2: 0.01
		};
		const thin = withDigits(demo, 4, 1000);
		const design = (backlight_cdm2?: number) => ({
			...thin,
			legibility: {
				...thin.legibility,
				scenarios: [{ ...night, distance_mm: 1000, backlight_cdm2 }]
			}
		});
		const dark = analyzeLegibility({ design: design(), cell }).scenarios[0];
		const lit = analyzeLegibility({ design: design(20), cell }).scenarios[0];
		expect(dark.light.background.luminance_cdm2).toBeLessThan(0.02);
		expect(lit.light.background.luminance_cdm2).toBeGreaterThan(20);
		expect(lit.groups[0].visibilityLevel).toBeGreaterThan(10 * dark.groups[0].visibilityLevel);
		expect(lit.light.on.luminance_cdm2).toBeLessThan(lit.light.off.luminance_cdm2);
	});

	it('judges the cold and hot ends from their own cell states', () => {
		const cold = analyzeLegibility({ design: demo, cell, end: 'cold' });
		const hot = analyzeLegibility({ design: demo, cell, end: 'hot' });
		expect(cold.temperature_C).toBe(0);
		expect(hot.temperature_C).toBe(40);
		expect(cold.scenarios[1].light.on.luminance_cdm2).not.toBe(
			hot.scenarios[1].light.on.luminance_cdm2
		);
	});
});
