/**
 * Spacing rules between electrodes of one plate (every electrode of the design lies on the segment
 * plate): two that overlap or touch are shorted together; two closer than `minGap_mm` risk a short
 * from an etching defect or a conductive particle. Pairs come from the spatial index (only
 * electrodes whose bounds lie within the limit of each other), so the check grows with the number
 * of neighbours, not with the square of the electrode count. The gap is the smallest distance
 * between flattened boundaries (`minimum-gap.ts`); an overlap's size is the area of the
 * intersection from the integer clipper. Two electrodes on the same (common, line) crossing that
 * touch only warn: they switch together anyway, and are better drawn as one.
 */
import { finding, type Finding } from '../findings/finding';
import { expandBounds } from '../geometry/tight-bounds';
import { candidatesIn } from '../geometry/spatial-index';
import { minimumGapBetweenRings } from '../geometry/minimum-gap';
import { intersectRegions, regionArea_mm2 } from '../geometry/polygon-clipper';
import { locationOf, mm, unionBounds, type RuleContext } from './rule-context';

/** Boundaries closer than this (0.1 µm, below the flattening tolerance) count as touching. */
export const TOUCH_mm = 1e-4;

export function spacingFindings(ctx: RuleContext): Finding[] {
	const findings: Finding[] = [];
	const minGap_mm = ctx.limits.minGap_mm;
	for (const a of ctx.index.entries) {
		for (const b of candidatesIn(ctx.index, expandBounds(a.bounds, minGap_mm))) {
			if (b.order <= a.order) continue;
			const gap_mm = minimumGapBetweenRings(a.rings, b.rings);
			if (!(gap_mm < minGap_mm)) continue;
			const ids = [a.id, b.id];
			const where = locationOf(unionBounds([a.bounds, b.bounds]));
			if (gap_mm < TOUCH_mm) {
				const overlap_mm2 = regionArea_mm2(intersectRegions(a.rings, b.rings));
				const sameCrossing =
					a.electrode.common !== null &&
					a.electrode.common === b.electrode.common &&
					a.electrode.line === b.electrode.line;
				findings.push(
					finding({
						code: 'rule.overlap',
						severity: sameCrossing ? 'warn' : 'fail',
						message:
							overlap_mm2 > 1e-6
								? `${a.id} and ${b.id} overlap by ${overlap_mm2.toPrecision(3)} mm²: on one plate that is a short.`
								: `${a.id} and ${b.id} touch: on one plate that is a short.`,
						fix: sameCrossing
							? 'They share a crossing: unite them into one electrode.'
							: `Move them apart to at least ${mm(minGap_mm)}, or unite them if they are one segment.`,
						electrodes: ids,
						location: where
					})
				);
			} else {
				findings.push(
					finding({
						code: 'rule.min-gap',
						severity: 'fail',
						message: `${a.id} and ${b.id} are ${mm(gap_mm)} apart, under the ${mm(minGap_mm)} minimum gap.`,
						fix: `Widen the gap to at least ${mm(minGap_mm)} (move or trim an edge).`,
						electrodes: ids,
						location: where
					})
				);
			}
		}
	}
	return findings;
}
