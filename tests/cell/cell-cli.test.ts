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

	it('leaves the textbook cell undeformed below the Fréedericksz threshold', async () => {
		// Threshold of a twisted cell (Leslie 1970; Schadt & Helfrich, Appl. Phys. Lett. 18, 127,
		// 1971): V_th = π·sqrt((K11 + (K33 − 2·K22)·(φ/π)²) / (ε0·Δε)). With the generic fluid's
		// constants (K11 10, K22 5.5, K33 15 pN, Δε 6) and φ = 90°: V_th = 1.4295 V. Without pretilt
		// or dopant the director does not move below it, so the transmittance stays at its 0 V value
		// (the Gooch–Tarry figure); just above it the cell starts to switch.
		const eps0 = 8.8541878128e-12; // CODATA 2018
		const kEff = (10 + (15 - 2 * 5.5) / 4) * 1e-12;
		const vth_V = Math.PI * Math.sqrt(kEff / (eps0 * 6));
		expect(vth_V).toBeCloseTo(1.4295, 3);
		const at = async (volts: number) => {
			const r = await runCli([
				'cell',
				'--material',
				'generic-reflective-tn',
				'--pretilt-deg',
				'0',
				'--d-over-p',
				'0',
				'--temperature-c',
				'25',
				'--volts',
				String(volts),
				'--json'
			]);
			expect(r.code, r.stderr).toBe(0);
			return JSON.parse(r.stdout);
		};
		// --volts 0 means a saturated pixel, so the unpowered reference is the off-state figure at
		// a tiny voltage instead.
		const rest = await at(0.01);
		const below = await at(0.97 * vth_V);
		const above = await at(1.03 * vth_V);
		expect(Math.abs(below.transmittance - rest.transmittance)).toBeLessThan(1e-6);
		expect(Math.abs(above.transmittance - rest.transmittance)).toBeGreaterThan(1e-5);
		// The 10 % optical point lies above the threshold, never below it.
		expect(rest.v10_V).toBeGreaterThan(vth_V);
	});

	it('leaves only the front-surface reflection in a saturated pixel between ideal polarizers', async () => {
		// A fully switched (homeotropic) positive cell between crossed ideal polarizers returns no
		// light from the reflector; what remains is the glass front surface, a fraction R_s of the
		// illuminant (Y = 100·R_s). 0.04 is the normal-incidence Fresnel reflectance of glass,
		// ((n − 1)/(n + 1))² with n = 1.5 (Born & Wolf, Principles of Optics, §1.5).
		for (const rs of [0, 0.04, 0.1]) {
			const r = await runCli([
				'cell',
				'--ideal-polarizers',
				'--front-reflectance',
				String(rs),
				'--volts',
				'0',
				'--json'
			]);
			expect(r.code, r.stderr).toBe(0);
			const out = JSON.parse(r.stdout);
			expect(Math.abs(out.on.Y - 100 * rs), `R_s = ${rs}`).toBeLessThan(2e-3);
			expect(out.off.Y).toBeGreaterThan(out.on.Y + 10);
		}
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
