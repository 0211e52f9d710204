/**
 * The cell-orientation section of the design document (added in version 5): which way each
 * plate is rubbed, the sense of the twist the chiral dopant gives, and how thick the rear glass
 * is. Together with the cell's twist and pretilt they set the readout's best viewing direction
 * and the parallax shadow.
 *
 * Frame: glass coordinates seen from the viewer (x to the right, y downwards, as in schema.ts).
 * Angles in degrees from +x toward +y, i.e. clockwise as the viewer sees the glass: 0° points to
 * 3 o'clock, 90° to 6 o'clock, 180° to 9 o'clock, 270° to 12 o'clock.
 *
 * A rubbing direction is the direction the pretilted director rises along, away from its own
 * plate. For a splay-free twisted cell the rear rubbing lies at front + twist + 180° (twist
 * signed by its sense); a mismatch is reported by the viewing-angle check.
 *
 * Rear glass: 0.4, 0.55, 0.7 and 1.1 mm are the usual soda-lime thicknesses for segment glass
 * [common practice]; thinner glass gives a smaller parallax shadow.
 */
import { z } from 'zod';

const finite = () => z.number().refine(Number.isFinite, 'expected a finite number');
const azimuth = () =>
	finite().refine((v) => v >= 0 && v < 360, 'expected an angle from 0 up to (not including) 360°');

export const REAR_GLASS_CHOICES_mm = [0.4, 0.55, 0.7, 1.1] as const;

export const twistSenseSchema = z.enum(['right-handed', 'left-handed']);

export const orientationSchema = z.strictObject({
	/** Rubbing direction of the front (viewer-side) plate, deg clockwise from 3 o'clock. */
	frontRubbing_deg: azimuth(),
	/** Rubbing direction of the rear plate, deg clockwise from 3 o'clock. */
	rearRubbing_deg: azimuth(),
	/** Right-handed: the director turns clockwise (seen by the viewer) going into the cell. */
	twistSense: twistSenseSchema,
	/** Rear glass thickness between the liquid crystal and the rear polarizer, mm. */
	rearGlass_mm: finite().refine(
		(v) => v >= 0.1 && v <= 3,
		'expected a rear glass thickness from 0.1 to 3 mm'
	)
});

export type TwistSense = z.infer<typeof twistSenseSchema>;
export type Orientation = z.infer<typeof orientationSchema>;

/**
 * Front rubbed toward 7:30, rear toward 4:30, right-handed 90° twist (the mid-plane director lies
 * along 3–9 o'clock): with the default cell the viewing-angle model puts the best viewing
 * direction near 6 o'clock, a readout seen best from below.
 */
export const DEFAULT_ORIENTATION: Orientation = {
	frontRubbing_deg: 135,
	rearRubbing_deg: 45,
	twistSense: 'right-handed',
	rearGlass_mm: 0.7
};
