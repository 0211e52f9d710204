/**
 * Ghost check: wherever a segment-plate conductor (a lead or an electrode) lies over a common-plate
 * conductor of a common it is not meant to face, the liquid crystal between them sees the
 * (common, segment line) voltage and switches whenever that crossing is driven — a ghost
 * (standard practice in segment-glass artwork: every front/back ITO overlap is active).
 *
 * Overlap areas are exact polygon clips of each lead rectangle (convex) against the other plate's
 * rings (Sutherland–Hodgman), and of each electrode against the other plate's convex leads and
 * transfer points. A lead's overlap with the plate of its own electrode's crossing, within reach of
 * that electrode, only extends the electrode and is not reported. Where a ghost lies decides its
 * weight: in the viewing area it is visible; inside the seal but outside the viewing area it
 * switches behind the bezel; under the seal or beyond it there is no liquid crystal. An overlap
 * whose (common, line) pair drives no electrode is idle: in a multiplexed drive that pair's data is
 * never on, so it sees only the unselected RMS voltage, like any dark segment (common practice:
 * leads are run across commons they share no electrode with).
 */
import type { Design, Rect } from '../design/schema';
import type { Bounds } from '../geometry/bounds';
import { minimumGapBetweenRings } from '../geometry/minimum-gap';
import type { XY } from '../geometry/vec';
import type { GlassArtwork } from './artwork';
import { nearPairs } from './near-pairs';
import { clipToConvex, polygonArea, polygonCentroid, ringBounds } from './rings';

/**
 * Where a ghost lies, or `idle` when no electrode uses its (common, line) pair: the driver never
 * selects that pair, so the overlap only ever sees the unselected voltage and stays dark.
 */
export type GhostPlace = 'visible' | 'bezel' | 'seal' | 'idle';

export interface Ghost {
	common: string;
	commonName: string;
	line: string;
	lineName: string;
	area_mm2: number;
	where: GhostPlace;
	/** The overlap polygon. */
	ring: Float64Array;
	/** Electrodes involved: the electrode over the wrong plate, or the electrodes whose plate is crossed. */
	electrodes: string[];
	/** Id of the segment-plate conductor (lead or electrode). */
	conductor: string;
}

interface Item {
	bounds: Bounds;
	ring: Float64Array;
	net: string;
	netName: string;
	conductor: string;
	convex: boolean;
	holes: Float64Array[];
	electrodes: string[];
}

const inside = (r: Rect, p: XY) =>
	p.x >= r.x_mm && p.y >= r.y_mm && p.x <= r.x_mm + r.width_mm && p.y <= r.y_mm + r.height_mm;

function place(art: GlassArtwork, viewing: Rect, p: XY): GhostPlace | null {
	if (inside(viewing, p)) return 'visible';
	if (inside(art.layout.sealInner, p)) return 'bezel';
	if (inside(art.layout.sealOuter, p)) return 'seal';
	return null;
}

export function ghostCheck(design: Design, art: GlassArtwork): Ghost[] {
	const reach = design.glassArt.overlapMargin_mm + design.glassArt.traceWidth_mm;
	const crossing = new Map(design.electrodes.map((e) => [`${e.common}\u0000${e.line}`, e]));
	const outlineOf = new Map(
		art.segment.flatMap((n) =>
			n.conductors.filter((c) => c.kind === 'electrode').map((c) => [c.id, c.rings[0]] as const)
		)
	);
	const front: Item[] = art.segment
		.filter((n) => n.kind === 'segment')
		.flatMap((n) =>
			n.conductors
				.filter((c) => c.kind === 'trace' || c.kind === 'electrode')
				.flatMap((c) =>
					(c.kind === 'electrode' ? [c.rings[0]] : c.rings).map((ring) => ({
						bounds: ringBounds(ring),
						ring,
						net: n.id,
						netName: n.name,
						conductor: c.id,
						convex: c.kind === 'trace',
						holes: c.kind === 'electrode' ? c.rings.slice(1) : [],
						electrodes: c.electrodes
					}))
				)
		);
	const back: Item[] = art.common.flatMap((n) =>
		n.conductors.flatMap((c) =>
			(c.evenOdd ? [c.rings[0]] : c.rings).map((ring) => ({
				bounds: ringBounds(ring),
				ring,
				net: n.id,
				netName: n.name,
				conductor: c.id,
				convex: c.kind !== 'plate',
				holes: c.evenOdd ? c.rings.slice(1) : [],
				electrodes: c.electrodes
			}))
		)
	);
	const commonOf = new Map(design.electrodes.map((e) => [e.id, e.common]));
	const ghosts: Ghost[] = [];
	nearPairs(front, back, 0, (i, j) => {
		const f = front[i],
			b = back[j];
		if (!f.convex && !b.convex) return; // electrode over a back-plate piece: kept apart by construction
		if (f.electrodes.length > 0 && commonOf.get(f.electrodes[0]) === b.net) return; // meant to face it
		const poly = f.convex ? clipToConvex(b.ring, f.ring) : clipToConvex(f.ring, b.ring);
		let area = polygonArea(poly);
		for (const hole of f.holes) area -= polygonArea(clipToConvex(hole, b.ring));
		for (const hole of b.holes) area -= polygonArea(clipToConvex(hole, f.ring));
		if (area < 1e-6) return;
		const centre = polygonCentroid(poly);
		const own = crossing.get(`${b.net}\u0000${f.net}`);
		const ownRing = own ? outlineOf.get(own.id) : undefined;
		if (ownRing && f.convex) {
			const probe = Float64Array.from(poly.flatMap((p) => [p.x, p.y]));
			if (minimumGapBetweenRings([probe], [ownRing]) <= reach) return;
		}
		const placed = place(art, design.glass.viewingArea, centre);
		if (!placed) return;
		const where: GhostPlace = own ? placed : 'idle';
		ghosts.push({
			common: b.net,
			commonName: b.netName,
			line: f.net,
			lineName: f.netName,
			area_mm2: area,
			where,
			ring: Float64Array.from(poly.flatMap((p) => [p.x, p.y])),
			electrodes: [...new Set([...f.electrodes, ...b.electrodes])],
			conductor: f.conductor
		});
	});
	return ghosts;
}
