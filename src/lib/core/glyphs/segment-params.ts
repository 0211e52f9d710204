/**
 * Parameters shared by segmented characters (7, 14 and 16 segments), validated with zod. Lengths
 * in mm: the character's box is width × height before slant (x_mm, y_mm is its top-left); the
 * stroke is the bar width measured perpendicular to the bar; the gap is the clearance between
 * neighbouring segments. Slant leans the character right for positive angles (italic), at most
 * ±25°. End style: 'pointed' (mitred tips), 'chamfered' (mitred, tip cut flat), 'square' (flat
 * ends), 'round' (semicircular caps).
 */
import { z } from 'zod';

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
const positive = () => finite().refine((v) => v > 0, 'expected a number above 0');

export const SEGMENT_STYLES = ['pointed', 'chamfered', 'square', 'round'] as const;
export type SegmentStyle = (typeof SEGMENT_STYLES)[number];
export const segmentStyleSchema = z.enum(SEGMENT_STYLES);

export const MAX_SLANT_deg = 25;

export const segmentCharacterFields = {
	x_mm: finite().default(0),
	y_mm: finite().default(0),
	height_mm: positive(),
	width_mm: positive(),
	stroke_mm: positive(),
	gap_mm: positive(),
	slant_deg: finite()
		.refine((v) => Math.abs(v) <= MAX_SLANT_deg, `expected a slant within ±${MAX_SLANT_deg}°`)
		.default(0),
	style: segmentStyleSchema.default('pointed'),
	decimalPoint: z.boolean().default(false)
};

export const segmentCharacterSchema = z.object(segmentCharacterFields);
export type SegmentCharacterParams = z.output<typeof segmentCharacterSchema>;
export type SegmentCharacterInput = z.input<typeof segmentCharacterSchema>;
