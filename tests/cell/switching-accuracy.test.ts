import { describe, expect, it } from 'vitest';
import { expectWithin, type ReferenceCase } from '../helpers/tolerance';
import { createCellOptics } from '../../src/lib/core/cell/cell-optics';
import { electroOpticCurve } from '../../src/lib/core/cell/electro-optic-curve';
import { SWITCHING_TOLERANCE_V } from '../../src/lib/core/cell/slice-count';
import { DEFAULT_CELL, DEFAULT_LIGHTING } from '../../src/lib/core/design/cell-schema';

/**
 * Self-convergence: the converged answer is taken from fine slicings (240 and 480 slabs, each
 * crossing refined to 2e-5 V, then Richardson-extrapolated), independent of the slice-count
 * choice under test. The high-Δε cyanobiphenyl eutectic is the hardest case for the director.
 */
describe('switching voltages are converged in voltage and slicing', () => {
	it('V10, V50 and V90 lie within 2e-4 V of the converged answer', () => {
		const cases: ReferenceCase[] = [];
		for (const preset of ['generic-reflective-tn', 'cyanobiphenyl-eutectic-high-dn']) {
			const cell = { ...DEFAULT_CELL, material: { preset } };
			const at = (slices: number) =>
				createCellOptics({ cell, lighting: DEFAULT_LIGHTING, temperature_C: 25, slices });
			const chosen = electroOpticCurve({ optics: at(60), withSlices: at });
			expect(chosen.errorEstimate_V).not.toBeNull();
			const c240 = electroOpticCurve({ optics: at(240) });
			const c480 = electroOpticCurve({ optics: at(480) });
			for (const key of ['v10_V', 'v50_V', 'v90_V'] as const) {
				const converged = c480[key] + (c480[key] - c240[key]) / 3;
				cases.push({ label: `${preset} ${key}`, expected: converged, actual: chosen[key] });
			}
		}
		expectWithin(cases, {
			tolerance: SWITCHING_TOLERANCE_V,
			unit: 'V',
			source: 'self-convergence, 240/480 slabs extrapolated'
		});
	}, 120_000);
});
