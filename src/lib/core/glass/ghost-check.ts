/**
 * Ghost check: wherever a segment-plate conductor (a lead or an electrode) lies over a common-plate
 * conductor of a common it is not meant to face, the liquid crystal between them sees the
 * (common, segment line) voltage and switches whenever that crossing is driven — a ghost
 * (standard practice in segment-glass artwork: every front/back ITO overlap is active).
 *
 * Overlaps are intersections by the one polygon engine (`geometry/polygon-clipper.ts`, even-odd,
 * holes counted) of each lead run against the other plate's conductors, and of each electrode
 * against the other plate's leads and transfer points; one ghost per island of overlap. A lead's
 * overlap with the plate of its own electrode's crossing, within reach of that electrode, only
 * extends the electrode and is not reported. Where a ghost lies decides its weight: in the viewing
 * area it is visible; inside the seal but outside the viewing area it switches behind the bezel;
 * under the seal or beyond it there is no liquid crystal. A ghost is named by its electrodes
 * (`Ghost.electrodes`); which electrodes a lead serves comes from `lead-reach.ts`. An overlap
 * whose (common, line) pair drives no electrode is idle: in a multiplexed drive that pair's data is
 * never on, so it sees only the unselected RMS voltage, like any dark segment (common practice:
 * leads are run across commons they share no electrode with).
 */
import type { Design, Electrode, Rect } from '../design/schema';
import type { Bounds } from '../geometry/bounds';
import { minimumGapBetweenRings } from '../geometry/minimum-gap';
import { ringCentroid, signedArea } from '../geometry/polygon';
import { intersectRegions, regionToPolygons } from '../geometry/polygon-clipper';
import type { XY } from '../geometry/vec';
import type { Conductor, GlassArtwork } from './artwork';
import { leadElectrodes } from './lead-reach';
import { nearPairs } from './near-pairs';
import { ringBounds } from './rings';

import type { GhostPlace } from './ghost-place';

export { ghostSwitches, type GhostPlace } from './ghost-place';

export interface Ghost {
	common: string;
	commonName: string;
	line: string;
	lineName: string;
	area_mm2: number;
	where: GhostPlace;
	/** The overlap's outer ring (its holes, if any, are taken off `area_mm2`). */
	ring: Float64Array;
	/**
	 * Electrodes concerned: on the segment side the electrode over the wrong plate, or the
	 * electrodes a lead serves and the electrode of the (common, line) pair the ghost lights with,
	 * if the design has one; on the common side the electrodes whose back plate (piece, or the
	 * pieces a common-plate lead joins) is crossed.
	 */
	electrodes: string[];
	/** Id of the segment-plate conductor (lead or electrode). */
	conductor: string;
}

interface Item {
	bounds: Bounds;
	/** Outline first, then holes (even-odd). */
	rings: Float64Array[];
	net: string;
	netName: string;
	conductor: string;
	/** A lead run or a transfer point, as against an electrode or a back-plate piece. */
	lead: boolean;
	/** The electrode or back-plate piece's own electrode (none for a lead or transfer point). */
	electrodes: string[];
	/** The electrodes a ghost of this conductor is named by. */
	concerns: string[];
}

const inside = (r: Rect, p: XY) =>
	p.x >= r.x_mm && p.y >= r.y_mm && p.x <= r.x_mm + r.width_mm && p.y <= r.y_mm + r.height_mm;

function place(art: GlassArtwork, viewing: Rect, p: XY): GhostPlace | null {
	if (inside(viewing, p)) return 'visible';
	if (inside(art.layout.sealInner, p)) return 'bezel';
	if (inside(art.layout.sealOuter, p)) return 'seal';
	return null;
}

/**
 * `served`: which electrodes each lead serves (`leadElectrodes` of the artwork's nets), when the
 * caller has it already.
 */
export function ghostCheck(
	design: Design,
	art: GlassArtwork,
	served: Map<Conductor, string[]> = leadElectrodes([...art.segment, ...art.common])
): Ghost[] {
	const near = design.glassArt.overlapMargin_mm + design.glassArt.traceWidth_mm;
	const crossing = new Map<string, Electrode[]>();
	for (const e of design.electrodes) {
		const key = `${e.common}\u0000${e.line}`;
		crossing.set(key, [...(crossing.get(key) ?? []), e]);
	}
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
					(c.kind === 'electrode' ? [c.rings] : c.rings.map((r) => [r])).map((rings) => ({
						bounds: ringBounds(rings[0]),
						rings,
						net: n.id,
						netName: n.name,
						conductor: c.id,
						lead: c.kind === 'trace',
						electrodes: c.electrodes,
						concerns: served.get(c) ?? c.electrodes
					}))
				)
		);
	const back: Item[] = art.common.flatMap((n) =>
		n.conductors.flatMap((c) =>
			(c.evenOdd ? [c.rings] : c.rings.map((r) => [r])).map((rings) => ({
				bounds: ringBounds(rings[0]),
				rings,
				net: n.id,
				netName: n.name,
				conductor: c.id,
				lead: c.kind !== 'plate',
				electrodes: c.electrodes,
				concerns: served.get(c) ?? c.electrodes
			}))
		)
	);
	const commonOf = new Map(design.electrodes.map((e) => [e.id, e.common]));
	const lineOf = new Map(design.electrodes.map((e) => [e.id, e.line]));
	const ghosts: Ghost[] = [];
	nearPairs(front, back, 0, (i, j) => {
		const f = front[i],
			b = back[j];
		if (!f.lead && !b.lead) return; // electrode over a back-plate piece: kept apart by construction
		if (f.electrodes.length > 0 && commonOf.get(f.electrodes[0]) === b.net) return; // meant to face it
		// A lead over the piece of its own line's electrode lies within the margin of that electrode
		// wherever it overlaps: it only extends the electrode (the rule below), whatever the shape.
		if (
			f.lead &&
			!b.lead &&
			b.electrodes.length > 0 &&
			b.electrodes.every((id) => lineOf.get(id) === f.net)
		)
			return;
		const overlap = intersectRegions(f.rings, b.rings);
		if (overlap.length === 0) return;
		const pair = crossing.get(`${b.net}\u0000${f.net}`) ?? [];
		const ownRings = pair.flatMap((e) => outlineOf.get(e.id) ?? []);
		const electrodes = [...new Set([...f.concerns, ...pair.map((e) => e.id), ...b.concerns])];
		for (const island of regionToPolygons(overlap, { clean: true })) {
			const area =
				Math.abs(signedArea(island.outer)) -
				island.holes.reduce((s, h) => s + Math.abs(signedArea(h)), 0);
			if (area < 1e-6) continue;
			if (f.lead && ownRings.length > 0 && minimumGapBetweenRings([island.outer], ownRings) <= near)
				continue;
			const placed = place(art, design.glass.viewingArea, ringCentroid(island.outer));
			if (!placed) continue;
			const where: GhostPlace = pair.length > 0 ? placed : 'idle';
			ghosts.push({
				common: b.net,
				commonName: b.netName,
				line: f.net,
				lineName: f.netName,
				area_mm2: area,
				where,
				ring: island.outer,
				electrodes,
				conductor: f.conductor
			});
		}
	});
	return ghosts;
}
