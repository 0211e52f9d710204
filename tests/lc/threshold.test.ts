import { describe, expect, it } from 'vitest';
import { requireNematic } from '../../src/lib/core/lc/material';
import { materialAt } from '../../src/lib/core/lc/temperature';
import {
	splayThreshold_V,
	twistedThreshold_V,
	twistElasticConstant_N
} from '../../src/lib/core/lc/threshold';
import { materialWith } from './fixtures';
import { expectReference, type ReferenceRow } from './reference';

/** A nematic state with the given constants (ε⊥ 5 so Δε is exact). */
function stateWith(k11_pN: number, k22_pN: number, k33_pN: number, deltaEps: number) {
	const material = materialWith({
		k11_pN,
		k22_pN,
		k33_pN,
		epsPerpendicular: 5,
		epsParallel: 5 + deltaEps
	});
	return requireNematic(materialAt({ material, temperature_C: material.reference_C }));
}

describe('analytic thresholds', () => {
	// Values derived from K_eff = K11 + (K33 − 2K22)/4 and V = π·sqrt(K/(ε0Δε)) (Fréedericksz &
	// Zolina, Trans. Faraday Soc. 29:919 (1933); Schadt & Helfrich, APL 18:127 (1971)), with E7 and
	// 5CB constants as commonly quoted (from memory).
	const cases: [string, number, number, number, number, number, number, number][] = [
		['E7', 11.1, 6.5, 17.1, 13.8, 12.125, 0.99, 0.947],
		['E7 with K22 5.9', 11.1, 5.9, 17.1, 13.8, 12.425, 1.002, 0.947],
		['5CB', 6.4, 3.0, 10.0, 11.5, 7.4, 0.847, 0.788]
	];

	it('reproduces the derived table: V_th,TN and V_c,splay to 0.5 mV, K_eff to 0.5e-3 pN', () => {
		const voltages: ReferenceRow[] = [];
		const elastic: ReferenceRow[] = [];
		for (const [name, k11, k22, k33, deltaEps, kEff_pN, vth_V, vc_V] of cases) {
			const material = stateWith(k11, k22, k33, deltaEps);
			elastic.push({
				name,
				actual: twistElasticConstant_N({ material, twist_deg: 90 }) * 1e12,
				expected: kEff_pN
			});
			voltages.push({
				name: `${name} TN`,
				actual: twistedThreshold_V({ material, twist_deg: 90 }),
				expected: vth_V
			});
			voltages.push({ name: `${name} splay`, actual: splayThreshold_V(material), expected: vc_V });
		}
		expectReference({
			label: 'K_eff',
			source: 'derived from K11 + (K33 − 2K22)/4 (Schadt & Helfrich 1971)',
			unit: 'pN',
			tolerance: 5e-4,
			rows: elastic
		});
		expectReference({
			label: 'thresholds',
			source: 'derived from π·sqrt(K/(ε0Δε)) (Schadt & Helfrich 1971; Fréedericksz & Zolina 1933)',
			unit: 'V',
			tolerance: 5e-4,
			rows: voltages
		});
	});

	it('handles general twist and chiral sense', () => {
		const material = stateWith(11.1, 6.5, 17.1, 13.8);
		// Zero twist is the splay Fréedericksz case whatever the dopant.
		expect(twistedThreshold_V({ material, twist_deg: 0, gapToPitch: 0.3 })).toBeCloseTo(
			splayThreshold_V(material),
			12
		);
		// A dopant of the imposed sense raises the threshold, the opposite sense lowers it.
		const undoped = twistedThreshold_V({ material, twist_deg: 90 });
		expect(twistedThreshold_V({ material, twist_deg: 90, gapToPitch: 0.1 })).toBeGreaterThan(
			undoped
		);
		expect(twistedThreshold_V({ material, twist_deg: 90, gapToPitch: -0.1 })).toBeLessThan(undoped);
		// Mirror image: reversing both twist and dopant changes nothing.
		expect(twistedThreshold_V({ material, twist_deg: -240, gapToPitch: -0.6 })).toBeCloseTo(
			twistedThreshold_V({ material, twist_deg: 240, gapToPitch: 0.6 }),
			12
		);
		// K_eff = K11 + (K33 − 2K22)(Φ/π)² + 4K22(d/p)(Φ/π) at 270°, d/p = 0.6.
		const expected_N = (11.1 + (17.1 - 13) * 1.5 ** 2 + 4 * 6.5 * 0.6 * 1.5) * 1e-12;
		expect(
			twistElasticConstant_N({ material, twist_deg: 270, gapToPitch: 0.6 }) / expected_N
		).toBeCloseTo(1, 12);
		// A strongly reversed dopant makes the untilted state unstable: threshold reported as 0.
		expect(twistedThreshold_V({ material, twist_deg: 90, gapToPitch: -2 })).toBe(0);
	});
});
