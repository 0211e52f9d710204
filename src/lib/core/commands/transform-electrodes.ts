/**
 * Applies one affine transform to the selected electrodes (outline, holes and handles). When the
 * transform is a pure translation and moves every member of a generated group, the group's
 * generator position (x_mm, y_mm) moves with it, so regenerating keeps the group where it is.
 */
import type { Design, Group } from '../design/schema';
import { transformShape, type Affine } from '../geometry/affine';
import { editDesign, type DesignDraft } from './design-draft';
import type { Patch } from './patch';
import { selectedElectrodes } from './selection';

const isTranslation = (m: Affine) => m[0] === 1 && m[1] === 0 && m[2] === 0 && m[3] === 1;

/** The group with its generator's x_mm, y_mm moved by (dx, dy), when it has them. */
export function withGeneratorMoved(group: Group, dx_mm: number, dy_mm: number): Group {
	const params = group.generator?.params;
	if (!params || typeof params.x_mm !== 'number' || typeof params.y_mm !== 'number') return group;
	return {
		...group,
		generator: {
			...group.generator!,
			params: { ...params, x_mm: params.x_mm + dx_mm, y_mm: params.y_mm + dy_mm }
		}
	};
}

/** Transforms electrodes inside a draft (for commands that move several units at once). */
export function transformInDraft(draft: DesignDraft, ids: readonly string[], matrix: Affine): void {
	for (const id of ids) draft.electrodes.update(id, (old) => transformShape(matrix, old));
	if (!isTranslation(matrix) || (matrix[4] === 0 && matrix[5] === 0)) return;
	const moved = new Set(ids);
	for (const group of draft.groups.all()) {
		if (group.generator && group.members.length > 0 && group.members.every((m) => moved.has(m))) {
			draft.groups.update(group.id, (g) => withGeneratorMoved(g, matrix[4], matrix[5]));
		}
	}
}

export function transformElectrodes(
	design: Design,
	args: { ids: readonly string[]; matrix: Affine }
): Patch {
	const ids = selectedElectrodes(design, args.ids).map((e) => e.id);
	return editDesign(design, (draft) => transformInDraft(draft, ids, args.matrix));
}
