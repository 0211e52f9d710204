/**
 * The whole cell at 0 V against a closed form built independently of the stack code.
 *
 * A 90° TN cell without pretilt is uniformly twisted and untilted at 0 V. Between ideal polarizers
 * along the entrance and the exit directors (positive mode) one pass transmits
 *   T(λ) = 1 − sin²((π/2)·√(1 + u²))/(1 + u²),  u = 2·d·Δn(λ)/λ
 * (Gooch & Tarry, J. Phys. D 8:1575 (1975)). Unpolarised light keeps ½ at the front polarizer; a
 * polarisation-keeping reflector of reflectance ρ sends the light back along the same path, which
 * by reciprocity passes with the same T again; the front surface reflects R_s and transmits
 * (1 − R_s) each way. Hence
 *   R(λ) = R_s + (1 − R_s)²·ρ·½·T(λ)².
 * Δn(λ) comes from the material model at 25 °C (its dispersion is checked on its own in
 * tests/lc/dispersion.test.ts).
 */
import { describe, it } from 'vitest';
import { createCellOptics } from '../../src/lib/core/cell/cell-optics';
import { DEFAULT_CELL, DEFAULT_LIGHTING } from '../../src/lib/core/design/cell-schema';
import { GENERIC_REFLECTIVE_TN } from '../../src/lib/core/lc/presets';
import { indicesAt } from '../../src/lib/core/lc/temperature';
import { expectWithin } from '../helpers/tolerance';

describe('reflective TN cell at 0 V', () => {
	it('equals R_s + (1 − R_s)²·ρ·½·T_GT² across the visible range', () => {
		const rho = 0.8;
		const rs = 0.04;
		const gap_um = 5;
		const optics = createCellOptics({
			cell: {
				...DEFAULT_CELL,
				material: { preset: GENERIC_REFLECTIVE_TN.id },
				gap_um,
				twist_deg: 90,
				pretilt_deg: 0,
				mode: 'positive',
				polarizer: { kind: 'ideal' },
				reflector: { kind: 'brushed-metal', reflectance: rho, depolarizedFraction: 0 },
				frontSurfaceReflectance: rs
			},
			lighting: DEFAULT_LIGHTING,
			temperature_C: 25
		});
		const state = optics.stateAt(0);
		const cases = Array.from(optics.wavelengths_nm, (wavelength_nm, i) => {
			const { ne, no } = indicesAt({
				material: GENERIC_REFLECTIVE_TN,
				temperature_C: 25,
				wavelength_nm
			});
			const u = (2 * gap_um * 1000 * (ne - no)) / wavelength_nm;
			const leak = Math.sin((Math.PI / 2) * Math.sqrt(1 + u * u)) ** 2 / (1 + u * u);
			const t = 1 - leak;
			return {
				label: `${wavelength_nm} nm`,
				expected: rs + (1 - rs) ** 2 * rho * 0.5 * t * t,
				actual: state.reflectance[i]
			};
		});
		expectWithin(cases, {
			tolerance: 1e-9,
			unit: 'reflectance',
			source: 'Gooch & Tarry 1975 with ideal polarizers and a polarisation-keeping reflector'
		});
	});
});
