/**
 * A plane interface between two lossless isotropic media, from the continuity of the tangential
 * E and H fields (Maxwell's boundary conditions; Born & Wolf, Principles of Optics, §1.5). Written
 * with the tangential admittances Y_s = n·cos θ and Y_p = n / cos θ: r = (Y1 − Y2)/(Y1 + Y2),
 * power transmittance T = 4·Y1·Y2/(Y1 + Y2)² = 1 − |r|². Beyond the critical angle T = 0.
 * Used for the front surface of the display at the viewing angle; tested against the Fresnel
 * equations in their textbook form.
 */

export interface InterfacePower {
	/** Power reflectance and transmittance for s and p light. */
	Rs: number;
	Rp: number;
	Ts: number;
	Tp: number;
}

export function isotropicInterface(options: {
	n1: number;
	n2: number;
	/** sin θ1 in the first medium. */
	sinTheta1: number;
}): InterfacePower {
	const { n1, n2, sinTheta1 } = options;
	if (!(n1 > 0 && n2 > 0)) throw new RangeError('indices must be positive');
	if (!(sinTheta1 >= 0 && sinTheta1 <= 1)) throw new RangeError('sinTheta1 must lie in [0, 1]');
	const cos1 = Math.sqrt(1 - sinTheta1 * sinTheta1);
	const sin2 = (n1 * sinTheta1) / n2;
	if (sin2 >= 1) return { Rs: 1, Rp: 1, Ts: 0, Tp: 0 };
	const cos2 = Math.sqrt(1 - sin2 * sin2);
	const ys1 = n1 * cos1,
		ys2 = n2 * cos2;
	const yp1 = n1 / cos1,
		yp2 = n2 / cos2;
	const rs = (ys1 - ys2) / (ys1 + ys2);
	const rp = (yp1 - yp2) / (yp1 + yp2);
	return {
		Rs: rs * rs,
		Rp: rp * rp,
		Ts: (4 * ys1 * ys2) / ((ys1 + ys2) * (ys1 + ys2)),
		Tp: (4 * yp1 * yp2) / ((yp1 + yp2) * (yp1 + yp2))
	};
}

/** Index of a surface whose normal-incidence reflectance is R: n = (1 + √R)/(1 − √R). */
export function indexOfNormalReflectance(reflectance: number): number {
	if (!(reflectance >= 0 && reflectance < 1))
		throw new RangeError(`reflectance must lie in [0, 1), got ${reflectance}`);
	const r = Math.sqrt(reflectance);
	return (1 + r) / (1 - r);
}
