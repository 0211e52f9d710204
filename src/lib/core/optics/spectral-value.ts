/**
 * A quantity that may vary with wavelength: a constant, or a table sampled by linear
 * interpolation (held constant beyond the table's ends). Used for polarizer transmittances and
 * reflector reflectances. Wavelengths in nm, values dimensionless.
 */

export interface SpectralTable {
	/** Strictly increasing. */
	wavelengths_nm: Float64Array;
	values: Float64Array;
}

export type SpectralValue = number | SpectralTable;

/** Check a spectral value at the public edge; `name` labels the error. */
export function assertSpectralValue(value: SpectralValue, name: string): void {
	if (typeof value === 'number') {
		if (!Number.isFinite(value)) throw new RangeError(`${name} must be finite, got ${value}`);
		return;
	}
	const { wavelengths_nm, values } = value;
	if (wavelengths_nm.length === 0 || wavelengths_nm.length !== values.length) {
		throw new RangeError(`${name}: table needs equal, non-zero lengths`);
	}
	for (let i = 1; i < wavelengths_nm.length; i++) {
		if (!(wavelengths_nm[i] > wavelengths_nm[i - 1])) {
			throw new RangeError(`${name}: wavelengths_nm must increase strictly (index ${i})`);
		}
	}
}

/** The value at one wavelength. */
export function spectralValueAt(value: SpectralValue, wavelength_nm: number): number {
	if (typeof value === 'number') return value;
	const { wavelengths_nm: x, values: y } = value;
	const last = x.length - 1;
	if (wavelength_nm <= x[0]) return y[0];
	if (wavelength_nm >= x[last]) return y[last];
	let lo = 0;
	let hi = last;
	while (hi - lo > 1) {
		const mid = (lo + hi) >> 1;
		if (x[mid] <= wavelength_nm) lo = mid;
		else hi = mid;
	}
	const f = (wavelength_nm - x[lo]) / (x[hi] - x[lo]);
	return y[lo] + f * (y[hi] - y[lo]);
}

/** The value sampled on a wavelength grid (a new array). */
export function sampleSpectralValue(
	value: SpectralValue,
	wavelengths_nm: Float64Array
): Float64Array {
	const out = new Float64Array(wavelengths_nm.length);
	for (let i = 0; i < wavelengths_nm.length; i++)
		out[i] = spectralValueAt(value, wavelengths_nm[i]);
	return out;
}

/** Throw unless every sample lies in [0, 1]. */
export function assertUnitInterval(samples: Float64Array, name: string): void {
	for (let i = 0; i < samples.length; i++) {
		if (!(samples[i] >= 0 && samples[i] <= 1)) {
			throw new RangeError(`${name} must lie in [0, 1], got ${samples[i]} at index ${i}`);
		}
	}
}
