/**
 * Discrete free energy of a twisted-nematic director across the gap, with its exact gradient
 * and Hessian, for the Newton solver.
 *
 * Model [Frank, Discuss. Faraday Soc. 25:19 (1958); Deuling, Mol. Cryst. Liq. Cryst. 19:123
 * (1972)]: n = (cosθ cosφ, cosθ sinφ, sinθ), θ tilt from the substrate, φ azimuth. Energy
 * per unit area at fixed RMS voltage V (constant-voltage condition, D_z uniform):
 *   G = ∫ [½(K11cos²θ + K33sin²θ)θ′² + ½(K22cos²θ + K33sin²θ)cos²θ φ′² − K22q0cos²θ φ′] dz − ½CV²,
 *   C = ε0/∫dz/ε_zz, ε_zz = ε⊥ + Δε sin²θ.
 * Discretisation: N equal slabs between N+1 nodes; each slab uses the midpoint tilt and the
 * difference quotients of its end nodes. The discrete G is minimised directly, so its gradient is
 * the discretised Euler-Lagrange residual and the line search can test a true energy.
 * Units inside: z/d, energies in K11/d, voltage parameter v² = ε0V²/K11, relative permittivities.
 * The capacitance term couples every node (a rank-one update −Q·g gᵀ of an otherwise
 * block-tridiagonal Hessian); the solver applies it by Sherman-Morrison.
 * Unknown layout: x[2k] = θ at node k+1, x[2k+1] = φ at node k+1 (interior nodes only).
 * No allocation here: all storage lives in the workspace.
 */

/** Preallocated storage and the dimensionless constants of one solve. */
export interface DirectorWorkspace {
	/** Number of slabs N; nodes 0..N. */
	slices: number;
	/** Dimensionless constants, set by setWorkspaceConstants. */
	k22: number;
	k33: number;
	chiralTwist: number;
	epsPerp: number;
	deltaEps: number;
	voltageSq: number;
	/** Node values θ, φ (length N+1), boundary nodes included. */
	theta: Float64Array;
	phi: Float64Array;
	/** Trial node values for the line search. */
	trialTheta: Float64Array;
	trialPhi: Float64Array;
	/** Per-slab sin 2t, cos 2t (t = midpoint tilt) and ∂Ĩ/∂t. */
	sin2t: Float64Array;
	cos2t: Float64Array;
	slabDIdt: Float64Array;
	/** Gradient over the 2(N−1) unknowns. */
	gradient: Float64Array;
	/** 2×2 diagonal blocks (row-major, 4 per interior node) and upper blocks (node k to k+1). */
	diag: Float64Array;
	upper: Float64Array;
	/** ∂Ĩ/∂θ at interior nodes (the rank-one vector). */
	couplingTheta: Float64Array;
	/** Solver scratch: inverse Schur blocks, solution vectors. */
	schurInverse: Float64Array;
	step: Float64Array;
	scratchA: Float64Array;
	scratchB: Float64Array;
	scratchRhs: Float64Array;
	/** Results of the last assemble: Ĩ = ∫dz̃/ε_zz and Q = v²/Ĩ³. */
	integral: number;
	rankOneWeight: number;
}

export function createDirectorWorkspace(slices: number): DirectorWorkspace {
	const interior = slices - 1;
	return {
		slices,
		k22: 0,
		k33: 0,
		chiralTwist: 0,
		epsPerp: 1,
		deltaEps: 0,
		voltageSq: 0,
		theta: new Float64Array(slices + 1),
		phi: new Float64Array(slices + 1),
		trialTheta: new Float64Array(slices + 1),
		trialPhi: new Float64Array(slices + 1),
		sin2t: new Float64Array(slices),
		cos2t: new Float64Array(slices),
		slabDIdt: new Float64Array(slices),
		gradient: new Float64Array(2 * interior),
		diag: new Float64Array(4 * interior),
		upper: new Float64Array(4 * Math.max(interior - 1, 0)),
		couplingTheta: new Float64Array(interior),
		schurInverse: new Float64Array(4 * interior),
		step: new Float64Array(2 * interior),
		scratchA: new Float64Array(2 * interior),
		scratchB: new Float64Array(2 * interior),
		scratchRhs: new Float64Array(2 * interior),
		integral: 0,
		rankOneWeight: 0
	};
}

