/**
 * The direction a reader is expected to look from: the designed viewing direction of the cell,
 * taken as the bisector of the front and rear rubbing directions [common practice: a twisted
 * cell's viewing direction lies on the bisector of its plates' rubbing directions, on the side
 * both rub toward]. With the rear rubbing at α_f + σΦ + 180° (rubbing-twist.ts) the bisector of
 * the short arc is α_f + σ·(Φ/2 − 90°); written this way it stays defined for any twist Φ,
 * including 180° and more, where the two rubbing directions no longer span a short arc.
 *
 * Frame: azimuths in the display frame (orientation-schema.ts), deg clockwise from 3 o'clock as
 * the viewer sees the glass. The viewing-angle model's best direction (best-direction.ts) agrees
 * with it for the usual 90° cells; this closed form costs nothing, so the legibility scenarios
 * use it for their azimuth.
 */
import type { Design } from '../design/schema';
import { twistSign } from './cell-view';

const wrap360 = (deg: number) => ((deg % 360) + 360) % 360;

/** Designed viewing azimuth, deg in [0, 360). */
export function readingAzimuth_deg(design: Pick<Design, 'cell' | 'orientation'>): number {
	const sense = twistSign(design);
	return wrap360(design.orientation.frontRubbing_deg + sense * (design.cell.twist_deg / 2 - 90));
}
