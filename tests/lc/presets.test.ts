import { describe, expect, it } from 'vitest';
import type { LcMaterial } from '../../src/lib/core/lc/material';
import { GENERIC_REFLECTIVE_TN, LC_PRESETS, presetById } from '../../src/lib/core/lc/presets';
import { indicesAt, materialAt } from '../../src/lib/core/lc/temperature';
import { twistedThreshold_V } from '../../src/lib/core/lc/threshold';
import { requireNematic } from '../../src/lib/core/lc/material';
import { validateMaterial } from '../../src/lib/core/lc/validate';

describe('presets', () => {
	it('are valid, neutrally named and findable by id', () => {
		expect(LC_PRESETS.map((m) => m.id)).toEqual([
			'generic-reflective-tn',
			'cyclohexyl-low-dn',
			'cyanobiphenyl-eutectic-high-dn',
			'cyanobiphenyl-single'
		]);
		for (const material of LC_PRESETS) {
			expect(validateMaterial(material)).toEqual([]);
			expect(material.id).toMatch(/^[a-z]+(-[a-z]+)*$/);
			// No trade or literature short names in identifiers or labels (citations live in `source`).
			expect(`${material.id} ${material.label}`).not.toMatch(/E7|5CB|5PCH/i);
			expect(material.source.length).toBeGreaterThan(20);
			expect(presetById(material.id)).toBe(material);
			expect(Object.isFrozen(material) && Object.isFrozen(material.extraordinary)).toBe(true);
		}
		expect(presetById('no-such-fluid')).toBeUndefined();
	});

	it('generic reflective-TN preset has the typical values it claims', () => {
		// Typical values for reflective-TN mixtures, from memory (Δn 0.10-0.12 at 589 nm,
		// T_NI ≈ 90 °C, V_th 1.3-1.6 V, γ1 ≈ 0.15 Pa·s, E_a ≈ 0.35 eV): a plausibility range,
		// not a reference.
		const { ne, no } = indicesAt({
			material: GENERIC_REFLECTIVE_TN,
			temperature_C: 25,
			wavelength_nm: 589.3
		});
		expect(ne - no).toBeGreaterThan(0.1);
		expect(ne - no).toBeLessThan(0.12);
		expect(GENERIC_REFLECTIVE_TN.clearing_C).toBe(90);
		expect(GENERIC_REFLECTIVE_TN.gamma1_Pas).toBeCloseTo(0.15, 12);
		expect(GENERIC_REFLECTIVE_TN.activation_eV).toBeCloseTo(0.35, 12);
		const state = requireNematic(
			materialAt({ material: GENERIC_REFLECTIVE_TN, temperature_C: 25 })
		);
		for (const gapToPitch of [0, 0.1]) {
			const vth_V = twistedThreshold_V({ material: state, twist_deg: 90, gapToPitch });
			expect(vth_V).toBeGreaterThan(1.3);
			expect(vth_V).toBeLessThan(1.6);
		}
	});
});

describe('validateMaterial', () => {
	const base = GENERIC_REFLECTIVE_TN;
	const issuesOf = (overrides: Partial<LcMaterial>) =>
		validateMaterial({ ...base, ...overrides }).map((issue) => issue.parameter);

	it('names each offending parameter', () => {
		expect(issuesOf({ k11_pN: -1 })).toEqual(['k11_pN']);
		expect(issuesOf({ k33_pN: 0 })).toEqual(['k33_pN']);
		expect(issuesOf({ gamma1_Pas: Number.NaN })).toEqual(['gamma1_Pas']);
		expect(issuesOf({ clearing_C: 20 })).toEqual(['clearing_C']);
		expect(issuesOf({ orderExponent: 1.2 })).toEqual(['orderExponent']);
		expect(issuesOf({ activation_eV: -0.1 })).toEqual(['activation_eV']);
		expect(issuesOf({ epsPerpendicular: 0.5 })).toContain('epsPerpendicular');
		expect(issuesOf({ ordinary: { a: 1.7, b_um2: 0.01, c_um4: 0 } })).toEqual(['extraordinary']);
		expect(
			issuesOf({ extraordinary: { a: Number.POSITIVE_INFINITY, b_um2: 0, c_um4: 0 } })
		).toEqual(['extraordinary.a']);
	});

	it('rejects non-positive dielectric anisotropy, which a TN cell cannot switch with', () => {
		const issues = validateMaterial({ ...base, epsParallel: 3.5, epsPerpendicular: 4 });
		expect(issues.map((issue) => issue.parameter)).toEqual(['epsParallel']);
		expect(issues[0].message).toMatch(/positive dielectric anisotropy/);
		expect(issuesOf({ epsParallel: 4, epsPerpendicular: 4 })).toEqual(['epsParallel']);
	});

	it('makes materialAt throw with the parameter name', () => {
		expect(() => materialAt({ material: { ...base, k22_pN: -3 }, temperature_C: 25 })).toThrow(
			/k22_pN/
		);
	});
});
