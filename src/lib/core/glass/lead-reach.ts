/**
 * Which electrodes each lead serves: on one plate, the electrodes (segment plate) or back-plate
 * pieces (common plate) a lead reaches through touching conductors of its own net — leads,
 * electrodes, pieces — without passing through the pad or the transfer point, where every
 * conductor of the net meets. Touching means a gap of at most 1 nm between the real rings
 * (`geometry/minimum-gap.ts`), as in the plate's connectivity check.
 */
import { EMPTY_BOUNDS, type Bounds } from '../geometry/bounds';
import { minimumGapBetweenRings } from '../geometry/minimum-gap';
import type { Conductor, Net } from './artwork';
import { nearPairs } from './near-pairs';
import { ringBounds } from './rings';

const TOUCH_mm = 1e-6;

function root(parent: Int32Array, i: number): number {
	while (parent[i] !== i) {
		parent[i] = parent[parent[i]];
		i = parent[i];
	}
	return i;
}

function netReach(net: Net, into: Map<Conductor, string[]>): void {
	const items = net.conductors
		.filter((c) => c.kind !== 'pad' && c.kind !== 'transfer')
		.map((conductor) => {
			const bounds: Bounds = { ...EMPTY_BOUNDS };
			for (const r of conductor.rings) ringBounds(r, bounds);
			return { conductor, bounds };
		});
	if (!items.some((it) => it.conductor.kind === 'trace')) return;
	const parent = Int32Array.from(items.map((_, i) => i));
	nearPairs(items, items, TOUCH_mm, (i, j) => {
		if (i >= j || root(parent, i) === root(parent, j)) return;
		if (minimumGapBetweenRings(items[i].conductor.rings, items[j].conductor.rings) <= TOUCH_mm)
			parent[root(parent, i)] = root(parent, j);
	});
	const reached = new Map<number, Set<string>>();
	items.forEach((it, i) => {
		const set = reached.get(root(parent, i)) ?? new Set<string>();
		for (const e of it.conductor.electrodes) set.add(e);
		reached.set(root(parent, i), set);
	});
	items.forEach((it, i) => {
		if (it.conductor.kind === 'trace')
			into.set(it.conductor, [...(reached.get(root(parent, i)) ?? [])]);
	});
}

/** For every lead of the nets, the electrodes it reaches (possibly none: a loose lead). */
export function leadElectrodes(nets: readonly Net[]): Map<Conductor, string[]> {
	const out = new Map<Conductor, string[]>();
	for (const net of nets) netReach(net, out);
	return out;
}
