/**
 * Cosine-weighted average over the hemisphere of incidence, for light from a uniformly bright
 * surround: ⟨f⟩ = (1/π)∫∫ f·cos θ·sin θ dθ dφ = (1/2π)∫₀^{2π}∫₀¹ f du dφ with u = sin²θ.
 * u by Gauss–Legendre (4 nodes on [0, 1], Abramowitz & Stegun (1964) Table 25.4), φ by the
 * midpoint rule (exact for the trigonometric polynomials of low order the stack gives).
 */
import type { ViewDirection } from './view-direction';

const GAUSS_NODES = [
	-0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526
];
const GAUSS_WEIGHTS = [
	0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538
];
export const HEMISPHERE_AZIMUTHS = 8;

export interface WeightedDirection extends ViewDirection {
	/** Weight; all weights sum to 1. */
	weight: number;
}

export function hemisphereDirections(azimuths = HEMISPHERE_AZIMUTHS): WeightedDirection[] {
	const list: WeightedDirection[] = [];
	GAUSS_NODES.forEach((x, i) => {
		const u = (x + 1) / 2;
		const polar_deg = (Math.asin(Math.sqrt(u)) * 180) / Math.PI;
		for (let a = 0; a < azimuths; a++) {
			list.push({
				polar_deg,
				azimuth_deg: ((a + 0.5) * 360) / azimuths,
				weight: GAUSS_WEIGHTS[i] / 2 / azimuths
			});
		}
	});
	return list;
}
