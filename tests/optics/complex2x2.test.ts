import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	applyToVector,
	copy,
	createMatrix,
	createVector,
	determinant,
	diagonalRetarder,
	identity,
	multiply,
	rotation,
	transpose
} from '../../src/lib/core/optics/complex2x2';

const entry = fc.double({ min: -2, max: 2, noNaN: true });
const matrix = fc.array(entry, { minLength: 8, maxLength: 8 }).map((v) => Float64Array.from(v));

function expectMatrixClose(actual: Float64Array, expected: Float64Array, tolerance: number): void {
	for (let i = 0; i < 8; i++) {
		expect(
			Math.abs(actual[i] - expected[i]),
			`entry ${i}: ${actual[i]} vs ${expected[i]}`
		).toBeLessThanOrEqual(tolerance);
	}
}

describe('complex 2×2 kernels', () => {
	it('multiplies complex matrices (hand-worked product)', () => {
		// a = [[1+2i, 0], [0, i]], b = [[1, i], [2, 3]] → a·b = [[1+2i, −2+i], [2i, 3i]]
		const a = Float64Array.of(1, 2, 0, 0, 0, 0, 0, 1);
		const b = Float64Array.of(1, 0, 0, 1, 2, 0, 3, 0);
		expectMatrixClose(multiply(createMatrix(), a, b), Float64Array.of(1, 2, -2, 1, 0, 2, 0, 3), 0);
	});

	it('multiply is safe when out aliases either input', () => {
		fc.assert(
			fc.property(matrix, matrix, (a, b) => {
				const expected = multiply(createMatrix(), a, b);
				expectMatrixClose(
					multiply(copy(createMatrix(), a), copy(createMatrix(), a), b),
					expected,
					0
				);
				const left = copy(createMatrix(), a);
				expectMatrixClose(multiply(left, left, b), expected, 0);
				const right = copy(createMatrix(), b);
				expectMatrixClose(multiply(right, a, right), expected, 0);
				const square = copy(createMatrix(), a);
				expectMatrixClose(multiply(square, square, square), multiply(createMatrix(), a, a), 0);
			})
		);
	});

	it('determinant is multiplicative and transpose-invariant', () => {
		fc.assert(
			fc.property(matrix, matrix, (a, b) => {
				const da = determinant(new Float64Array(2), a);
				const db = determinant(new Float64Array(2), b);
				const dab = determinant(new Float64Array(2), multiply(createMatrix(), a, b));
				expect(dab[0]).toBeCloseTo(da[0] * db[0] - da[1] * db[1], 10);
				expect(dab[1]).toBeCloseTo(da[0] * db[1] + da[1] * db[0], 10);
				const dt = determinant(new Float64Array(2), transpose(createMatrix(), a));
				expect(dt[0]).toBeCloseTo(da[0], 12);
				expect(dt[1]).toBeCloseTo(da[1], 12);
			})
		);
	});

	it('rotations compose, R(a)·R(b) = R(a+b), and have det 1', () => {
		const angle = fc.double({ min: -7, max: 7, noNaN: true });
		fc.assert(
			fc.property(angle, angle, (p, q) => {
				const product = multiply(
					createMatrix(),
					rotation(createMatrix(), p),
					rotation(createMatrix(), q)
				);
				expectMatrixClose(product, rotation(createMatrix(), p + q), 1e-14);
				const det = determinant(new Float64Array(2), rotation(createMatrix(), p));
				expect(det[0]).toBeCloseTo(1, 14);
			})
		);
	});

	it('R(ψ) gives components in axes turned by ψ: the unit vector at ψ becomes x̂', () => {
		const psi = 0.7;
		const v = Float64Array.of(Math.cos(psi), 0, Math.sin(psi), 0);
		const r = applyToVector(createVector(), rotation(createMatrix(), psi), v);
		expect(r[0]).toBeCloseTo(1, 15);
		expect(r[2]).toBeCloseTo(0, 15);
	});

	it('diagonal retarder: diag(e^{−iΓ/2}, e^{+iΓ/2}), det 1', () => {
		const m = diagonalRetarder(createMatrix(), Math.PI / 2);
		expectMatrixClose(
			m,
			Float64Array.of(Math.SQRT1_2, -Math.SQRT1_2, 0, 0, 0, 0, Math.SQRT1_2, Math.SQRT1_2),
			1e-15
		);
		const det = determinant(new Float64Array(2), m);
		expect(det[0]).toBeCloseTo(1, 15);
		expect(det[1]).toBeCloseTo(0, 15);
	});

	it('applyToVector is alias-safe and matches the matrix product', () => {
		const m = Float64Array.of(1, 2, 3, 4, 5, 6, 7, 8);
		const v = Float64Array.of(0.5, -1, 2, 0.25);
		const expected = applyToVector(createVector(), m, v);
		// E_x = (1+2i)(0.5−i) + (3+4i)(2+0.25i) = 2.5 + (5 + 8.75i) = 7.5 + 8.75i
		expect(expected[0]).toBeCloseTo(7.5, 14);
		expect(expected[1]).toBeCloseTo(8.75, 14);
		// E_y = (5+6i)(0.5−i) + (7+8i)(2+0.25i) = (8.5 − 2i) + (12 + 17.75i) = 20.5 + 15.75i
		expect(expected[2]).toBeCloseTo(20.5, 14);
		expect(expected[3]).toBeCloseTo(15.75, 14);
		const inPlace = Float64Array.from(v);
		expect(Array.from(applyToVector(inPlace, m, inPlace))).toEqual(Array.from(expected));
	});

	it('transpose swaps off-diagonal entries without conjugating, alias-safe', () => {
		const m = Float64Array.of(1, 2, 3, 4, 5, 6, 7, 8);
		expectMatrixClose(transpose(m, m), Float64Array.of(1, 2, 5, 6, 3, 4, 7, 8), 0);
		expectMatrixClose(identity(m), createMatrix(), 0);
	});
});
