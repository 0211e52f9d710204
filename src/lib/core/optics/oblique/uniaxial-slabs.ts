/**
 * Extended Jones propagation through a stack of thin lossless uniaxial slabs at oblique
 * incidence (Yeh, JOSA 72:507 (1982); Gu & Yeh, JOSA A 10:966 (1993); Lien, APL 57:2767 (1990)).
 *
 * The Jones vector holds the tangential field (E_x, E_y), which is continuous across every
 * interface; reflections between slabs are neglected (indices of glass, polyimide and liquid
 * crystal differ by ≲ 0.15, so each interface reflects ≲ 0.2 %).
 *
 * In a slab with optic axis (director) c, ordinary index n_o, extraordinary n_e, Δε = n_e² − n_o²,
 * ε_zz = n_o² + Δε·c_z² and s = β·c_t, the two modes sharing the tangential wave vector k0·β are
 *   ordinary      N_z = ±√(n_o² − β²),                       E ∝ N × c
 *   extraordinary N_z = (−Δε·c_z·s ± n_o·√(ε_zz·(n_e² − β²) − Δε·s²)) / ε_zz,
 *                                                             E ∝ c − (c·N / n_o²)·N
 * (+ forward, − backward; derived from N × (N × E) + ε·E = 0, the form in Yeh & Gu, Optics of
 * Liquid Crystal Displays (1999), extended-Jones chapter). With S = [e_t o_t] the slab matrix is
 * S·diag(e^{−i k0 N_z,e h}, e^{−i k0 N_z,o h})·S⁻¹. All slabs share h and the ordinary N_z, so
 * the ordinary phase is common and dropped: the update is rank one,
 *   M ← M + (e^{−iΔ} − 1)·ê·(r·M),  Δ = k0·(|N_z,e| − |N_z,o|)·h,  r the first row of S⁻¹.
 * Conventions as in ../README.md: e^{+iωt}, a delay is e^{−iφ}. No allocation.
 */

export interface OrientedSlabs {
	count: number;
	/** Slab thickness, m. */
	thickness_m: number;
	/** Director of each slab in the display frame (unit vectors). */
	cx: Float64Array;
	cy: Float64Array;
	cz: Float64Array;
}

/** Reusable inputs for one pass (mutated by the caller; no allocation per call). */
export interface SlabPass {
	slabs: OrientedSlabs;
	betaX: number;
	betaY: number;
	ne: number;
	no: number;
	wavelength_m: number;
	/** +1: forward (into the cell, slab 0 first); −1: backward (out of it, last slab first). */
	sense: 1 | -1;
}

const DEGENERATE = 1e-24;

/** m ← (slab stack)·m, a complex 2×2 in the layout of ../complex2x2.ts. */
export function propagateSlabs(m: Float64Array, pass: SlabPass): Float64Array {
	const { slabs, betaX: bx, betaY: by, ne, no, sense } = pass;
	const no2 = no * no;
	const invNo2 = 1 / no2;
	const dEps = ne * ne - no2;
	const betaSq = bx * bx + by * by;
	const nzo = sense * Math.sqrt(no2 - betaSq);
	const k0h = ((2 * Math.PI) / pass.wavelength_m) * slabs.thickness_m;
	const ne2MinusBeta = ne * ne - betaSq;
	for (let step = 0; step < slabs.count; step++) {
		const k = sense > 0 ? step : slabs.count - 1 - step;
		const cx = slabs.cx[k],
			cy = slabs.cy[k],
			cz = slabs.cz[k];
		const s = bx * cx + by * cy;
		const ezz = no2 + dEps * cz * cz;
		const root = no * Math.sqrt(ezz * ne2MinusBeta - dEps * s * s);
		const nze = (-dEps * cz * s + sense * root) / ezz;
		const delta = k0h * (sense * nze - sense * nzo);
		// e_t = c_t − (c·N/n_o²)·β ; o_t = (β_y c_z − N_z c_y, N_z c_x − β_x c_z)
		const cn = (s + cz * nze) * invNo2;
		const ex = cx - cn * bx,
			ey = cy - cn * by;
		const ox = by * cz - nzo * cy,
			oy = nzo * cx - bx * cz;
		// S = [e o] need not be normalised: ê ⊗ r is invariant under scaling either column
		const det = ex * oy - ey * ox;
		if (!(Math.abs(det) > DEGENERATE)) continue; // axis along the wave: both modes alike
		// first row of S⁻¹ = (o_y, −o_x)/det
		const invDet = 1 / det;
		const r0 = oy * invDet,
			r1 = -ox * invDet;
		// f = e^{−iΔ} − 1
		const fr = Math.cos(delta) - 1,
			fi = -Math.sin(delta);
		for (let col = 0; col < 2; col++) {
			const a = 2 * col,
				b = 4 + 2 * col;
			const wr = r0 * m[a] + r1 * m[b],
				wi = r0 * m[a + 1] + r1 * m[b + 1];
			const ur = fr * wr - fi * wi,
				ui = fr * wi + fi * wr;
			m[a] += ex * ur;
			m[a + 1] += ex * ui;
			m[b] += ey * ur;
			m[b + 1] += ey * ui;
		}
	}
	return m;
}

/** Extraordinary N_z of one slab (forward or backward root), for checks and tools. */
export function extraordinaryNz(options: {
	c: readonly [number, number, number];
	betaX: number;
	betaY: number;
	ne: number;
	no: number;
	sense: 1 | -1;
}): number {
	const { c, betaX, betaY, ne, no, sense } = options;
	const dEps = ne * ne - no * no;
	const s = betaX * c[0] + betaY * c[1];
	const ezz = no * no + dEps * c[2] * c[2];
	const betaSq = betaX * betaX + betaY * betaY;
	return (-dEps * c[2] * s + sense * no * Math.sqrt(ezz * (ne * ne - betaSq) - dEps * s * s)) / ezz;
}
