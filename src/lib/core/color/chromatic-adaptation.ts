/*
 * Chromatic adaptation by the linearised Bradford transform (von Kries scaling in the Bradford
 * "sharpened cone" space): M = B⁻¹ · diag(ρ_t/ρ_s, γ_t/γ_s, β_t/β_s) · B, where (ρ, γ, β) = B·XYZ
 * of the source and target whites. B from Lam (1985), as used in ICC.1:2010 Annex E and CIECAM97s.
 * Whites and colours must share one scale (here Y = 100 for the white). B⁻¹ is computed here,
 * not copied. Cone responses (ρ, γ, β) travel in the X, Y, Z fields of an Xyz record.
 */
import {
	invertMatrix3,
	matrix3FromRows,
	multiplyMatrix3,
	transformXyz,
	type Matrix3
} from './matrix3';
import type { Xyz } from './types';

/** Bradford cone-response matrix B (rows: ρ, γ, β). */
export const BRADFORD: Matrix3 = matrix3FromRows([
	[0.8951, 0.2664, -0.1614],
	[-0.7502, 1.7135, 0.0367],
	[0.0389, -0.0685, 1.0296]
]);
const BRADFORD_INVERSE: Matrix3 = invertMatrix3(new Float64Array(9), BRADFORD);

/** The 3×3 matrix taking XYZ seen under `sourceWhite` to corresponding XYZ under `targetWhite`. */
export function bradfordAdaptationMatrix(whites: { sourceWhite: Xyz; targetWhite: Xyz }): Matrix3 {
	const source = transformXyz(BRADFORD, whites.sourceWhite);
	const target = transformXyz(BRADFORD, whites.targetWhite);
	const scaled = new Float64Array(BRADFORD);
	const gains = [target.X / source.X, target.Y / source.Y, target.Z / source.Z];
	for (let row = 0; row < 3; row++)
		for (let col = 0; col < 3; col++) scaled[3 * row + col] *= gains[row];
	return multiplyMatrix3(new Float64Array(9), BRADFORD_INVERSE, scaled);
}

/**
 * XYZ seen under `sourceWhite`, adapted to `targetWhite` (Bradford). Same result as applying
 * bradfordAdaptationMatrix, computed in cone space without building the matrix.
 */
export function adaptXyzBradford(options: { xyz: Xyz; sourceWhite: Xyz; targetWhite: Xyz }): Xyz {
	const source = transformXyz(BRADFORD, options.sourceWhite);
	const target = transformXyz(BRADFORD, options.targetWhite);
	const cone = transformXyz(BRADFORD, options.xyz);
	return transformXyz(BRADFORD_INVERSE, {
		X: (cone.X * target.X) / source.X,
		Y: (cone.Y * target.Y) / source.Y,
		Z: (cone.Z * target.Z) / source.Z
	});
}
