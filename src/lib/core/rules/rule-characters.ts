/**
 * Character size against the viewing distance: for each character group (seven-, fourteen- and
 * sixteen-segment digits and text), the height of its segments' tight bounds and its stroke width
 * as visual angles at `design.viewing.distance_mm` (`visual-angle.ts`), against
 * `minCharacterHeight_arcmin` (ISO 9241-3: 16′ minimum, 20–22′ preferred) and `minStroke_arcmin`.
 * The stroke is the diameter of the largest disc that fits in a segment, found by shrinking the
 * segment with the integer clipper until it vanishes (bisection to 1/256 of its smaller side);
 * the median over the group's first three segments stands for the group.
 */
import type { Group } from '../design/schema';
import { finding, type Finding } from '../findings/finding';
import { offsetRegion } from '../geometry/polygon-clipper';
import type { IndexedElectrode } from '../geometry/spatial-index';
import { locationOf, mm, unionBounds, type RuleContext } from './rule-context';
import { perShape } from './shape-key';
import { visualAngle_arcmin } from './visual-angle';

export const CHARACTER_KINDS = ['seven-segment', 'fourteen-segment', 'sixteen-segment', 'text'];
const BISECTIONS = 8;
const SAMPLE = 3;

/** Diameter (mm) of the largest disc inside the electrode, within 1/256 of its smaller side. */
export function strokeWidth_mm(entry: IndexedElectrode): number {
	let lo = 0;
	let hi = Math.min(entry.bounds.maxX - entry.bounds.minX, entry.bounds.maxY - entry.bounds.minY);
	for (let i = 0; i < BISECTIONS; i++) {
		const mid = (lo + hi) / 2;
		const left = offsetRegion(entry.rings, { delta_mm: -mid / 2, join: 'round' });
		if (left.length > 0) lo = mid;
		else hi = mid;
	}
	return (lo + hi) / 2;
}

const median = (v: number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)];

function groupFinding(
	ctx: RuleContext,
	group: Group,
	members: IndexedElectrode[],
	stroke: (entry: IndexedElectrode) => number
): Finding {
	const distance_mm = ctx.design.viewing.distance_mm;
	const bounds = unionBounds(members.map((m) => m.bounds));
	const height_mm = bounds.maxY - bounds.minY;
	const stroke_mm = median(members.slice(0, SAMPLE).map(stroke));
	const height_arcmin = visualAngle_arcmin({ size_mm: height_mm, distance_mm });
	const stroke_arcmin = visualAngle_arcmin({ size_mm: stroke_mm, distance_mm });
	const sizes = `${mm(height_mm)} high (${height_arcmin.toFixed(1)}′), stroke ${mm(stroke_mm)} (${stroke_arcmin.toFixed(1)}′) at ${distance_mm} mm`;
	const ids = members.map((m) => m.id);
	const location = locationOf(bounds, 0.5);
	const { minCharacterHeight_arcmin: minHeight, minStroke_arcmin: minStroke } = ctx.limits;
	if (height_arcmin < minHeight) {
		return finding({
			code: 'rule.character-small',
			severity: 'fail',
			message: `${group.name}: ${sizes}; under the ${minHeight}′ minimum height.`,
			fix: `Make the characters at least ${mm(height_mm * (minHeight / height_arcmin))} high, or design for a shorter viewing distance.`,
			electrodes: ids,
			location
		});
	}
	if (stroke_arcmin < minStroke) {
		return finding({
			code: 'rule.stroke-thin',
			severity: 'warn',
			message: `${group.name}: ${sizes}; the stroke is under ${minStroke}′.`,
			fix: `Widen the strokes to at least ${mm(stroke_mm * (minStroke / stroke_arcmin))} (about 1/6 of the height).`,
			electrodes: ids,
			location
		});
	}
	return finding({
		code: 'rule.character-size-ok',
		severity: 'pass',
		message: `${group.name}: ${sizes}.`,
		electrodes: ids,
		location
	});
}

export function characterFindings(ctx: RuleContext): Finding[] {
	const byId = new Map(ctx.index.entries.map((e) => [e.id, e]));
	const findings: Finding[] = [];
	const stroke = perShape(strokeWidth_mm);
	for (const group of ctx.design.groups) {
		if (!group.generator || !CHARACTER_KINDS.includes(group.generator.kind)) continue;
		const members = group.members.flatMap((id) => byId.get(id) ?? []);
		if (members.length === 0) continue;
		findings.push(groupFinding(ctx, group, members, stroke));
	}
	return findings;
}
