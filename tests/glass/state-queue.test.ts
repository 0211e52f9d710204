/**
 * The routing grid's priority queues against a plain sort (the reference: Array.prototype.sort
 * by priority). Every popped sequence must come out in non-decreasing priority and hold exactly the
 * states pushed; the heap's tie rule puts the larger cost so far first among equal priorities.
 */
import { describe, expect, it } from 'vitest';
import { StateHeap } from '../../src/lib/core/glass/state-heap';
import { StateQueue } from '../../src/lib/core/glass/state-queue';

/** Small deterministic generator (Park & Miller, CACM 31, 1988: minimal standard LCG). */
function lcg(seed: number) {
	let s = seed;
	return () => (s = (s * 48271) % 2147483647) / 2147483647;
}

interface Entry {
	f: number;
	g: number;
	state: number;
}

function drain(queue: { size: number; pop(): number }): number[] {
	const out: number[] = [];
	while (queue.size > 0) out.push(queue.pop());
	return out;
}

describe('state heap', () => {
	it('pops in the order of a sort by (priority, larger cost so far first)', () => {
		const random = lcg(7);
		for (let trial = 0; trial < 20; trial++) {
			const heap = new StateHeap(4);
			const entries: Entry[] = Array.from({ length: 300 }, (_, state) => ({
				f: Math.floor(random() * 40),
				g: Math.floor(random() * 10),
				state
			}));
			for (const e of entries) heap.push(e.f, e.g, e.state);
			const popped = drain(heap).map((s) => entries[s]);
			const sorted = [...entries].sort((a, b) => a.f - b.f || b.g - a.g);
			expect(popped.map((e) => [e.f, e.g])).toEqual(sorted.map((e) => [e.f, e.g]));
		}
	});
});

describe('state queue', () => {
	/** Pushes and pops interleaved as a monotone search does: nothing below the last priority popped. */
	function monotoneRun(options: { seed: number; fractional: boolean; spread: number }) {
		const random = lcg(options.seed);
		const queue = new StateQueue();
		const entries: Entry[] = [];
		const waiting = new Set<number>();
		const popped: Entry[] = [];
		let last = 0;
		for (let step = 0; step < 4000; step++) {
			if (waiting.size === 0 || random() < 0.6) {
				const raw = last + random() * options.spread;
				const f = options.fractional && step === 2000 ? raw : Math.floor(raw);
				const e = { f, g: Math.floor(random() * 5), state: entries.length };
				entries.push(e);
				waiting.add(e.state);
				queue.push(e.f, e.g, e.state);
			} else {
				const state = queue.pop();
				const e = entries[state];
				expect(waiting.has(state)).toBe(true);
				// No waiting entry may have a lower priority than the one popped.
				const lowest = Math.min(...[...waiting].map((s) => entries[s].f));
				expect(e.f).toBe(lowest);
				expect(queue.poppedG).toBe(e.g);
				waiting.delete(state);
				popped.push(e);
				last = e.f;
			}
		}
		for (const state of drain(queue)) popped.push(entries[state]);
		expect(popped.map((e) => e.state).sort((a, b) => a - b)).toEqual(entries.map((e) => e.state));
	}

	it('pops the lowest priority among those waiting, with whole-number priorities', () => {
		monotoneRun({ seed: 3, fractional: false, spread: 12 });
	});

	it('stays exact when the priorities span more than its ring (it widens)', () => {
		monotoneRun({ seed: 5, fractional: false, spread: 700 });
	});

	it('stays exact when a fractional priority arrives (it moves to the heap)', () => {
		monotoneRun({ seed: 11, fractional: true, spread: 30 });
	});

	it('takes priorities pushed below the lowest waiting before any pop (many sources)', () => {
		const queue = new StateQueue();
		const fs = [50, 40, 90, 10, 10, 200, 0, 63];
		fs.forEach((f, state) => queue.push(f, 0, state));
		const popped = drain(queue).map((s) => fs[s]);
		expect(popped).toEqual([...fs].sort((a, b) => a - b));
	});

	it('starts empty again after clear()', () => {
		const queue = new StateQueue();
		queue.push(5, 0, 1);
		queue.push(9, 0, 2);
		queue.clear();
		expect(queue.size).toBe(0);
		queue.push(3, 1, 7);
		expect(drain(queue)).toEqual([7]);
	});
});
