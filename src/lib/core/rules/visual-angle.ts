/**
 * The character-size rule's visual angle: the one relation α = 2·atan(h / 2D) kept in
 * legibility/visual-angle.ts (arcminutes, millimetres; ISO 9241-3 and NUREG-0700 tabulate it).
 */
export {
	visualAngle_arcmin,
	sizeForAngle_mm as sizeForVisualAngle_mm
} from '../legibility/visual-angle';
