/**
 * Backward pass through a reciprocal medium (Lorentz reciprocity for Jones matrices; e.g.
 * Potton, Rep. Prog. Phys. 67:717 (2004) — from memory).
 *
 * Our convention: the fields of both directions are written in the same lab axes (x, y); only
 * the propagation flips to −z. In these axes the backward Jones matrix of a reciprocal element
 * is the plain transpose of the forward one, J_back = J_fwdᵀ, and a normal-incidence mirror is
 * −I (a common phase, dropped, so the mirror acts as I). Polarizers and retarder slabs are
 * symmetric (their own transpose); a twisted layer becomes its transpose, i.e. the same slabs in
 * reverse order — at normal incidence a guiding TN retraces its rotation.
 *
 * In the right-handed mirrored frame (x′, y′, z′) = (x, −y, −z) the same statement reads
 * J′_back = F·J_fwdᵀ·F with F = diag(1, −1); toMirroredFrame converts between the two.
 */

import { transpose } from './complex2x2';

/** out = forwardᵀ, the backward matrix in lab axes. Alias-safe. */
export function backwardJones(out: Float64Array, forward: Float64Array): Float64Array {
	return transpose(out, forward);
}

/** out = F·m·F with F = diag(1, −1): lab axes ↔ mirrored frame (its own inverse). Alias-safe. */
export function toMirroredFrame(out: Float64Array, m: Float64Array): Float64Array {
	out[0] = m[0];
	out[1] = m[1];
	out[2] = -m[2];
	out[3] = -m[3];
	out[4] = -m[4];
	out[5] = -m[5];
	out[6] = m[6];
	out[7] = m[7];
	return out;
}
