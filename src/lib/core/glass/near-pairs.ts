/**
 * Pairs of items whose bounds come within `slack_mm` of each other, by sort and sweep on x
 * (the broad phase of collision detection): O(n log n + k) for k nearby pairs.
 */
import type { Bounds } from '../geometry/bounds';

export function nearPairs(
	a: readonly { bounds: Bounds }[],
	b: readonly { bounds: Bounds }[],
	slack_mm: number,
	visit: (i: number, j: number) => void
): void {
	const events = [
		...a.map((item, i) => ({ side: 0, i, x: item.bounds.minX })),
		...b.map((item, i) => ({ side: 1, i, x: item.bounds.minX }))
	].sort((p, q) => p.x - q.x || p.side - q.side || p.i - q.i);
	const active: [number[], number[]] = [[], []];
	const items = [a, b];
	for (const e of events) {
		const other = 1 - e.side;
		const mine = items[e.side][e.i].bounds;
		const kept: number[] = [];
		for (const k of active[other]) {
			const ob = items[other][k].bounds;
			if (ob.maxX + slack_mm < e.x) continue;
			kept.push(k);
			if (ob.minY <= mine.maxY + slack_mm && mine.minY <= ob.maxY + slack_mm) {
				if (e.side === 0) visit(e.i, k);
				else visit(k, e.i);
			}
		}
		active[other] = kept;
		active[e.side].push(e.i);
	}
}
