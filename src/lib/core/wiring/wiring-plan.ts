/**
 * Automatic wiring plan: the common and the segment line of every electrode for N commons.
 *
 * Rule — back plates as horizontal bands. Each character (a group of the design; electrodes in no
 * group form one more pool, see wiring-units.ts) gets lines of its own, L = ⌈k/N⌉ of them for k
 * electrodes, the fewest that can hold it: a 7-segment digit with its point takes 2 lines at 4
 * commons, 3 at 3, 4 at 2 and 8 at static drive. Its electrodes, ranked top to bottom (ties left to
 * right), are dealt to the commons in that order, L per common: the top L on the first common,
 * the next L on the second, and so on. Common k thus holds the same height band of every
 * character in a row, so each common's back plate can be one horizontal band across the row and
 * the bands of different commons lie one above the other without crossing. Within a common the
 * electrodes take the character's lines left to right. No two electrodes ever share a crossing.
 *
 * Locked electrodes keep their common and line. Their lines stay with their character: the
 * character's free electrodes fill those lines' free crossings first (at the band's common when
 * free, else at the nearest free common) before a new line is opened; no other character uses them.
 */
import type { Design, Electrode } from '../design/schema';
import { wiringUnits } from './wiring-units';

export const MAX_AUTO_COMMONS = 16;

export interface PlannedLine {
	/** Id of an existing line record (a locked electrode's line), or null for a new line. */
	lockedId: string | null;
	/** Character the line serves. */
	unit: string;
}

export interface WiringPlan {
	commons: number;
	/** Lines in pin order: each character's lines together, characters in document order. */
	lines: PlannedLine[];
	/** Free electrode id → common index (0-based) and index into `lines`. */
	assignments: Map<string, { common: number; line: number }>;
}

interface Slot {
	line: number;
	/** Common indices taken on this line. */
	taken: Set<number>;
}

export function planWiring(design: Design, commons: number): WiringPlan {
	const commonIndex = new Map(design.commons.map((c, i) => [c.id, i]));
	const lockedOnLine = new Map<string, Set<number>>();
	for (const e of design.electrodes) {
		if (!e.locked || e.line === null) continue;
		const taken = lockedOnLine.get(e.line) ?? new Set<number>();
		if (e.common !== null) taken.add(commonIndex.get(e.common) ?? -1);
		lockedOnLine.set(e.line, taken);
	}
	const lines: PlannedLine[] = [];
	const assignments = new Map<string, { common: number; line: number }>();
	const claimed = new Set<string>();
	for (const unit of wiringUnits(design)) {
		const slots: Slot[] = [];
		for (const e of unit.members) {
			if (!e.locked || e.line === null || claimed.has(e.line) || !lockedOnLine.has(e.line))
				continue;
			claimed.add(e.line);
			lines.push({ lockedId: e.line, unit: unit.name });
			slots.push({ line: lines.length - 1, taken: lockedOnLine.get(e.line)! });
		}
		const free = unit.members.filter((e) => !e.locked);
		const perCommon = Math.max(1, Math.ceil(free.length / commons));
		const budget = Math.ceil(unit.members.length / commons);
		free.forEach((e: Electrode, rank) => {
			const band = Math.min(commons - 1, Math.floor(rank / perCommon));
			let slot = slots.find((s) => !s.taken.has(band));
			let common = band;
			if (!slot && slots.length >= budget) {
				const nearest = nearestFreeCrossing(slots, band, commons);
				if (nearest) ({ slot, common } = nearest);
			}
			if (!slot) {
				lines.push({ lockedId: null, unit: unit.name });
				slot = { line: lines.length - 1, taken: new Set() };
				slots.push(slot);
			}
			slot.taken.add(common);
			assignments.set(e.id, { common, line: slot.line });
		});
	}
	return { commons, lines, assignments };
}

function nearestFreeCrossing(
	slots: readonly Slot[],
	band: number,
	commons: number
): { slot: Slot; common: number } | null {
	for (let distance = 1; distance < commons; distance++) {
		for (const common of [band - distance, band + distance]) {
			if (common < 0 || common >= commons) continue;
			const slot = slots.find((s) => !s.taken.has(common));
			if (slot) return { slot, common };
		}
	}
	return null;
}
