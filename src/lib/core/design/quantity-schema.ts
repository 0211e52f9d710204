/** The schema of one declared quantity (design/cell-fields.ts): a finite number in its range. */
import { z } from 'zod';
import { inRange, rangeRule, type QuantityField } from './cell-fields';

export function quantitySchema(field: QuantityField) {
	return z
		.number()
		.refine(Number.isFinite, 'expected a finite number')
		.refine((v) => inRange(field, v), rangeRule(field));
}
