/**
 * Normal-incidence Fresnel reflectance of an interface between indices n1 and n2:
 *   R = ((n2 − n1)/(n2 + n1))²  (Fresnel equations at normal incidence).
 * The default front-surface reflectance of the stack is that of air to glass with n = 1.5
 * (0.0400), the figure for smooth untreated glass [published display-ergonomics guidance].
 */

export const AIR_INDEX = 1;
export const FRONT_GLASS_INDEX = 1.5; // typical soda-lime / polarizer cover [common practice]

export function fresnelNormalReflectance(n2: number, n1: number = AIR_INDEX): number {
	const r = (n2 - n1) / (n2 + n1);
	return r * r;
}

export const FRONT_SURFACE_REFLECTANCE_DEFAULT = fresnelNormalReflectance(FRONT_GLASS_INDEX);
