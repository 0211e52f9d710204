import { describe, expect, it } from 'vitest';
import { expectWithin } from '../helpers/tolerance';
import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';
import { shadowOffset_mm } from '../../src/lib/core/viewangle/parallax';
import {
	matchingRearRubbing,
	rubbingTwistMismatch_deg,
	twistFromRubbing
} from '../../src/lib/core/viewangle/rubbing-twist';
import { orientationFindings } from '../../src/lib/core/viewangle/orientation-findings';
import { contrastMap } from '../../src/lib/core/viewangle/contrast-map';
import { bestDirection } from '../../src/lib/core/viewangle/best-direction';
import { clockHour } from '../../src/lib/core/optics/oblique/view-direction';
import { isKnownFindingCode } from '../../src/lib/core/findings/codes';
import { analyzeDesign } from '../../src/lib/core/analyze-design';
import { viewAngleReport } from '../../src/lib/core/viewangle/view-angle-report';

const coarse = { polarStep_deg: 20, azimuthStep_deg: 30 };
const angleGap = (a: number, b: number) => Math.abs(((a - b + 540) % 360) - 180);

describe('parallax shadow', () => {
	it('matches the worked example and Snell’s law', () => {
		// physics-notes §8 (Snell's law, worked): t = 0.7 mm, θ = 30°, n_g = 1.52 → ≈ 0.48 mm;
		// at the normal there is no offset; 2·t·tan(asin(sin θ / n)) in closed form for the others.
		const closed = (t: number, deg: number, n = 1.52) =>
			2 * t * Math.tan(Math.asin(Math.sin((deg * Math.PI) / 180) / n));
		expectWithin(
			[
				{
					label: '0.7 mm 30° (worked)',
					expected: 0.48,
					actual: shadowOffset_mm({ rearGlass_mm: 0.7, polar_deg: 30 })
				},
				{
					label: '0.4 mm 0°',
					expected: 0,
					actual: shadowOffset_mm({ rearGlass_mm: 0.4, polar_deg: 0 })
				}
			],
			{ tolerance: 0.01, unit: 'mm', source: 'physics-notes §8 worked example (Snell)' }
		);
		const cases = [0.4, 0.55, 0.7, 1.1].flatMap((t) =>
			[10, 45, 70].map((deg) => ({
				label: `${t} mm ${deg}°`,
				expected: closed(t, deg),
				actual: shadowOffset_mm({ rearGlass_mm: t, polar_deg: deg })
			}))
		);
		expectWithin(cases, { tolerance: 1e-12, unit: 'mm', source: "Snell's law" });
	});

	it('is flagged against the narrowest stroke and named in the design analysis', () => {
		const thick = demoDesign();
		thick.orientation.rearGlass_mm = 1.1;
		const found = orientationFindings(thick).find((f) => f.code === 'viewangle.parallax-shadow');
		expect(found?.electrodes.length).toBe(1);
		const thin = demoDesign();
		thin.orientation.rearGlass_mm = 0.1;
		expect(orientationFindings(thin).map((f) => f.code)).not.toContain('viewangle.parallax-shadow');
		expect(analyzeDesign(thick).opticsFindings.map((f) => f.code)).toContain(
			'viewangle.parallax-shadow'
		);
	});
});

describe('rubbing directions and twist', () => {
	it('derive the twist of a splay-free cell from the rubbing directions and sense', () => {
		// common practice: front and rear rubbing 90° apart (anti-parallel offset by the twist) for a 90° TN
		const o = demoDesign().orientation;
		expect(
			twistFromRubbing({
				...o,
				frontRubbing_deg: 135,
				rearRubbing_deg: 45,
				twistSense: 'right-handed'
			})
		).toBe(90);
		expect(
			twistFromRubbing({
				...o,
				frontRubbing_deg: 135,
				rearRubbing_deg: 225,
				twistSense: 'left-handed'
			})
		).toBe(90);
		expect(
			twistFromRubbing({
				...o,
				frontRubbing_deg: 0,
				rearRubbing_deg: 180,
				twistSense: 'right-handed'
			})
		).toBe(0);
		expect(
			matchingRearRubbing({ ...o, frontRubbing_deg: 10, twistSense: 'right-handed' }, 90)
		).toBe(280);
		expect(rubbingTwistMismatch_deg({ ...o, frontRubbing_deg: 135, rearRubbing_deg: 60 }, 90)).toBe(
			15
		);
	});

	it('flag a rear rubbing that does not build the cell’s twist', () => {
		const design = demoDesign();
		design.orientation.rearRubbing_deg = 75;
		const codes = orientationFindings(design).map((f) => f.code);
		expect(codes).toContain('viewangle.rubbing-twist-mismatch');
		expect(orientationFindings(demoDesign()).map((f) => f.code)).not.toContain(
			'viewangle.rubbing-twist-mismatch'
		);
	});
});

