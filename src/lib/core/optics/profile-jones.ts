/**
 * Jones matrix of a sliced director profile at normal incidence (Jones 1941; slab method as in
 * Yeh & Gu, Optics of Liquid Crystal Displays, TN chapter — from memory).
 * Per slab k: half-retardation Γ_k/2 = π·(n_eff(θ_k) − n_o)·Δz/λ, n_eff from
 * effective-index.ts. Two slab models:
 * - 'retarder': a uniform slab with its director at the midpoint azimuth φ_k,
 *     S_k = R(−φ_k)·diag(e^{−iΓ_k/2}, e^{+iΓ_k/2})·R(φ_k)
 *         = cos(Γ_k/2)·I − i·sin(Γ_k/2)·[[cos 2φ_k, sin 2φ_k], [sin 2φ_k, −cos 2φ_k]],
 *   M = S_{N−1}···S_0 (second order in Δz; ≈ 1e-5 of Gooch–Tarry with 4000 slabs).
 * - 'twisted' (default): each slab twists uniformly by δφ_k and uses the closed form of
 *   twisted-layer.ts; the inner rotations cancel, so M = R(−φ_exit)·A_{N−1}···A_0 (lab x = the
 *   entrance director). Exact for a uniformly twisted, uniformly tilted layer with any count.
 * With R(ψ) = [[cos ψ, sin ψ], [−sin ψ, cos ψ]] the director of slab k lies along
 * (cos φ_k, sin φ_k); some texts write R(φ_k)·diag·R(−φ_k), which with this R places the
 * director at −φ_k — the texts differ in twist handedness; ours matches the closed form.
 * Time dependence e^{+iωt}; the common phase is dropped. No allocation.
 */

import type { DirectorProfile } from './director-profile';
import type { RefractiveIndices } from './indices';
import { sinc } from './twisted-layer';
import { sliceDirectorProfile, type SlicedProfile } from './sliced-profile';
import { M_PER_NM } from './si';

export type SlabModel = 'twisted' | 'retarder';

/** One evaluation's inputs; may be a reused, mutated object in a wavelength loop. */
export interface SlicedJonesInput {
	sliced: SlicedProfile;
	ne: number;
	no: number;
	wavelength_nm: number;
	slabModel: SlabModel;
}

export function jonesOfSlicedProfile(out: Float64Array, input: SlicedJonesInput): Float64Array {
	const { sliced, ne, no, wavelength_nm } = input;
	const { count, cosSqTilt, sinSqTilt } = sliced;
	const neSq = ne * ne,
		noSq = no * no,
		neNo = ne * no;
	const phasePerIndex = (Math.PI * sliced.thickness_m) / (wavelength_nm * M_PER_NM);
	// P = [[a, b], [c, d]], complex, starts at identity.
	let a0 = 1,
		a1 = 0,
		b0 = 0,
		b1 = 0,
		c0 = 0,
		c1 = 0,
		d0 = 1,
		d1 = 0;
	if (input.slabModel === 'retarder') {
		const { cos2Azimuth, sin2Azimuth } = sliced;
		for (let k = 0; k < count; k++) {
			const nEff = neNo / Math.sqrt(noSq * cosSqTilt[k] + neSq * sinSqTilt[k]);
			const half = phasePerIndex * (nEff - no);
			const co = Math.cos(half),
				si = Math.sin(half);
			const sc = si * cos2Azimuth[k],
				ss = si * sin2Azimuth[k];
			// S = [[co − i·sc, −i·ss], [−i·ss, co + i·sc]]; P ← S·P
			const na0 = co * a0 + sc * a1 + ss * c1,
				na1 = co * a1 - sc * a0 - ss * c0;
			const nb0 = co * b0 + sc * b1 + ss * d1,
				nb1 = co * b1 - sc * b0 - ss * d0;
			const nc0 = ss * a1 + co * c0 - sc * c1,
				nc1 = -ss * a0 + co * c1 + sc * c0;
			const nd0 = ss * b1 + co * d0 - sc * d1,
				nd1 = -ss * b0 + co * d1 + sc * d0;
			a0 = na0;
			a1 = na1;
			b0 = nb0;
			b1 = nb1;
			c0 = nc0;
			c1 = nc1;
			d0 = nd0;
			d1 = nd1;
		}
	} else {
		const { twistStep_rad } = sliced;
		for (let k = 0; k < count; k++) {
			const nEff = neNo / Math.sqrt(noSq * cosSqTilt[k] + neSq * sinSqTilt[k]);
			const half = phasePerIndex * (nEff - no);
			const step = twistStep_rad[k];
			const x = Math.sqrt(step * step + half * half);
			const sx = sinc(x);
			const ar = Math.cos(x),
				ai = -half * sx,
				beta = step * sx;
			// A = [[α, β], [−β, α*]], α = ar + i·ai; P ← A·P
			const na0 = ar * a0 - ai * a1 + beta * c0,
				na1 = ar * a1 + ai * a0 + beta * c1;
			const nb0 = ar * b0 - ai * b1 + beta * d0,
				nb1 = ar * b1 + ai * b0 + beta * d1;
			const nc0 = -beta * a0 + ar * c0 + ai * c1,
				nc1 = -beta * a1 + ar * c1 - ai * c0;
			const nd0 = -beta * b0 + ar * d0 + ai * d1,
				nd1 = -beta * b1 + ar * d1 - ai * d0;
			a0 = na0;
			a1 = na1;
			b0 = nb0;
			b1 = nb1;
			c0 = nc0;
			c1 = nc1;
			d0 = nd0;
			d1 = nd1;
		}
		// P ← R(−φ_exit)·P, R(−φ) = [[cos φ, −sin φ], [sin φ, cos φ]]
		const co = Math.cos(sliced.exitAzimuth_rad),
			si = Math.sin(sliced.exitAzimuth_rad);
		const na0 = co * a0 - si * c0,
			na1 = co * a1 - si * c1;
		const nb0 = co * b0 - si * d0,
			nb1 = co * b1 - si * d1;
		c0 = si * a0 + co * c0;
		c1 = si * a1 + co * c1;
		d0 = si * b0 + co * d0;
		d1 = si * b1 + co * d1;
		a0 = na0;
		a1 = na1;
		b0 = nb0;
		b1 = nb1;
	}
	out[0] = a0;
	out[1] = a1;
	out[2] = b0;
	out[3] = b1;
	out[4] = c0;
	out[5] = c1;
	out[6] = d0;
	out[7] = d1;
	return out;
}

export interface ProfileJonesOptions {
	profile: DirectorProfile;
	indices: RefractiveIndices;
	wavelength_nm: number;
	/** Default 'twisted'. */
	slabModel?: SlabModel;
	/** Slabs per node interval, default 1. */
	subslices?: number;
}

/** Convenience (allocates): slice a profile and return its lab-frame Jones matrix. */
export function jonesOfProfile(out: Float64Array, options: ProfileJonesOptions): Float64Array {
	const sliced = sliceDirectorProfile(options.profile, { subslices: options.subslices });
	return jonesOfSlicedProfile(out, {
		sliced,
		ne: options.indices.ne,
		no: options.indices.no,
		wavelength_nm: options.wavelength_nm,
		slabModel: options.slabModel ?? 'twisted'
	});
}
