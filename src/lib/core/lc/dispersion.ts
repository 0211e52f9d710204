/**
 * Extended Cauchy dispersion n(λ) = A + B/λ² + C/λ⁴, λ in µm.
 *
 * Source: Li, Wen, Gauza, Lu & Wu, "Refractive index of liquid crystals for display
 * applications", J. Display Technol. 1:51-61 (2005); fits valid over ≈ 0.45-0.656 µm at 25 °C.
 * Outside that band the three-term form extrapolates smoothly but without warranty.
 */
import { UM_PER_NM } from './constants';
import type { CauchyFit } from './material';

/** Refractive index of one Cauchy fit at a vacuum wavelength in nm. */
export function cauchyIndex(fit: CauchyFit, wavelength_nm: number): number {
	const lambda_um = wavelength_nm * UM_PER_NM;
	const inv2 = 1 / (lambda_um * lambda_um);
	return fit.a + fit.b_um2 * inv2 + fit.c_um4 * inv2 * inv2;
}
