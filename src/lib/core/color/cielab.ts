/*
 * CIE 1976 L*a*b* (CIELAB), CIE 15:2004 (ISO/CIE 11664-4):
 *   L* = 116 f(Y/Yn) − 16,  a* = 500 [f(X/Xn) − f(Y/Yn)],  b* = 200 [f(Y/Yn) − f(Z/Zn)],
 *   f(t) = t^(1/3) for t > (6/29)³, else t/(3·(6/29)²) + 4/29.
 * (Xn, Yn, Zn) is the white of the illuminant and observer used for X, Y, Z. The constants below
 * are derived from δ = 6/29 rather than the rounded 0.008856 and 7.787.
 */
import type { Lab, Xyz } from './types';

const DELTA = 6 / 29;
const DELTA_CUBED = DELTA ** 3;
const LINEAR_SLOPE = 1 / (3 * DELTA * DELTA);
const LINEAR_OFFSET = 4 / 29;

function f(t: number): number {
	return t > DELTA_CUBED ? Math.cbrt(t) : t * LINEAR_SLOPE + LINEAR_OFFSET;
}

function fInverse(ft: number): number {
	return ft > DELTA ? ft ** 3 : (ft - LINEAR_OFFSET) / LINEAR_SLOPE;
}

/** CIELAB of `xyz` relative to the reference white `white` (same observer, same scale). */
export function xyzToLab(xyz: Xyz, white: Xyz): Lab {
	const fx = f(xyz.X / white.X);
	const fy = f(xyz.Y / white.Y);
	const fz = f(xyz.Z / white.Z);
	return { L: 116 * fy - 16, a: 500 * (fx - fy), b: 200 * (fy - fz) };
}

/** Tristimulus values of a CIELAB colour relative to `white` (inverse of xyzToLab). */
export function labToXyz(lab: Lab, white: Xyz): Xyz {
	const fy = (lab.L + 16) / 116;
	const fx = fy + lab.a / 500;
	const fz = fy - lab.b / 200;
	return { X: white.X * fInverse(fx), Y: white.Y * fInverse(fy), Z: white.Z * fInverse(fz) };
}