describe('best viewing direction', () => {
	it('reads azimuths as clock hours (3 o’clock = 0°, clockwise)', () => {
		expect([0, 90, 180, 270, 30, 359].map(clockHour)).toEqual([3, 6, 9, 12, 4, 3]);
	});

	it('finds the peak of a synthetic map between samples', () => {
		const azimuth_deg = Array.from({ length: 24 }, (_, i) => i * 15);
		const polar_deg = [0, 20, 40];
		const contrast = polar_deg.map((p) =>
			azimuth_deg.map((a) => 5 + (p / 10) * Math.cos(((a - 100) * Math.PI) / 180))
		);
		const best = bestDirection({ polar_deg, azimuth_deg, contrast });
		expect(angleGap(best.azimuth_deg, 100)).toBeLessThan(3);
		expect(best.clock).toBe(6);
	});
});

describe('contrast map of a design', () => {
	const demo = demoDesign();
	const rotated: Design = structuredClone(demo);
	rotated.orientation.frontRubbing_deg = (demo.orientation.frontRubbing_deg + 180) % 360;
	rotated.orientation.rearRubbing_deg = (demo.orientation.rearRubbing_deg + 180) % 360;

	it('turns with the rubbing directions: 180° moves the best direction to the opposite side', () => {
		const a = contrastMap({ design: demo, ...coarse });
		const b = contrastMap({ design: rotated, ...coarse });
		expect(angleGap(b.best.azimuth_deg, a.best.azimuth_deg + 180)).toBeLessThan(1e-6);
		// the whole map turns: azimuth index shifts by 180°/30° = 6
		const n = a.azimuth_deg.length;
		const cases = a.contrast.flatMap((row, p) =>
			row.map((c, i) => ({
				label: `θ=${a.polar_deg[p]} φ=${a.azimuth_deg[i]}`,
				expected: c,
				actual: b.contrast[p][(i + 6) % n]
			}))
		);
		expectWithin(cases, { tolerance: 1e-9, unit: '(contrast ratio)', source: 'rotation symmetry' });
	});

	it('mirrors about the front rubbing plane when the twist sense reverses', () => {
		const left: Design = structuredClone(demo);
		left.orientation.twistSense = 'left-handed';
		left.orientation.rearRubbing_deg =
			(2 * demo.orientation.frontRubbing_deg - demo.orientation.rearRubbing_deg + 720) % 360;
		expect(orientationFindings(left).map((f) => f.code)).not.toContain(
			'viewangle.rubbing-twist-mismatch'
		);
		const a = contrastMap({ design: demo, polarStep_deg: 20, azimuthStep_deg: 45 });
		const b = contrastMap({ design: left, polarStep_deg: 20, azimuthStep_deg: 45 });
		const n = a.azimuth_deg.length;
		const mirrorIndex = (i: number) =>
			((((2 * demo.orientation.frontRubbing_deg - a.azimuth_deg[i]) / 45) % n) + n) % n;
		const cases = a.contrast.flatMap((row, p) =>
			row.map((c, i) => ({
				label: `θ=${a.polar_deg[p]} φ=${a.azimuth_deg[i]}`,
				expected: c,
				actual: b.contrast[p][mirrorIndex(i)]
			}))
		);
		expectWithin(cases, { tolerance: 1e-9, unit: '(contrast ratio)', source: 'mirror symmetry' });
	});

	it('has the same contrast at the normal for every azimuth, and reports registered findings', () => {
		const report = viewAngleReport({ design: demo, ...coarse });
		const row = report.map.contrast[0];
		for (const c of row) expect(c).toBeCloseTo(row[0], 12);
		expect(report.map.polar_deg).toEqual([0, 20, 40, 60]);
		for (const f of report.findings) expect(isKnownFindingCode(f.code), f.code).toBe(true);
		expect(report.findings.map((f) => f.code)).toContain('viewangle.best-direction');
		expect(report.map.cones.map((c) => c.level)).toEqual([3, 5, 10, 20]);
	});

	it('refuses steps that would make an unbounded map', () => {
		expect(() => contrastMap({ design: demo, polarStep_deg: 0, azimuthStep_deg: 15 })).toThrow(
			/polar step/
		);
		expect(() => contrastMap({ design: demo, polarStep_deg: 5, azimuthStep_deg: 0.001 })).toThrow(
			/azimuth step/
		);
	});
});

describe('cell look from one direction', () => {
	it('gives the same figures as the map at a sampled direction', async () => {
		const { cellReflectanceAt } = await import('../../src/lib/core/viewangle/cell-reflectance-at');
		const design = demoDesign();
		const map = contrastMap({ design, polarStep_deg: 20, azimuthStep_deg: 90 });
		const off = cellReflectanceAt({ design, polar_deg: 40, azimuth_deg: 90, state: 'off' });
		const on = cellReflectanceAt({ design, polar_deg: 40, azimuth_deg: 90, state: 'on' });
		expect(off.Y).toBeCloseTo(map.off[2][1].Y, 9);
		expect(on.Y).toBeCloseTo(map.on[2][1].Y, 9);
		expect(on.srgbHex).toBe(map.on[2][1].hex);
		expect(on.voltage_V).toBeCloseTo(map.on_V, 12);
		expect(off.reflectance.every((r) => r >= 0 && r <= 1)).toBe(true);
	});
});