/** Dimensionless material, chirality and voltage constants (SI in, ratios out). */
export function setWorkspaceConstants(
	ws: DirectorWorkspace,
	options: {
		k11_N: number;
		k22_N: number;
		k33_N: number;
		epsPerpendicular: number;
		epsParallel: number;
		gapToPitch: number;
		voltage_V: number;
		epsilon0_Fm: number;
	}
): void {
	ws.k22 = options.k22_N / options.k11_N;
	ws.k33 = options.k33_N / options.k11_N;
	ws.chiralTwist = 2 * Math.PI * options.gapToPitch;
	ws.epsPerp = options.epsPerpendicular;
	ws.deltaEps = options.epsParallel - options.epsPerpendicular;
	ws.voltageSq = (options.epsilon0_Fm * options.voltage_V * options.voltage_V) / options.k11_N;
}

/** Dimensionless G of the node values (θ, φ), in units of K11/d. Also returns Ĩ via ws.integral. */
export function energyOf(ws: DirectorWorkspace, theta: Float64Array, phi: Float64Array): number {
	const n = ws.slices;
	const h = 1 / n;
	const { k22, k33, chiralTwist, epsPerp, deltaEps } = ws;
	let frank = 0;
	let integral = 0;
	for (let i = 0; i < n; i++) {
		const u = 0.5 * (1 - Math.cos(theta[i] + theta[i + 1]));
		const c = 1 - u;
		const dTheta = (theta[i + 1] - theta[i]) * n;
		const dPhi = (phi[i + 1] - phi[i]) * n;
		const f1 = 1 + (k33 - 1) * u;
		const f2 = k22 * c * c + k33 * u * c;
		frank += 0.5 * f1 * dTheta * dTheta + 0.5 * f2 * dPhi * dPhi - k22 * chiralTwist * c * dPhi;
		integral += 1 / (epsPerp + deltaEps * u);
	}
	integral *= h;
	ws.integral = integral;
	return frank * h - (0.5 * ws.voltageSq) / integral;
}

/**
 * Gradient and Hessian at ws.theta/ws.phi: fills gradient, diag, upper (the local, banded part B)
 * and couplingTheta, integral, rankOneWeight so that the full Hessian is B − Q·g gᵀ.
 * Returns G.
 */
