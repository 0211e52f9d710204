/**
 * Wires the selection: assigns every selected electrode to a common and/or a segment line (null
 * unassigns). The same edit as setting the properties, named for the wiring panel.
 */
import type { Design } from '../design/schema';
import type { Patch } from './patch';
import { setElectrodeProperties } from './set-electrode-properties';

export function assignElectrodes(
	design: Design,
	args: { ids: readonly string[]; common?: string | null; line?: string | null }
): Patch {
	return setElectrodeProperties(design, { ids: args.ids, common: args.common, line: args.line });
}
