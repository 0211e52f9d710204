/**
 * A mutable working copy of a design that commands edit, then turn into a patch. Each collection
 * is a copy-on-write RecordList; untouched records keep their identity, so `toPatch()` (a diff by
 * reference) lists exactly the records the command replaced, inserted, removed or moved.
 */
import type { Design, Electrode, Group, LineRef } from '../design/schema';
import { diffDesigns } from './diff-design';
import type { DocumentField, Patch } from './patch';
import { RecordList } from './record-list';

export class DesignDraft {
	readonly electrodes: RecordList<Electrode>;
	readonly groups: RecordList<Group>;
	readonly commons: RecordList<LineRef>;
	readonly segmentLines: RecordList<LineRef>;
	private readonly fields: Partial<Pick<Design, DocumentField>> = {};

	constructor(readonly base: Design) {
		this.electrodes = new RecordList(base.electrodes, 'electrode');
		this.groups = new RecordList(base.groups, 'group');
		this.commons = new RecordList(base.commons, 'common');
		this.segmentLines = new RecordList(base.segmentLines, 'segment line');
	}

	setField<F extends DocumentField>(field: F, value: Design[F]): void {
		(this.fields as Record<F, Design[F]>)[field] = value;
	}

	toDesign(): Design {
		return {
			...this.base,
			...this.fields,
			electrodes: this.electrodes.all() as Electrode[],
			groups: this.groups.all() as Group[],
			commons: this.commons.all() as LineRef[],
			segmentLines: this.segmentLines.all() as LineRef[]
		};
	}

	toPatch(): Patch {
		return diffDesigns(this.base, this.toDesign());
	}
}

/** Runs an edit on a draft of `design` and returns its patch. */
export function editDesign(design: Design, edit: (draft: DesignDraft) => void): Patch {
	const draft = new DesignDraft(design);
	edit(draft);
	return draft.toPatch();
}
