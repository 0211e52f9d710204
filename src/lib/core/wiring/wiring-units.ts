/**
 * The units automatic wiring works on: each group of the design is one character (a digit, a bar
 * graph), and every electrode in no group joins one further pool. Within a unit the electrodes are
 * ranked top to bottom by the centre of their exact bounds, ties (centres within `ROW_TOLERANCE_mm`
 * of each other) left to right.
 *
 * Coordinates: glass millimetres, y downwards (see design/schema.ts).
 */
import type { Design, Electrode } from '../design/schema';
import { boundsCentre, contourTightBounds } from '../geometry/tight-bounds';

/** Centres closer than this in y count as one row (a 7-segment digit's f and b, say). */
export const ROW_TOLERANCE_mm = 0.05;

export interface WiringUnit {
	/** Group id, or null for the pool of electrodes in no group. */
	groupId: string | null;
	name: string;
	/** Every member in rank order (top to bottom, then left to right). */
	members: Electrode[];
}

export interface Ranked {
	electrode: Electrode;
	x_mm: number;
	y_mm: number;
}

/** Sorts electrodes top to bottom, then left to right within a row. */
export function rankTopToBottom(electrodes: readonly Electrode[]): Electrode[] {
	const ranked: Ranked[] = electrodes.map((electrode) => {
		const c = boundsCentre(contourTightBounds(electrode.outline));
		return { electrode, x_mm: c.x, y_mm: c.y };
	});
	ranked.sort((a, b) => a.y_mm - b.y_mm);
	// Rows: a new row starts where a centre lies more than the tolerance below the row's top one.
	const row = new Map<Ranked, number>();
	let top = -Infinity;
	let n = -1;
	for (const r of ranked) {
		if (r.y_mm - top > ROW_TOLERANCE_mm) {
			top = r.y_mm;
			n++;
		}
		row.set(r, n);
	}
	ranked.sort((a, b) => row.get(a)! - row.get(b)! || a.x_mm - b.x_mm);
	return ranked.map((r) => r.electrode);
}

/** Groups in document order, then the pool of ungrouped electrodes; an electrode counts once. */
export function wiringUnits(design: Design): WiringUnit[] {
	const byId = new Map(design.electrodes.map((e) => [e.id, e]));
	const placed = new Set<string>();
	const units: WiringUnit[] = [];
	for (const group of design.groups) {
		const members: Electrode[] = [];
		for (const id of group.members) {
			const e = byId.get(id);
			if (e && !placed.has(id)) {
				placed.add(id);
				members.push(e);
			}
		}
		if (members.length > 0)
			units.push({
				groupId: group.id,
				name: group.name || group.id,
				members: rankTopToBottom(members)
			});
	}
	const loose = design.electrodes.filter((e) => !placed.has(e.id));
	if (loose.length > 0)
		units.push({ groupId: null, name: 'Ungrouped', members: rankTopToBottom(loose) });
	return units;
}
