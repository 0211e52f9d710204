/**
 * Intensity transmittance of a Jones matrix M for unpolarised input of unit intensity: the
 * incoherent sum of two orthogonal states of intensity ½ each (any orthogonal pair gives the
 * same sum; Jones 1941):  T = ½·(|M·x̂|² + |M·ŷ|²) = ½·Σ|M_ij|².
 */

import { frobeniusNormSquared } from './complex2x2';

export function unpolarizedTransmittance(m: Float64Array): number {
	return 0.5 * frobeniusNormSquared(m);
}
