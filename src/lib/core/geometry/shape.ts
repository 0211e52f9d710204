/**
 * A filled shape as the design stores it: one closed outline and zero or more hole contours, filled
 * with the even-odd rule. Every electrode is a Shape; generators and booleans produce Shapes.
 */
import type { Contour } from '../design/schema';

export interface Shape {
	readonly outline: Contour;
	readonly holes: readonly Contour[];
}

/** All contours of a shape, outline first. */
export const shapeContours = (shape: Shape): readonly Contour[] => [shape.outline, ...shape.holes];
