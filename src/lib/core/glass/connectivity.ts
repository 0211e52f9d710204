/**
 * Opens and shorts on one plate, from the conductors' real geometry (flattened rings): two
 * conductors connect when their rings touch or overlap (minimum gap 0, `geometry/minimum-gap.ts`).
 * An open is a conductor of a net not connected to the net's pad (or, on the common plate, its
 * transfer point); a short is two nets touching; a gap below the design's minimum between two nets,
 * where at least one of the pair is a lead, is reported too (electrode spacing is the design rules'
 * job).
 */
import type { Bounds } from '../geometry/bounds';
import { EMPTY_BOUNDS } from '../geometry/bounds';
import { minimumGapBetweenRings } from '../geometry/minimum-gap';
import type { Conductor, Net } from './artwork';
import { nearPairs } from './near-pairs';
import { ringBounds } from './rings';

interface Item {
	bounds: Bounds;
	net: number;
	conductor: Conductor;
	index: number;
}

export interface OpenConductor {
	net: Net;
	conductor: Conductor;
}

export interface NetContact {
	a: { net: Net; conductor: Conductor };
	b: { net: Net; conductor: Conductor };
	gap_mm: number;
}

function find(parent: Int32Array, i: number): number {
	while (parent[i] !== i) {
		parent[i] = parent[parent[i]];
		i = parent[i];
	}
	return i;
}

const TOUCH_mm = 1e-6;

export function plateConnectivity(options: {
	nets: readonly Net[];
	minGap_mm: number;
	/** Kind of the conductor every other conductor of a net must reach. */
	root: 'pad' | 'transfer';
}): { opens: OpenConductor[]; contacts: NetContact[] } {
	const { nets, minGap_mm } = options;
	const items: Item[] = [];
	nets.forEach((net, n) =>
		net.conductors.forEach((conductor) => {
			const bounds = { ...EMPTY_BOUNDS };
			for (const r of conductor.rings) ringBounds(r, bounds);
			items.push({ bounds, net: n, conductor, index: items.length });
		})
	);
	const parent = Int32Array.from(items.map((_, i) => i));
	const contacts: NetContact[] = [];
	nearPairs(items, items, minGap_mm, (i, j) => {
		if (i >= j) return;
		const a = items[i],
			b = items[j];
		const sameNet = a.net === b.net;
		if (!sameNet && a.conductor.kind === 'electrode' && b.conductor.kind === 'electrode') return;
		const gap = minimumGapBetweenRings(a.conductor.rings, b.conductor.rings);
		if (sameNet) {
			if (gap <= TOUCH_mm) parent[find(parent, i)] = find(parent, j);
		} else if (gap < minGap_mm - 1e-9) {
			contacts.push({
				a: { net: nets[a.net], conductor: a.conductor },
				b: { net: nets[b.net], conductor: b.conductor },
				gap_mm: gap
			});
		}
	});
	const opens: OpenConductor[] = [];
	nets.forEach((net, n) => {
		const mine = items.filter((it) => it.net === n);
		const roots = mine.filter((it) => it.conductor.kind === options.root);
		if (roots.length === 0) return;
		const rootSet = new Set(roots.map((r) => find(parent, r.index)));
		for (const it of mine)
			if (!rootSet.has(find(parent, it.index)) && it.conductor.kind !== 'trace')
				opens.push({ net, conductor: it.conductor });
	});
	return { opens, contacts };
}
