/**
 * A sheet polarizer at oblique incidence, modelled as a uniaxial absorbing film (Yeh & Gu,
 * Optics of Liquid Crystal Displays (1999), polarizer chapter; an "O-type" sheet: its absorption
 * axis a lies in the sheet's plane, perpendicular to the pass axis).
 *
 * Indices ñ = n_p − iκ (e^{+iωt}: an absorbing index has a negative imaginary part), with
 * κ fixed so that normal incidence reproduces the sheet's principal intensity transmittances:
 * e^{−2·k0·κ·h} = k (k1 for the ordinary wave, polarised along the pass axis; k2 for the
 * extraordinary, along a). For an in-plane axis the extraordinary wave has
 *   N_z² = ñ_e² − β² − (ñ_e² − ñ_o²)·(a·β)²/ñ_o²
 * (the uniaxial mode of uniaxial-slabs.ts with c_z = 0). The mode vectors are taken from the
 * real index n_p (weak absorption, κ/n_p ≲ 0.02: the mode directions move by ≲ κ²/n_p²):
 *   ordinary  ∝ (−a_y, a_x) (the pass axis), extraordinary ∝ a − (a·β / n_p²)·β.
 * k2 = 0 is the ideal sheet: the extraordinary wave is extinguished. The common real phase
 * e^{−i k0 √(n_p² − β²) h} of both modes is dropped.
 */

/** Base index of the film [common practice for PVA/TAC sheets: ≈ 1.5]. */
export const POLARIZER_INDEX = 1.5;
/** Thickness of the absorbing layer, m [from memory: iodine-PVA layers are ≈ 20–30 µm]. */
export const POLARIZER_FILM_m = 20e-6;

export interface PolarizerPass {
	/** Pass-axis azimuth in the display frame, rad. */
	axis_rad: number;
	k1: number;
	k2: number;
	betaX: number;
	betaY: number;
	wavelength_m: number;
}

/** √(re + i·im), principal root, without cancellation; writes [re, im] into out. */
function complexSqrt(out: Float64Array, re: number, im: number): Float64Array {
	const r = Math.hypot(re, im);
	if (r === 0) {
		out[0] = 0;
		out[1] = 0;
	} else if (re >= 0) {
		const a = Math.sqrt((r + re) / 2);
		out[0] = a;
		out[1] = im / (2 * a);
	} else {
		const b = Math.sign(im || 1) * Math.sqrt((r - re) / 2);
		out[0] = im / (2 * b);
		out[1] = b;
	}
	return out;
}

const root = new Float64Array(2);

/** Amplitude factor e^{−i k0 (N_z − N_z,real) h} given N_z² = re + i·im; [re, im] into out. */
function modeAmplitude(
	out: Float64Array,
	nzSq: { re: number; im: number },
	reference: number,
	k0h: number
): Float64Array {
	complexSqrt(root, nzSq.re, nzSq.im);
	// choose the decaying root: Im(N_z) ≤ 0
	let nr = root[0],
		ni = root[1];
	if (ni > 0) {
		nr = -nr;
		ni = -ni;
	}
	if (nr < 0) nr = -nr;
	const magnitude = Math.exp(k0h * ni);
	const phase = -k0h * (nr - reference);
	out[0] = magnitude * Math.cos(phase);
	out[1] = magnitude * Math.sin(phase);
	return out;
}

function scaleEntry(m: Float64Array, index: number, factor: Float64Array): void {
	const mr = m[index],
		mi = m[index + 1];
	m[index] = factor[0] * mr - factor[1] * mi;
	m[index + 1] = factor[0] * mi + factor[1] * mr;
}

const ampO = new Float64Array(2);
const ampE = new Float64Array(2);
const sq = { re: 0, im: 0 };

/** m ← P·m for the film at the given incidence (forward and backward alike). */
export function propagatePolarizer(m: Float64Array, pass: PolarizerPass): Float64Array {
	const { axis_rad, k1, k2, betaX: bx, betaY: by } = pass;
	const n = POLARIZER_INDEX;
	const k0 = (2 * Math.PI) / pass.wavelength_m;
	const k0h = k0 * POLARIZER_FILM_m;
	const betaSq = bx * bx + by * by;
	const reference = Math.sqrt(n * n - betaSq);
	const kappaO = k1 > 0 ? -Math.log(k1) / (2 * k0h) : Infinity;
	const kappaE = k2 > 0 ? -Math.log(k2) / (2 * k0h) : Infinity;
	// absorption axis a = pass axis + 90°
	const ax = -Math.sin(axis_rad),
		ay = Math.cos(axis_rad);
	const aDotBeta = ax * bx + ay * by;
	// ñ² = (n − iκ)² = n² − κ² − 2inκ
	const noRe = n * n - kappaO * kappaO,
		noIm = -2 * n * kappaO;
	const neRe = n * n - kappaE * kappaE,
		neIm = -2 * n * kappaE;
	if (Number.isFinite(kappaO)) {
		sq.re = noRe - betaSq;
		sq.im = noIm;
		modeAmplitude(ampO, sq, reference, k0h);
	} else ampO.fill(0);
	if (Number.isFinite(kappaE)) {
		// (ñe² − ño²)/ño² · (a·β)²
		const dr = neRe - noRe,
			di = neIm - noIm;
		const den = noRe * noRe + noIm * noIm;
		const qr = (dr * noRe + di * noIm) / den,
			qi = (di * noRe - dr * noIm) / den;
		const t = aDotBeta * aDotBeta;
		sq.re = neRe - betaSq - qr * t;
		sq.im = neIm - qi * t;
		modeAmplitude(ampE, sq, reference, k0h);
	} else ampE.fill(0);
	// mode vectors (real): e ∝ a − (a·β/n²)β, o ∝ (−a_y, a_x)
	const cn = aDotBeta / (n * n);
	let ex = ax - cn * bx,
		ey = ay - cn * by;
	const le = Math.hypot(ex, ey);
	ex /= le;
	ey /= le;
	const ox = -ay,
		oy = ax;
	const det = ex * oy - ey * ox;
	const r0 = oy / det,
		r1 = -ox / det;
	// P = a_o·I + (a_e − a_o)·ê·r
	const fr = ampE[0] - ampO[0],
		fi = ampE[1] - ampO[1];
	for (let col = 0; col < 2; col++) {
		const a = 2 * col,
			b = 4 + 2 * col;
		const wr = r0 * m[a] + r1 * m[b],
			wi = r0 * m[a + 1] + r1 * m[b + 1];
		const ur = fr * wr - fi * wi,
			ui = fr * wi + fi * wr;
		scaleEntry(m, a, ampO);
		scaleEntry(m, b, ampO);
		m[a] += ex * ur;
		m[a + 1] += ex * ui;
		m[b] += ey * ur;
		m[b + 1] += ey * ui;
	}
	return m;
}
