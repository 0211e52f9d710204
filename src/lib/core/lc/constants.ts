/**
 * Physical constants for the liquid-crystal model.
 *
 * Sources: CODATA 2018 (vacuum permittivity); SI 2019 exact definitions of the Boltzmann
 * constant and the elementary charge, from which k_B in eV/K is derived here rather than pasted.
 */

/** Vacuum permittivity ε0, F/m (CODATA 2018). */
export const VACUUM_PERMITTIVITY_F_PER_M = 8.8541878128e-12;

/** Boltzmann constant, J/K (SI 2019, exact). */
export const BOLTZMANN_J_PER_K = 1.380649e-23;

/** Elementary charge, C (SI 2019, exact). */
export const ELEMENTARY_CHARGE_C = 1.602176634e-19;

/** Boltzmann constant in eV/K, derived: k_B / e. */
export const BOLTZMANN_EV_PER_K = BOLTZMANN_J_PER_K / ELEMENTARY_CHARGE_C;

/** Offset between the Celsius and Kelvin scales, K (SI definition). */
export const CELSIUS_ZERO_K = 273.15;

/** Conversion factors at the module edge. */
export const M_PER_UM = 1e-6;
export const UM_PER_NM = 1e-3;
export const N_PER_PN = 1e-12;
export const RAD_PER_DEG = Math.PI / 180;

/** Celsius to kelvin. */
export function celsiusToKelvin(temperature_C: number): number {
	return temperature_C + CELSIUS_ZERO_K;
}
