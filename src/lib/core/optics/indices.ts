/**
 * Refractive indices of the liquid crystal per wavelength, as supplied by the material model
 * (which lives elsewhere): a callback λ ↦ {ne, no} or arrays over the wavelength grid.
 * Sampled once per evaluation, outside any hot loop. Dimensionless; wavelengths in nm.
 */

export interface RefractiveIndices {
	/** Extraordinary index (light polarised along the director). */
	ne: number;
	/** Ordinary index. */
	no: number;
}

export type IndicesAt = (wavelength_nm: number) => RefractiveIndices;

/** Indices already sampled on the wavelength grid, index i ↔ wavelengths_nm[i]. */
export interface IndicesOnGrid {
	ne: Float64Array;
	no: Float64Array;
}

export type IndicesSource = IndicesAt | IndicesOnGrid;

/** The indices on the grid (new arrays), checked finite and ≥ 1. */
export function sampleIndices(source: IndicesSource, wavelengths_nm: Float64Array): IndicesOnGrid {
	const n = wavelengths_nm.length;
	const ne = new Float64Array(n);
	const no = new Float64Array(n);
	if (typeof source === 'function') {
		for (let i = 0; i < n; i++) {
			const indices = source(wavelengths_nm[i]);
			ne[i] = indices.ne;
			no[i] = indices.no;
		}
	} else {
		if (source.ne.length !== n || source.no.length !== n) {
			throw new RangeError(`indices arrays need ${n} entries, one per wavelength`);
		}
		ne.set(source.ne);
		no.set(source.no);
	}
	for (let i = 0; i < n; i++) {
		if (!(ne[i] >= 1 && no[i] >= 1 && Number.isFinite(ne[i]) && Number.isFinite(no[i]))) {
			throw new RangeError(`indices at ${wavelengths_nm[i]} nm must be finite and ≥ 1`);
		}
	}
	return { ne, no };
}
