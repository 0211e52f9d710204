/**
 * Filled area of one plate's ITO: the union of all its conductors (electrodes with their holes,
 * back-plate pieces, leads, pads, transfer points) by the one polygon engine
 * (`geometry/polygon-clipper.ts`: overlaps counted once), in mm². An electrode or back-plate piece
 * is read even-odd (outline and holes); every ring of any other conductor is filled on its own.
 * Nets are united one at a time and summed: two nets never overlap on a sound plate (the glass
 * check reports any that touch).
 */
import { regionArea_mm2, unionRegions, type Region } from '../geometry/polygon-clipper';
import type { Net } from './artwork';

export function netArea_mm2(net: Net): number {
	const regions: Region[] = net.conductors.flatMap((c) =>
		c.evenOdd ? [c.rings] : c.rings.map((r) => [r])
	);
	return regionArea_mm2(unionRegions(regions), { fill: 'non-zero' });
}

export const plateArea_mm2 = (nets: readonly Net[]): number =>
	nets.reduce((sum, net) => sum + netArea_mm2(net), 0);
