/**
 * Test materials built from explicitly given constants (each test states its own), so analytic
 * references can be reproduced exactly (the presets carry rounded or memory values).
 */
import type { LcMaterial } from '../../src/lib/core/lc/material';
import { CYANOBIPHENYL_EUTECTIC_HIGH_DN } from '../../src/lib/core/lc/presets';

/** A valid material with the given elastic and dielectric constants at 25 °C. */
export function materialWith(overrides: Partial<LcMaterial>): LcMaterial {
	return { ...CYANOBIPHENYL_EUTECTIC_HIGH_DN, id: 'test-material', ...overrides };
}
