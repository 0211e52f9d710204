/*
 * Tristimulus values of reflecting samples and white points of illuminants, CIE 15:2004:
 * X = Σ w_x(λ)·R(λ) with the weights of tristimulus-weights.ts (k, S, x̄, Δλ folded in).
 * R is the spectral reflectance factor (0…1, may exceed 1 for fluorescent or specular samples);
 * Y is then the luminance factor in % (perfect white = 100).
 */
import { DEFAULT_OBSERVER, type ObserverName } from './observers';
import { VISIBLE_5NM_GRID, type WavelengthGrid } from './spectrum';
import { tristimulusWeights, type TristimulusWeights } from './tristimulus-weights';
import type { Illuminant, Xyz } from './types';

/** X, Y, Z of a reflectance sampled on the weights' grid: three dot products. */
export function reflectanceToXyz(weights: TristimulusWeights, reflectance: ArrayLike<number>): Xyz {
	const n = weights.grid.count;
	if (reflectance.length !== n)
		throw new RangeError(
			`Reflectance has ${reflectance.length} samples but the grid has ${n} ` +
				`(${weights.grid.start_nm} nm + i·${weights.grid.step_nm} nm)`
		);
	const { x, y, z } = weights;
	let X = 0;
	let Y = 0;
	let Z = 0;
	for (let i = 0; i < n; i++) {
		const r = reflectance[i];
		X += x[i] * r;
		Y += y[i] * r;
		Z += z[i] * r;
	}
	return { X, Y, Z };
}

/** X, Y, Z of a reflectance under an illuminant, for one observer (weights cached). */
export function spectrumToXyz(options: {
	reflectance: ArrayLike<number>;
	grid: WavelengthGrid;
	illuminant: Illuminant;
	observer?: ObserverName;
}): Xyz {
	const { grid, illuminant, observer = DEFAULT_OBSERVER } = options;
	return reflectanceToXyz(tristimulusWeights({ illuminant, observer, grid }), options.reflectance);
}

/** White point of an illuminant (Y = 100), integrated on `grid` (default 380–780 nm, 5 nm). */
export function illuminantWhitePoint(options: {
	illuminant: Illuminant;
	observer?: ObserverName;
	grid?: WavelengthGrid;
}): Xyz {
	const { illuminant, observer = DEFAULT_OBSERVER, grid = VISIBLE_5NM_GRID } = options;
	return tristimulusWeights({ illuminant, observer, grid }).white;
}
