/*
 * CIEDE2000 colour difference ΔE00, CIE 142-2001 / ISO/CIE 11664-6, following the
 * implementation notes of Sharma, Wu & Dalal, Color Res. Appl. 30(1):21-30 (2005).
 * Angles in degrees as in the paper. Hue angle h′ = 0 when a′ = b = 0; the hue difference and
 * mean hue take the shorter way round the circle (Table 1 pairs 9-16 of the paper exercise these
 * branches). Symmetric in its arguments. kL = kC = kH = 1 are the reference conditions.
 */
import type { Lab } from './types';

export interface ParametricFactors {
	readonly kL: number;
	readonly kC: number;
	readonly kH: number;
}

const REFERENCE_CONDITIONS: ParametricFactors = { kL: 1, kC: 1, kH: 1 };
const TWENTY_FIVE_TO_THE_7 = 25 ** 7;
const RAD_PER_DEG = Math.PI / 180;

function hueAngle_deg(b: number, aPrime: number): number {
	if (aPrime === 0 && b === 0) return 0;
	const h = Math.atan2(b, aPrime) / RAD_PER_DEG;
	return h < 0 ? h + 360 : h;
}

function chromaWeight(c: number): number {
	const c7 = c ** 7;
	return Math.sqrt(c7 / (c7 + TWENTY_FIVE_TO_THE_7));
}

function cosDeg(angle_deg: number): number {
	return Math.cos(angle_deg * RAD_PER_DEG);
}

/** A CIEDE2000 function with parametric factors kL, kC, kH (e.g. kL = 2 for textiles). */
export function deltaE2000WithFactors(
	factors: ParametricFactors
): (reference: Lab, sample: Lab) => number {
	const { kL, kC, kH } = factors;
	return (reference, sample) => {
		const meanChroma = (Math.hypot(reference.a, reference.b) + Math.hypot(sample.a, sample.b)) / 2;
		const G = 0.5 * (1 - chromaWeight(meanChroma));
		const a1 = (1 + G) * reference.a;
		const a2 = (1 + G) * sample.a;
		const C1 = Math.hypot(a1, reference.b);
		const C2 = Math.hypot(a2, sample.b);
		const h1 = hueAngle_deg(reference.b, a1);
		const h2 = hueAngle_deg(sample.b, a2);
		const chromatic = C1 * C2 !== 0;

		let dh = chromatic ? h2 - h1 : 0;
		if (dh > 180) dh -= 360;
		else if (dh < -180) dh += 360;
		const dL = sample.L - reference.L;
		const dC = C2 - C1;
		const dH = 2 * Math.sqrt(C1 * C2) * Math.sin((dh / 2) * RAD_PER_DEG);

		const Lbar = (reference.L + sample.L) / 2;
		const Cbar = (C1 + C2) / 2;
		let hbar = h1 + h2;
		if (chromatic) {
			if (Math.abs(h1 - h2) <= 180) hbar /= 2;
			else hbar = hbar < 360 ? (hbar + 360) / 2 : (hbar - 360) / 2;
		}

		const T =
			1 -
			0.17 * cosDeg(hbar - 30) +
			0.24 * cosDeg(2 * hbar) +
			0.32 * cosDeg(3 * hbar + 6) -
			0.2 * cosDeg(4 * hbar - 63);
		const dTheta_deg = 30 * Math.exp(-(((hbar - 275) / 25) ** 2));
		const RC = 2 * chromaWeight(Cbar);
		const Lbar50sq = (Lbar - 50) ** 2;
		const SL = 1 + (0.015 * Lbar50sq) / Math.sqrt(20 + Lbar50sq);
		const SC = 1 + 0.045 * Cbar;
		const SH = 1 + 0.015 * Cbar * T;
		const RT = -Math.sin(2 * dTheta_deg * RAD_PER_DEG) * RC;

		const lightness = dL / (kL * SL);
		const chroma = dC / (kC * SC);
		const hue = dH / (kH * SH);
		return Math.sqrt(lightness ** 2 + chroma ** 2 + hue ** 2 + RT * chroma * hue);
	};
}

const deltaE2000AtReferenceConditions = deltaE2000WithFactors(REFERENCE_CONDITIONS);

/** CIEDE2000 difference between two CIELAB colours (same white), reference conditions. */
export function deltaE2000(reference: Lab, sample: Lab): number {
	return deltaE2000AtReferenceConditions(reference, sample);
}