export function assembleDirector(ws: DirectorWorkspace): number {
	const n = ws.slices;
	const h = 1 / n;
	const { theta, phi, sin2t, cos2t, slabDIdt, gradient, diag, upper, couplingTheta } = ws;
	const { k22, k33, chiralTwist, epsPerp, deltaEps, voltageSq } = ws;
	const chiral = k22 * chiralTwist;

	// Pass 1: trigonometry, the capacitance integral and the Frank energy.
	let integral = 0;
	let frank = 0;
	for (let i = 0; i < n; i++) {
		const twoT = theta[i] + theta[i + 1];
		const s2 = Math.sin(twoT);
		const c2 = Math.cos(twoT);
		sin2t[i] = s2;
		cos2t[i] = c2;
		const u = 0.5 * (1 - c2);
		const eps = epsPerp + deltaEps * u;
		integral += 1 / eps;
		slabDIdt[i] = (-h * deltaEps * s2) / (eps * eps);
		const c = 1 - u;
		const dTheta = (theta[i + 1] - theta[i]) * n;
		const dPhi = (phi[i + 1] - phi[i]) * n;
		frank +=
			0.5 * (1 + (k33 - 1) * u) * dTheta * dTheta +
			0.5 * (k22 * c * c + k33 * u * c) * dPhi * dPhi -
			chiral * c * dPhi;
	}
	integral *= h;
	const pressure = (0.5 * voltageSq) / (integral * integral); // ∂G/∂Ĩ
	ws.integral = integral;
	ws.rankOneWeight = voltageSq / (integral * integral * integral); // −∂²G/∂Ĩ²

	gradient.fill(0);
	diag.fill(0);
	const interior = n - 1;

	// Pass 2: slab contributions to gradient and the banded Hessian.
	for (let i = 0; i < n; i++) {
		const s2 = sin2t[i];
		const c2 = cos2t[i];
		const u = 0.5 * (1 - c2);
		const c = 1 - u;
		const dTheta = (theta[i + 1] - theta[i]) * n;
		const dPhi = (phi[i + 1] - phi[i]) * n;

		const f1 = 1 + (k33 - 1) * u;
		const f1t = (k33 - 1) * s2;
		const f1tt = 2 * (k33 - 1) * c2;
		const f2 = k22 * c * c + k33 * u * c;
		const f2u = -2 * k22 * c + k33 * (1 - 2 * u);
		const f2uu = 2 * k22 - 2 * k33;
		const f2t = f2u * s2;
		const f2tt = f2uu * s2 * s2 + 2 * f2u * c2;
		const g3 = -chiral * c;
		const g3t = chiral * s2;
		const g3tt = 2 * chiral * c2;

		const eps = epsPerp + deltaEps * u;
		const epsT = deltaEps * s2;
		const epsTT = 2 * deltaEps * c2;
		const dIdtt = -h * (epsTT / (eps * eps) - (2 * epsT * epsT) / (eps * eps * eps));

		const bracketT = 0.5 * f1t * dTheta * dTheta + 0.5 * f2t * dPhi * dPhi + g3t * dPhi;
		const bracketTT = 0.5 * f1tt * dTheta * dTheta + 0.5 * f2tt * dPhi * dPhi + g3tt * dPhi;
		const electricT = 0.5 * pressure * slabDIdt[i];
		const twistFlux = f2 * dPhi + g3;

		const hW4 = 0.25 * h * bracketTT + 0.25 * pressure * dIdtt;
		const hAA = hW4 - f1t * dTheta + f1 * n;
		const hBB = hW4 + f1t * dTheta + f1 * n;
		const hAB = hW4 - f1 * n;
		const mixed = 0.5 * (f2t * dPhi + g3t);
		const phiStiff = f2 * n;

		// Node a = i (unknown block i−1) if interior; node b = i+1 (block i) if interior.
		if (i >= 1) {
			const a = i - 1;
			gradient[2 * a] += 0.5 * h * bracketT - f1 * dTheta + electricT;
			gradient[2 * a + 1] -= twistFlux;
			diag[4 * a] += hAA;
			diag[4 * a + 1] -= mixed;
			diag[4 * a + 2] -= mixed;
			diag[4 * a + 3] += phiStiff;
		}
		if (i + 1 <= interior) {
			const b = i;
			gradient[2 * b] += 0.5 * h * bracketT + f1 * dTheta + electricT;
			gradient[2 * b + 1] += twistFlux;
			diag[4 * b] += hBB;
			diag[4 * b + 1] += mixed;
			diag[4 * b + 2] += mixed;
			diag[4 * b + 3] += phiStiff;
		}
		if (i >= 1 && i + 1 <= interior) {
			const k = i - 1; // upper block from unknown block k to k+1
			upper[4 * k] = hAB;
			upper[4 * k + 1] = mixed;
			upper[4 * k + 2] = -mixed;
			upper[4 * k + 3] = -phiStiff;
		}
	}
	for (let k = 0; k < interior; k++) couplingTheta[k] = 0.5 * (slabDIdt[k] + slabDIdt[k + 1]);
	return frank * h - (0.5 * voltageSq) / integral;
}
