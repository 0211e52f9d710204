/**
 * Sets name, kind, common, segment line and/or the lock of the selected electrodes (the property
 * panel). Omitted properties are left alone; null unassigns a common or line. A locked assignment
 * is kept by automatic wiring.
 */
import type { Design, ElectrodeKind } from '../design/schema';
import { requireThat } from './command-error';
import { editDesign } from './design-draft';
import { checkAssignment } from './electrode-input';
import type { Patch } from './patch';
import { selectedElectrodes } from './selection';

export interface ElectrodeProperties {
	name?: string;
	kind?: ElectrodeKind;
	common?: string | null;
	line?: string | null;
	locked?: boolean;
}

export function setElectrodeProperties(
	design: Design,
	args: { ids: readonly string[] } & ElectrodeProperties
): Patch {
	const electrodes = selectedElectrodes(design, args.ids);
	checkAssignment(design, args);
	if (args.name !== undefined)
		requireThat(args.name.length <= 200, 'expected a name of at most 200 characters');
	if (args.kind !== undefined)
		requireThat(
			args.kind === 'segment' || args.kind === 'icon',
			`unknown electrode kind "${args.kind}"`
		);
	if (args.locked !== undefined)
		requireThat(typeof args.locked === 'boolean', 'locked: expected true or false');
	const changes: ElectrodeProperties = {};
	for (const key of ['name', 'kind', 'common', 'line', 'locked'] as const) {
		if (args[key] !== undefined) (changes as Record<string, unknown>)[key] = args[key];
	}
	return editDesign(design, (draft) => {
		for (const e of electrodes) {
			const differs = Object.entries(changes).some(([k, v]) => e[k as keyof typeof e] !== v);
			if (differs) draft.electrodes.update(e.id, (old) => ({ ...old, ...changes }));
		}
	});
}
