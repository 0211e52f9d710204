/**
 * Copies electrodes (and the groups wholly inside the copy) into a target design under fresh ids:
 * an id is kept when free, else suffixed `-n`; members of a copied group that follow the
 * `<group>.<part>` rule are renamed with the group's new id. Optionally transforms the copies;
 * a translation also moves the copied generator's position. Shared by duplicate, arrays and paste.
 */
import type { Design, Electrode, Group } from '../design/schema';
import { transformShape, type Affine } from '../geometry/affine';
import { memberIdFor, partKeyOfMember } from './generated-members';
import type { IdAllocator } from './ids';
import { withGeneratorMoved } from './transform-electrodes';

export interface CopyOptions {
	electrodes: readonly Electrode[];
	groups: readonly Group[];
	target: Design;
	ids: { electrodes: IdAllocator; groups: IdAllocator };
	matrix?: Affine;
	/** Drop common/line assignments the target does not have (pasting from another design). */
	unassignUnknown?: boolean;
}

export function copyRecords(options: CopyOptions): { electrodes: Electrode[]; groups: Group[] } {
	const copied = new Set(options.electrodes.map((e) => e.id));
	const groups = options.groups.filter(
		(g) => g.members.length > 0 && g.members.every((m) => copied.has(m))
	);
	const wanted = new Map<string, string>();
	const newGroupIds = groups.map((g) => {
		const id = options.ids.groups.claim(g.id);
		for (const m of g.members) {
			const key = partKeyOfMember(g.id, m);
			if (key !== null) wanted.set(m, memberIdFor(id, key));
		}
		return id;
	});
	const renamed = new Map<string, string>();
	const commons = new Set(options.target.commons.map((c) => c.id));
	const lines = new Set(options.target.segmentLines.map((l) => l.id));
	const electrodes = options.electrodes.map((e) => {
		const id = options.ids.electrodes.claim(wanted.get(e.id) ?? e.id);
		renamed.set(e.id, id);
		const shape = options.matrix ? transformShape(options.matrix, e) : e;
		const copy: Electrode = { ...shape, id };
		if (options.unassignUnknown) {
			if (copy.common !== null && !commons.has(copy.common)) copy.common = null;
			if (copy.line !== null && !lines.has(copy.line)) copy.line = null;
		}
		return copy;
	});
	const m = options.matrix;
	const translated = m && m[0] === 1 && m[1] === 0 && m[2] === 0 && m[3] === 1;
	return {
		electrodes,
		groups: groups.map((g, k) => {
			const group: Group = {
				...g,
				id: newGroupIds[k],
				members: g.members.map((id) => renamed.get(id)!)
			};
			return translated ? withGeneratorMoved(group, m[4], m[5]) : group;
		})
	};
}
