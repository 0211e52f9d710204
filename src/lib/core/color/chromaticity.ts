/*
 * Chromaticity coordinates, CIE 15:2004:
 *   x = X/(X+Y+Z), y = Y/(X+Y+Z);  u′ = 4X/(X+15Y+3Z), v′ = 9Y/(X+15Y+3Z) (CIE 1976 UCS).
 * Black (X = Y = Z = 0) has no chromaticity: callers may pass the value to report instead
 * (usually the illuminant's white); otherwise the result is NaN.
 */
import type { Chromaticity, ChromaticityUv, Xyz } from './types';

/** CIE x, y of tristimulus values. */
export function xyzToXy(xyz: Xyz, forBlack?: Chromaticity): Chromaticity {
	const total = xyz.X + xyz.Y + xyz.Z;
	if (total === 0) return forBlack ?? { x: NaN, y: NaN };
	return { x: xyz.X / total, y: xyz.Y / total };
}

/** CIE 1976 u′, v′ of tristimulus values. */
export function xyzToUvPrime(xyz: Xyz, forBlack?: ChromaticityUv): ChromaticityUv {
	const denominator = xyz.X + 15 * xyz.Y + 3 * xyz.Z;
	if (denominator === 0) return forBlack ?? { u: NaN, v: NaN };
	return { u: (4 * xyz.X) / denominator, v: (9 * xyz.Y) / denominator };
}

/** Tristimulus values with luminance Y from chromaticity x, y. */
export function xyToXyz(xy: Chromaticity, Y: number): Xyz {
	if (xy.y === 0) throw new RangeError('Chromaticity y = 0 has no finite tristimulus values');
	return { X: (xy.x * Y) / xy.y, Y, Z: ((1 - xy.x - xy.y) * Y) / xy.y };
}
