/**
 * Rules on each electrode's own outline: a ring that crosses or touches itself has no single
 * meaning as a conductor (its area would be silently wrong), an outline with no area cannot be
 * etched, and a part narrower than `minWidth_mm` may break or etch away. The width rule is a
 * morphological test on the integer clipper: each island of the electrode is shrunk by half the
 * minimum width (round joins); an island that vanishes is thinner than the limit everywhere, one
 * that splits has a neck thinner than it. Sharp corners only lose their tips, so pointed segment
 * ends pass, as they should.
 */
import { finding, type Finding } from '../findings/finding';
import { offsetRegion, regionArea_mm2, regionToPolygons } from '../geometry/polygon-clipper';
import { ringSelfCrossings } from '../geometry/ring-crossings';
import type { IndexedElectrode } from '../geometry/spatial-index';
import { signedArea } from '../geometry/polygon';
import { locationOf, mm, type RuleContext } from './rule-context';
import { perShape } from './shape-key';

/** Filled area below this (1 µm²) counts as none. */
export const ZERO_AREA_mm2 = 1e-6;
/** Shrinking by a hair less than half the limit lets a part of exactly the limit width pass. */
const WIDTH_SLACK_mm = 2e-5;

function crossingFinding(entry: IndexedElectrode): Finding | null {
	for (const [k, ring] of entry.rings.entries()) {
		const crossings = ringSelfCrossings(ring, { limit: 4 });
		if (crossings.length === 0) continue;
		const p = crossings[0];
		const which = k === 0 ? 'outline' : `hole ${k}`;
		return finding({
			code: 'rule.self-crossing',
			severity: 'fail',
			message: `The ${which} of ${entry.id} crosses or touches itself near (${p.x.toFixed(3)}, ${p.y.toFixed(3)}) mm.`,
			fix: 'Redraw the outline so it does not cross itself, or split it into separate electrodes.',
			electrodes: [entry.id],
			location: locationOf({ minX: p.x, minY: p.y, maxX: p.x, maxY: p.y }, 0.5)
		});
	}
	return null;
}

function reversed(ring: Float64Array): Float64Array {
	const out = new Float64Array(ring.length);
	for (let i = 0; i < ring.length; i += 2) {
		out[ring.length - 2 - i] = ring[i];
		out[ring.length - 1 - i] = ring[i + 1];
	}
	return out;
}

/** Each island as clean rings (outer positive, holes negative); a lone ring needs no clipping. */
function islands(entry: IndexedElectrode): Float64Array[][] {
	if (entry.rings.length === 1) {
		const ring = entry.rings[0];
		return [[signedArea(ring) > 0 ? ring : reversed(ring)]];
	}
	return regionToPolygons(entry.rings).map((p) => [p.outer, ...p.holes]);
}

/** Per island, how many pieces are left after shrinking by half the width (1 = fine). */
function piecesAfterShrink(entry: IndexedElectrode, minWidth_mm: number): number[] {
	return islands(entry).map((island) => {
		const shrunk = offsetRegion(island, {
			delta_mm: -(minWidth_mm / 2 - WIDTH_SLACK_mm),
			join: 'round',
			clean: true
		});
		return shrunk.filter((ring) => signedArea(ring) > 0).length;
	});
}

function widthFinding(
	entry: IndexedElectrode,
	pieces: number[],
	minWidth_mm: number
): Finding | null {
	const left = pieces.find((n) => n !== 1);
	if (left === undefined) return null;
	return finding({
		code: 'rule.min-width',
		severity: 'fail',
		message:
			left === 0
				? `A part of ${entry.id} is narrower than the ${mm(minWidth_mm)} minimum width everywhere.`
				: `A part of ${entry.id} narrows below the ${mm(minWidth_mm)} minimum width (it would split in ${left}).`,
		fix: `Widen that part to at least ${mm(minWidth_mm)}, or remove it.`,
		electrodes: [entry.id],
		location: locationOf(entry.bounds, 0.2)
	});
}

export function outlineFindings(ctx: RuleContext): Finding[] {
	const findings: Finding[] = [];
	const minWidth_mm = ctx.limits.minWidth_mm;
	const pieces = perShape((entry) => piecesAfterShrink(entry, minWidth_mm));
	for (const entry of ctx.index.entries) {
		const crossing = crossingFinding(entry);
		// A lone simple ring's area is its shoelace sum; anything else goes through the clipper,
		// which reads crossing outlines and holes by the even-odd rule instead of cancelling them.
		const area_mm2 =
			!crossing && entry.rings.length === 1
				? Math.abs(signedArea(entry.rings[0]))
				: regionArea_mm2(entry.rings);
		if (area_mm2 < ZERO_AREA_mm2) {
			findings.push(
				finding({
					code: 'rule.zero-area',
					severity: 'fail',
					message: `${entry.id} encloses no area (${area_mm2.toPrecision(2)} mm²).`,
					fix: 'Give it a real outline, or delete it.',
					electrodes: [entry.id],
					location: locationOf(entry.bounds, 0.5)
				})
			);
			continue;
		}
		if (crossing) {
			findings.push(crossing);
			continue;
		}
		const width = widthFinding(entry, pieces(entry), minWidth_mm);
		if (width) findings.push(width);
	}
	return findings;
}
