/**
 * The common plate's pieces: each electrode's outline grown by the overlap margin, so the back
 * plate covers its segment despite front-to-back registration error (common practice: 0.05–0.15 mm
 * per side). Where an electrode of another common is too close for two full margins plus the
 * minimum gap, the margin of both is cut to (distance − gap) / 2, less two steps of the polygon
 * engine's 10 nm grid so rounding never takes the gap below the minimum, and the pair is
 * reported; where even that leaves nothing (distance below the gap), the two commons' plates
 * would touch.
 *
 * An electrode's holes stay holes in its piece, shrunk by the margin (another common's electrode may
 * sit inside one). Curves are flattened to 5 µm; the growth is the polygon engine's offset
 * (`geometry/polygon-clipper.ts`) with mitred corners, squared off where a mitre would reach
 * beyond twice the margin, so sharp corners do not spike.
 */
import type { Design, Electrode } from '../design/schema';
import type { Bounds } from '../geometry/bounds';
import { flattenContour } from '../geometry/flatten';
import { minimumGapBetweenRings } from '../geometry/minimum-gap';
import { CLIP_UNITS_PER_mm, offsetRegion } from '../geometry/polygon-clipper';
import { signedArea } from '../geometry/polygon';
import { boundsOverlap, ringBounds } from './rings';

export const PLATE_FLATTEN_um = 5;
/** Two grid steps of the polygon engine: the most its rounding can take off a gap between pieces. */
const GRID_SLACK_mm = 2 / CLIP_UNITS_PER_mm;

export interface PlatePiece {
	electrode: Electrode;
	common: string;
	/** The electrode's flattened outline and holes. */
	rings: Float64Array[];
	/** The grown outline (the largest outer ring), then the shrunk holes and any other ring (even-odd). */
	grown: Float64Array[];
	margin_mm: number;
}

export interface MarginConflict {
	electrodes: [string, string];
	distance_mm: number;
	/** True when the two plates cannot be kept apart by the minimum gap at all. */
	touching: boolean;
}

/**
 * The electrode's rings grown by `margin_mm`: outline out, holes in, largest outer ring first. An
 * outline with no area grows into nothing; its flattened outline stands in, so every piece has a
 * first ring (the glass check names the outline).
 */
function grownPiece(rings: Float64Array[], margin_mm: number): Float64Array[] {
	const grown = offsetRegion(rings, { delta_mm: margin_mm, join: 'miter', miterLimit: 2 });
	const first = grown.reduce(
		(best, r, k) => (signedArea(r) > signedArea(grown[best]) ? k : best),
		0
	);
	return grown.length === 0 ? [rings[0]] : [grown[first], ...grown.filter((_, k) => k !== first)];
}

export function platePieces(design: Design): { pieces: PlatePiece[]; conflicts: MarginConflict[] } {
	const margin = design.glassArt.overlapMargin_mm;
	const gap = design.rules.minGap_mm;
	const assigned = design.electrodes.filter((e) => e.common !== null);
	const outlines = assigned.map((e) =>
		[e.outline, ...e.holes].map((c) => flattenContour(c, { tolerance_um: PLATE_FLATTEN_um }))
	);
	const bounds: Bounds[] = outlines.map((r) => ringBounds(r[0]));
	const allowed = assigned.map(() => margin);
	const conflicts: MarginConflict[] = [];
	const reach = 2 * margin + gap;
	// Sweep over x so only neighbours are compared.
	const order = assigned.map((_, i) => i).sort((a, b) => bounds[a].minX - bounds[b].minX);
	for (let oi = 0; oi < order.length; oi++) {
		const i = order[oi];
		for (let oj = oi + 1; oj < order.length; oj++) {
			const j = order[oj];
			if (bounds[j].minX > bounds[i].maxX + reach) break;
			if (assigned[i].common === assigned[j].common) continue;
			if (!boundsOverlap(bounds[i], bounds[j], reach)) continue;
			const d = minimumGapBetweenRings(outlines[i], outlines[j]);
			if (d >= reach) continue;
			const cut = Math.max(0, (d - gap) / 2 - GRID_SLACK_mm);
			allowed[i] = Math.min(allowed[i], cut);
			allowed[j] = Math.min(allowed[j], cut);
			conflicts.push({
				electrodes: [assigned[i].id, assigned[j].id],
				distance_mm: d,
				touching: d < gap
			});
		}
	}
	const pieces = assigned.map((electrode, i) => ({
		electrode,
		common: electrode.common as string,
		rings: outlines[i],
		grown: grownPiece(outlines[i], allowed[i]),
		margin_mm: allowed[i]
	}));
	return { pieces, conflicts };
}
