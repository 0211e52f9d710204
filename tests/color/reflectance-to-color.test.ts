/* The one-call colour API used by the optics code, and the weight cache behind it. */
import { describe, expect, it } from 'vitest';
import { CIE1931_2DEG_CMF } from '../../src/lib/core/color/data/cie1931-2deg';
import { CIE_F11 } from '../../src/lib/core/color/data/fluorescent-f2-f11';
import { illuminantByName } from '../../src/lib/core/color/illuminant-by-name';
import { lambertianLuminance_cdm2 } from '../../src/lib/core/color/lambertian-luminance';
import { reflectanceToColor } from '../../src/lib/core/color/reflectance-to-color';
import {
	gridWavelengths_nm,
	VISIBLE_5NM_GRID,
	wavelengthGrid
} from '../../src/lib/core/color/spectrum';
import {
	computeTristimulusWeights,
	tristimulusWeights
} from '../../src/lib/core/color/tristimulus-weights';

const grid = VISIBLE_5NM_GRID;
const flat = (r: number) => new Float64Array(grid.count).fill(r);
const wavelengths = gridWavelengths_nm(grid);
const ramp = wavelengths.map((nm) => 0.1 + 0.8 * ((nm - 380) / 400) ** 2);

describe('reflectanceToColor', () => {
	it('the perfect white is Y = 100, L* = 100, a* = b* = 0 and #ffffff under any illuminant', () => {
		for (const illuminant of ['A', 'D50', 'D65', 'F2', 'F11', 'E']) {
			const c = reflectanceToColor({ reflectance: flat(1), grid, illuminant });
			expect(Math.abs(c.Y - 100), illuminant).toBeLessThan(1e-9);
			expect(Math.abs(c.L - 100), illuminant).toBeLessThan(1e-9);
			expect(Math.hypot(c.a, c.b), illuminant).toBeLessThan(1e-9);
			expect(c.srgbHex, illuminant).toBe('#ffffff');
			expect(c.srgbInGamut, illuminant).toBe(true);
		}
	});

	it('an 18 % grey has L* = 49.496 and previews as sRGB #767676 (IEC 61966-2-1 encoding)', () => {
		const c = reflectanceToColor({ reflectance: flat(0.18), grid, illuminant: 'A' });
		expect(Math.abs(c.Y - 18)).toBeLessThan(1e-9);
		expect(Math.abs(c.L - 49.496)).toBeLessThan(5e-4);
		// 0.18 linear → 1.055·0.18^(1/2.4) − 0.055 = 0.4614 → 118 = 0x76
		expect(c.srgbHex).toBe('#767676');
	});

	it('black reports the white chromaticity instead of NaN', () => {
		const black = reflectanceToColor({ reflectance: flat(0), grid, illuminant: 'D65' });
		const white = reflectanceToColor({ reflectance: flat(1), grid, illuminant: 'D65' });
		expect(Math.abs(black.x - white.x) + Math.abs(black.y - white.y)).toBeLessThan(1e-15);
		expect(Math.abs(black.L)).toBeLessThan(1e-12);
		expect(black.srgbHex).toBe('#000000');
	});

	it('equals a direct CIE 15 summation over the raw tables (F11, 2°, 380–780 nm)', () => {
		const cmfOffset = (380 - CIE1931_2DEG_CMF.start_nm) / CIE1931_2DEG_CMF.step_nm;
		let X = 0;
		let Y = 0;
		let Z = 0;
		let norm = 0;
		for (let i = 0; i < grid.count; i++) {
			const S = CIE_F11.values[i];
			X += S * ramp[i] * CIE1931_2DEG_CMF.xBar[cmfOffset + i];
			Y += S * ramp[i] * CIE1931_2DEG_CMF.yBar[cmfOffset + i];
			Z += S * ramp[i] * CIE1931_2DEG_CMF.zBar[cmfOffset + i];
			norm += S * CIE1931_2DEG_CMF.yBar[cmfOffset + i];
		}
		const c = reflectanceToColor({ reflectance: ramp, grid, illuminant: 'F11' });
		expect(Math.abs(c.X - (100 * X) / norm)).toBeLessThan(1e-10);
		expect(Math.abs(c.Y - (100 * Y) / norm)).toBeLessThan(1e-10);
		expect(Math.abs(c.Z - (100 * Z) / norm)).toBeLessThan(1e-10);
	});

	it('depends on the observer', () => {
		const two = reflectanceToColor({ reflectance: ramp, grid, illuminant: 'D65' });
		const ten = reflectanceToColor({
			reflectance: ramp,
			grid,
			illuminant: 'D65',
			observer: 'CIE1964-10deg'
		});
		expect(Math.abs(two.x - ten.x) + Math.abs(two.y - ten.y)).toBeGreaterThan(1e-3);
	});

	it('flags saturated colours as outside the sRGB gamut and still gives a clamped hex', () => {
		const band = wavelengths.map((nm) => (Math.abs(nm - 520) <= 5 ? 1 : 0));
		const c = reflectanceToColor({ reflectance: band, grid, illuminant: 'D65' });
		expect(c.srgbInGamut).toBe(false);
		expect(c.srgbHex).toMatch(/^#[0-9a-f]{6}$/);
	});

	it('accepts an illuminant object and finer grids (1 nm weights interpolated from 5 nm tables)', () => {
		const fine = wavelengthGrid({ start_nm: 380, end_nm: 780, step_nm: 1 });
		const c = reflectanceToColor({
			reflectance: new Float64Array(fine.count).fill(0.5),
			grid: fine,
			illuminant: illuminantByName('D65')
		});
		expect(Math.abs(c.Y - 50)).toBeLessThan(1e-9);
	});

	it('refuses a reflectance whose length does not match the grid', () => {
		expect(() =>
			reflectanceToColor({ reflectance: new Float64Array(80), grid, illuminant: 'D65' })
		).toThrow(/80 samples but the grid has 81/);
	});

	it('its Y/100 is the luminous reflectance for absolute luminance', () => {
		const c = reflectanceToColor({ reflectance: flat(0.25), grid, illuminant: 'D65' });
		const luminance = lambertianLuminance_cdm2({ reflectance: c.Y / 100, illuminance_lx: 500 });
		expect(Math.abs(luminance - 39.789)).toBeLessThan(5e-4);
	});
});

describe('tristimulus weight cache', () => {
	it('returns the same weights object for the same illuminant, observer and grid', () => {
		const request = {
			illuminant: illuminantByName('D65'),
			observer: 'CIE1931-2deg' as const,
			grid
		};
		const first = tristimulusWeights(request);
		expect(tristimulusWeights({ ...request, grid: { ...grid } })).toBe(first);
		expect(tristimulusWeights({ ...request, observer: 'CIE1964-10deg' })).not.toBe(first);
	});

	it('cached weights equal freshly computed ones', () => {
		const request = { illuminant: illuminantByName('F2'), observer: 'CIE1931-2deg' as const, grid };
		const cached = tristimulusWeights(request);
		const fresh = computeTristimulusWeights(request);
		for (let i = 0; i < grid.count; i++)
			expect(Math.abs(cached.x[i] - fresh.x[i]) + Math.abs(cached.z[i] - fresh.z[i])).toBeLessThan(
				1e-15
			);
	});

	it('weights sum to the white point, with Σ w_y = 100', () => {
		const w = tristimulusWeights({
			illuminant: illuminantByName('A'),
			observer: 'CIE1931-2deg',
			grid
		});
		expect(Math.abs(w.y.reduce((s, v) => s + v, 0) - 100)).toBeLessThan(1e-9);
		expect(Math.abs(w.x.reduce((s, v) => s + v, 0) - w.white.X)).toBeLessThan(1e-9);
	});
});
