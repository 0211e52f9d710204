/**
 * Helpers that turn a selection (electrode ids) into what commands work on: the electrodes in
 * draw order, their exact bounds, and "units" that move together — a group whose members are all
 * selected aligns and distributes as one block, every other electrode on its own.
 */
import type { Design, Electrode } from '../design/schema';
import type { Bounds } from '../geometry/bounds';
import { shapesTightBounds } from '../geometry/tight-bounds';
import { CommandError, requireThat } from './command-error';

/** The selected electrodes in draw order; throws on an empty selection or an unknown id. */
export function selectedElectrodes(design: Design, ids: readonly string[]): Electrode[] {
	requireThat(ids.length > 0, 'nothing is selected');
	const wanted = new Set(ids);
	const found = design.electrodes.filter((e) => wanted.has(e.id));
	if (found.length !== wanted.size) {
		const known = new Set(found.map((e) => e.id));
		throw new CommandError(`unknown electrode "${[...wanted].find((id) => !known.has(id))}"`);
	}
	return found;
}

export function selectionBounds(design: Design, ids: readonly string[]): Bounds {
	return shapesTightBounds(selectedElectrodes(design, ids));
}

export interface SelectionUnit {
	readonly ids: readonly string[];
	readonly bounds: Bounds;
}

export function selectionUnits(design: Design, ids: readonly string[]): SelectionUnit[] {
	const electrodes = selectedElectrodes(design, ids);
	const byId = new Map(electrodes.map((e) => [e.id, e]));
	const placed = new Set<string>();
	const units: SelectionUnit[] = [];
	for (const group of design.groups) {
		if (group.members.length === 0 || !group.members.every((m) => byId.has(m) && !placed.has(m)))
			continue;
		group.members.forEach((m) => placed.add(m));
		units.push({
			ids: group.members,
			bounds: shapesTightBounds(group.members.map((m) => byId.get(m)!))
		});
	}
	for (const e of electrodes)
		if (!placed.has(e.id)) units.push({ ids: [e.id], bounds: shapesTightBounds([e]) });
	return units;
}
