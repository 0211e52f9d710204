/*
 * Sampled spectra on uniform wavelength grids and linear resampling between grids.
 * Model: a spectrum is known at start_nm + i·step_nm (i = 0 … n−1) and varies linearly in
 * between. Linear interpolation is adequate for tables at 5 nm and finer (the CIE's own 5 nm
 * daylight-basis entries are linear interpolations of its 10 nm data); higher-order schemes
 * (Sprague, CIE 167:2005) are not implemented. Beyond its range a spectrum is extended by its
 * nearest end value ('nearest', the CIE 15 advice for missing end data), by zero, or refused.
 */

/** A uniform wavelength grid: count points from start_nm in steps of step_nm. */
export interface WavelengthGrid {
	readonly start_nm: number;
	readonly step_nm: number;
	readonly count: number;
}

/** Samples of a spectral function on a uniform grid (values.length points). */
export interface Spectrum {
	readonly start_nm: number;
	readonly step_nm: number;
	readonly values: Float64Array;
}

/** How to treat wavelengths outside a spectrum's range. */
export type OutsideRange = 'nearest' | 'zero' | 'throw';

/** Fraction of a step within which a wavelength counts as sitting on a grid point. */
const ON_GRID_TOLERANCE = 1e-9;

/** Build a grid from its end points; (end_nm − start_nm) must be a whole number of steps. */
export function wavelengthGrid(options: {
	start_nm: number;
	end_nm: number;
	step_nm: number;
}): WavelengthGrid {
	const { start_nm, end_nm, step_nm } = options;
	const steps = (end_nm - start_nm) / step_nm;
	const whole = Math.round(steps);
	if (!Number.isFinite(start_nm) || !(step_nm > 0) || !(whole >= 0))
		throw new RangeError(`Invalid wavelength grid ${start_nm}–${end_nm} nm, step ${step_nm} nm`);
	if (Math.abs(steps - whole) > ON_GRID_TOLERANCE)
		throw new RangeError(`${start_nm}–${end_nm} nm is not a whole number of ${step_nm} nm steps`);
	return { start_nm, step_nm, count: whole + 1 };
}

/** The grid the optics code evaluates on: 380–780 nm in 5 nm steps (81 wavelengths). */
export const VISIBLE_5NM_GRID: WavelengthGrid = wavelengthGrid({
	start_nm: 380,
	end_nm: 780,
	step_nm: 5
});

/** Wavelength of grid point `index`. */
export function wavelengthAt_nm(grid: WavelengthGrid, index: number): number {
	return grid.start_nm + index * grid.step_nm;
}

/** All wavelengths of a grid, in nm. */
export function gridWavelengths_nm(grid: WavelengthGrid): Float64Array {
	const out = new Float64Array(grid.count);
	for (let i = 0; i < grid.count; i++) out[i] = wavelengthAt_nm(grid, i);
	return out;
}

/** The grid a spectrum is sampled on. */
export function gridOfSpectrum(spectrum: Spectrum): WavelengthGrid {
	return { start_nm: spectrum.start_nm, step_nm: spectrum.step_nm, count: spectrum.values.length };
}

/** A stable text key for a grid (for caches). */
export function gridKey(grid: WavelengthGrid): string {
	return `${grid.start_nm}:${grid.step_nm}:${grid.count}`;
}

/** A spectrum from tabulated numbers, multiplied by `scale` (default 1). */
export function spectrumFromTable(table: {
	start_nm: number;
	step_nm: number;
	values: ArrayLike<number>;
	scale?: number;
}): Spectrum {
	const scale = table.scale ?? 1;
	const values = Float64Array.from(table.values, (v) => v * scale);
	return { start_nm: table.start_nm, step_nm: table.step_nm, values };
}

/** Sample a function of wavelength (nm) on a grid. */
export function spectrumFromFunction(
	grid: WavelengthGrid,
	valueAt: (wavelength_nm: number) => number
): Spectrum {
	const values = new Float64Array(grid.count);
	for (let i = 0; i < grid.count; i++) values[i] = valueAt(wavelengthAt_nm(grid, i));
	return { start_nm: grid.start_nm, step_nm: grid.step_nm, values };
}

/** The spectrum's value at one wavelength, interpolated linearly between samples. */
export function spectrumValueAt(
	spectrum: Spectrum,
	at: { wavelength_nm: number; outside?: OutsideRange }
): number {
	const { values, start_nm, step_nm } = spectrum;
	const last = values.length - 1;
	const position = (at.wavelength_nm - start_nm) / step_nm;
	const nearest = Math.round(position);
	if (Math.abs(position - nearest) <= ON_GRID_TOLERANCE && nearest >= 0 && nearest <= last)
		return values[nearest];
	if (position > 0 && position < last) {
		const i = Math.floor(position);
		const t = position - i;
		return values[i] * (1 - t) + values[i + 1] * t;
	}
	const outside = at.outside ?? 'nearest';
	if (outside === 'zero') return 0;
	if (outside === 'nearest') return position < 0 ? values[0] : values[last];
	const end_nm = start_nm + last * step_nm;
	throw new RangeError(
		`${at.wavelength_nm} nm lies outside the spectrum's ${start_nm}–${end_nm} nm`
	);
}

/** Resample a spectrum onto a grid (linear interpolation; see the header for the ends). */
export function resampleSpectrum(
	spectrum: Spectrum,
	target: { grid: WavelengthGrid; outside?: OutsideRange }
): Spectrum {
	const outside = target.outside ?? 'nearest';
	return spectrumFromFunction(target.grid, (wavelength_nm) =>
		spectrumValueAt(spectrum, { wavelength_nm, outside })
	);
}
