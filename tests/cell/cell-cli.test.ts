import { describe, expect, it } from 'vitest';
import { runCli } from '../cli/run-cli';
import { expectWithin } from '../helpers/tolerance';

/** Gooch & Tarry, J. Phys. D 8:1575 (1975): 90° TN between parallel polarizers leaks
 *  T = sin²((π/2)·sqrt(1+u²))/(1+u²), u = 2dΔn/λ. */
const goochTarryParallel = (u: number) =>
	Math.sin((Math.PI / 2) * Math.sqrt(1 + u * u)) ** 2 / (1 + u * u);

describe('sunglyph cell', () => {
	it('reproduces the Gooch–Tarry transmission for several gaps and wavelengths', async () => {
		const cases = [];
		for (const [gap, lambda] of [
			[5, 550],
			[4, 450],
			[6.5, 632.8],
			[3.2, 589.3],
			[8, 500]
		]) {
			for (const polarizers of ['parallel', 'crossed'] as const) {
				const { code, stdout, stderr } = await runCli([
					'cell',
					'--twist',
					'90',
					// The textbook cell: no pretilt, no chiral dopant.
					'--pretilt-deg',
					'0',
					'--d-over-p',
					'0',
					'--gap-um',
					String(gap),
					'--delta-n',
					'0.1',
					'--wavelength-nm',
					String(lambda),
					'--volts',
					'0',
					'--polarizers',
					polarizers,
					'--ideal-polarizers',
					'--json'
				]);
				expect(code, stderr).toBe(0);
				const u = (2 * gap * 0.1 * 1000) / lambda;
				const leak = goochTarryParallel(u);
				cases.push({
					label: `d=${gap} µm λ=${lambda} nm ${polarizers}`,
					expected: polarizers === 'parallel' ? leak : 1 - leak,
					actual: JSON.parse(stdout).transmittance
				});
			}
		}
		expectWithin(cases, { tolerance: 1e-5, unit: '(transmittance)', source: 'Gooch & Tarry 1975' });
	});

	it('gives V10 < V50 < V90 above the analytic threshold and a darker driven state', async () => {
		const r = JSON.parse((await runCli(['cell', '--json'])).stdout);
		expect(r.v10_V).toBeLessThan(r.v50_V);
		expect(r.v50_V).toBeLessThan(r.v90_V);
		expect(r.on.Y).toBeLessThan(r.off.Y);
		expect(r.contrastRatio).toBeGreaterThan(3);
		for (const key of ['Y', 'x', 'y', 'L', 'a', 'b'])
			expect(Number.isFinite(r.off[key])).toBe(true);
	});

	it('names the parameter on bad input', async () => {
		for (const [argv, pattern] of [
			[['--gap-um', '-3'], /--gap-um: expected a cell gap from 0.5 to 50 µm/],
			[['--twist', '300'], /--twist: expected a twist from 0 to 270°/],
			[['--d-over-p', '3'], /--d-over-p: expected a chiral dose d\/p from -2 to 2/],
			[['--polarizer', 'custom'], /--polarizer custom needs --polarizer-k1 and --polarizer-k2/],
			[['--material', 'unobtainium'], /--material: unknown preset "unobtainium"/],
			[['--delta-n', 'NaN'], /--delta-n: "NaN" is not a decimal number/],
			[['--illuminant', 'F7'], /--illuminant: Unknown illuminant "F7"/],
			[['--polarizers', 'sideways'], /--polarizers: "sideways" is not one of crossed, parallel/],
			[['--temperature-c', '120'], /isotropic at 120 °C/]
		] as const) {
			const r = await runCli(['cell', ...argv]);
			expect(r.code, argv.join(' ')).toBe(2);
			expect(r.stderr).toMatch(pattern);
		}
	});
});

describe('sunglyph illuminant', () => {
	it('gives the CIE white points', async () => {
		// Source: CIE 15:2018 (2° observer): D65 (0.31271, 0.32902), A (0.44757, 0.40745), D50 (0.34567, 0.35850).
		const cases = [];
		for (const [name, x, y] of [
			['D65', 0.31271, 0.32902],
			['A', 0.44757, 0.40745],
			['D50', 0.34567, 0.3585]
		] as const) {
			const r = JSON.parse((await runCli(['illuminant', name, '--json'])).stdout);
			cases.push(
				{ label: `${name} x`, expected: x, actual: r.x },
				{ label: `${name} y`, expected: y, actual: r.y }
			);
			expect(r.Y).toBeCloseTo(100, 9);
		}
		expectWithin(cases, { tolerance: 3e-4, unit: '(xy)', source: 'CIE 15:2018' });
		const ten = await runCli(['illuminant', 'D65', '--observer', '10', '--json']);
		// Source: CIE 15:2004, 10° observer: D65 (0.31382, 0.33100).
		expect(Math.abs(JSON.parse(ten.stdout).x - 0.31382)).toBeLessThan(3e-4);
		expect((await runCli(['illuminant', 'X9'])).code).toBe(2);
		expect((await runCli(['illuminant', 'D65', '--observer', '4'])).code).toBe(2);
	});
});

describe('sunglyph check with optics', () => {
	it('reports plausible reflective-TN figures for the demo', async () => {
		const demo = (await runCli(['demo'])).stdout;
		const r = await runCli(['check', 'demo.json', '--json'], { 'demo.json': demo });
		expect(r.code).toBe(0);
		const optics = JSON.parse(r.stdout).optics;
		// Common practice for reflective TN: background luminance factor about 20–30 %, contrast
		// 5–20 with the first-surface reflection included.
		expect(optics.background.Y).toBeGreaterThan(20);
		expect(optics.background.Y).toBeLessThan(30);
		expect(optics.contrastRatio).toBeGreaterThan(5);
		expect(optics.contrastRatio).toBeLessThan(20);
		for (const key of ['Y', 'x', 'y', 'L', 'a', 'b'])
			expect(Number.isFinite(optics.on[key])).toBe(true);
		expect(optics.v10_V).toBeLessThan(optics.v90_V);
	});
});
