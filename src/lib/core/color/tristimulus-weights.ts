/*
 * Tristimulus weights for reflecting samples on a wavelength grid, CIE 15:2004:
 *   X = k Σ S(λ) R(λ) x̄(λ) Δλ (likewise Y, Z),  k = 100 / Σ S(λ) ȳ(λ) Δλ,
 * so that the perfect reflecting diffuser (R = 1) has Y = 100. Folding k·S·x̄·Δλ into one weight
 * per wavelength turns each evaluation into a dot product (Δλ cancels). The illuminant is
 * resampled onto the grid with nearest-value extension, the colour-matching functions with
 * zero beyond their 360–830 nm range. Weights are cached per (illuminant object, observer, grid).
 */
import { colorMatchingFunctions, type ObserverName } from './observers';
import { gridKey, resampleSpectrum, type WavelengthGrid } from './spectrum';
import type { Illuminant, Xyz } from './types';

export interface TristimulusWeights {
	readonly grid: WavelengthGrid;
	readonly observer: ObserverName;
	readonly illuminantName: string;
	/** k·S·x̄ at each grid wavelength (likewise y, z). */
	readonly x: Float64Array;
	readonly y: Float64Array;
	readonly z: Float64Array;
	/** Tristimulus values of the perfect reflecting diffuser (Y = 100): the white point. */
	readonly white: Xyz;
}

export interface WeightsRequest {
	readonly illuminant: Illuminant;
	readonly observer: ObserverName;
	readonly grid: WavelengthGrid;
}

function sum(values: Float64Array): number {
	let total = 0;
	for (let i = 0; i < values.length; i++) total += values[i];
	return total;
}

/** Compute weights afresh (no cache). */
export function computeTristimulusWeights(request: WeightsRequest): TristimulusWeights {
	const { illuminant, observer, grid } = request;
	if (!(grid.count >= 1)) throw new RangeError('The wavelength grid is empty');
	const power = resampleSpectrum(illuminant.spectrum, { grid, outside: 'nearest' }).values;
	const cmfs = colorMatchingFunctions(observer);
	const onGrid = (cmf: typeof cmfs.xBar) => resampleSpectrum(cmf, { grid, outside: 'zero' }).values;
	const x = onGrid(cmfs.xBar);
	const y = onGrid(cmfs.yBar);
	const z = onGrid(cmfs.zBar);
	let normalization = 0;
	for (let i = 0; i < grid.count; i++) normalization += power[i] * y[i];
	if (!(normalization > 0))
		throw new RangeError(`Illuminant ${illuminant.name} has no luminous power on this grid`);
	const k = 100 / normalization;
	for (let i = 0; i < grid.count; i++) {
		x[i] *= k * power[i];
		y[i] *= k * power[i];
		z[i] *= k * power[i];
	}
	return {
		grid,
		observer,
		illuminantName: illuminant.name,
		x,
		y,
		z,
		white: { X: sum(x), Y: sum(y), Z: sum(z) }
	};
}

const cache = new WeakMap<Illuminant, Map<string, TristimulusWeights>>();

/** Weights for (illuminant, observer, grid), computed once and then reused. */
export function tristimulusWeights(request: WeightsRequest): TristimulusWeights {
	let perIlluminant = cache.get(request.illuminant);
	if (!perIlluminant) {
		perIlluminant = new Map();
		cache.set(request.illuminant, perIlluminant);
	}
	const key = `${request.observer}|${gridKey(request.grid)}`;
	let weights = perIlluminant.get(key);
	if (!weights) {
		weights = computeTristimulusWeights(request);
		perIlluminant.set(key, weights);
	}
	return weights;
}
