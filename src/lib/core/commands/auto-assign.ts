/**
 * Assigns every unlocked electrode a common and a segment line automatically for a chosen number
 * of commons (1–16), by the rule in wiring/wiring-plan.ts, as one undoable edit. It also makes the
 * common and line records fit: the first N commons are kept (missing ones added), others dropped
 * unless a locked electrode uses them; line records are reused in order, added when short and
 * dropped when unused. Default names (COM3, SEG12) are renumbered to their new place; names the
 * designer gave are kept. The drive then scans N commons.
 */
import type { Design, LineRef } from '../design/schema';
import { MAX_AUTO_COMMONS, planWiring } from '../wiring/wiring-plan';
import { requireThat } from './command-error';
import { editDesign } from './design-draft';
import { IdAllocator } from './ids';
import type { Patch } from './patch';

const DEFAULT_COMMON_NAME = /^COM\d+$/;
const DEFAULT_LINE_NAME = /^SEG\d+$/;

function renumbered(ref: LineRef, name: string, pattern: RegExp): LineRef {
	return pattern.test(ref.name) && ref.name !== name ? { ...ref, name } : ref;
}

export function autoAssign(design: Design, args: { commons: number }): Patch {
	const n = args.commons;
	requireThat(
		Number.isInteger(n) && n >= 1 && n <= MAX_AUTO_COMMONS,
		`commons: expected a whole number from 1 to ${MAX_AUTO_COMMONS}, got ${n}`
	);
	const plan = planWiring(design, n);
	const lockedCommons = new Set(
		design.electrodes.filter((e) => e.locked && e.common !== null).map((e) => e.common!)
	);

	const commonIds = IdAllocator.forCollection(design, 'commons');
	const commons: LineRef[] = [];
	for (let i = 0; i < n; i++) {
		const existing = design.commons[i];
		const name = `COM${i + 1}`;
		commons.push(
			existing
				? renumbered(existing, name, DEFAULT_COMMON_NAME)
				: { id: commonIds.next('com'), name }
		);
	}
	commons.push(...design.commons.slice(n).filter((c) => lockedCommons.has(c.id)));

	const lockedLines = new Set(plan.lines.flatMap((l) => (l.lockedId ? [l.lockedId] : [])));
	const reusable = design.segmentLines.filter((l) => !lockedLines.has(l.id));
	const lineIds = IdAllocator.forCollection(design, 'segmentLines');
	const lineById = new Map(design.segmentLines.map((l) => [l.id, l]));
	let reused = 0;
	const lines: LineRef[] = plan.lines.map((planned, i) => {
		const name = `SEG${i + 1}`;
		const existing = planned.lockedId ? lineById.get(planned.lockedId) : reusable[reused++];
		return existing
			? renumbered(existing, name, DEFAULT_LINE_NAME)
			: { id: lineIds.next('seg'), name };
	});

	return editDesign(design, (draft) => {
		draft.commons.remove(design.commons.map((c) => c.id));
		draft.commons.insert(commons);
		draft.segmentLines.remove(design.segmentLines.map((l) => l.id));
		draft.segmentLines.insert(lines);
		// One pass over the electrodes (unchanged records keep their identity, so the patch lists
		// only the rewired ones).
		const wired = design.electrodes.map((e) => {
			const place = plan.assignments.get(e.id);
			if (!place) return e;
			const common = commons[place.common].id;
			const line = lines[place.line].id;
			return e.common === common && e.line === line ? e : { ...e, common, line };
		});
		draft.electrodes.remove(design.electrodes.map((e) => e.id));
		draft.electrodes.insert(wired);
		if (design.drive.commons !== n) draft.setField('drive', { ...design.drive, commons: n });
	});
}
