/**
 * Schema refinements over the ranges of bound-ranges.ts: a finite number within its physical or
 * practical range, with a message that names the range and its unit.
 */
import { z } from 'zod';

import { BOUNDS, type BoundName } from './bound-ranges';

export { ABSOLUTE_ZERO_C, BOUNDS, LIMITS, type BoundName } from './bound-ranges';

function describe(name: BoundName, open: 'min' | 'none'): string {
	const { min, max, unit } = BOUNDS[name];
	const u = unit ? ` ${unit}` : '';
	return open === 'min'
		? `expected above ${min} up to ${max}${u}`
		: `expected ${min} to ${max}${u}`;
}

/** A finite number within BOUNDS[name], inclusive at both ends. */
export function bounded(name: BoundName) {
	const { min, max } = BOUNDS[name];
	return z
		.number()
		.refine(Number.isFinite, 'expected a finite number')
		.refine((v) => !Number.isFinite(v) || (v >= min && v <= max), describe(name, 'none'));
}

/** A finite number within BOUNDS[name], above its lower end (a zero would be meaningless). */
export function boundedAbove(name: BoundName) {
	const { min, max } = BOUNDS[name];
	return z
		.number()
		.refine(Number.isFinite, 'expected a finite number')
		.refine((v) => !Number.isFinite(v) || (v > min && v <= max), describe(name, 'min'));
}
