/**
 * Priority queue of search states for the routing grid: a bucket queue (Dial, CACM 12, 1969) while
 * every priority is a whole number, which the grid's step costs and distance estimates usually are;
 * a binary heap (`StateHeap`) from the first fractional priority on, with every waiting entry moved
 * over, so the pop order stays exact either way.
 *
 * Buckets are a ring of linked lists indexed by priority; within a bucket the last entry pushed
 * comes out first, which favours the deeper of equally promising states. The ring widens when a
 * priority lands beyond it. Priorities must not fall below the last one popped (true for A* with a
 * consistent estimate and Dijkstra's search); one that does is taken in heap mode, still exactly.
 */
import { StateHeap } from './state-heap';

/** Bucket indices are taken with 32-bit masks: larger priorities go to the heap. */
const MAX_BUCKET_PRIORITY = 2 ** 30;

export class StateQueue {
	private head = new Int32Array(64).fill(-1);
	private mask = 63;
	/** Entry pool: the entries pushed since `clear()`, linked per bucket. */
	private next = new Int32Array(1024);
	private g = new Float64Array(1024);
	private state = new Int32Array(1024);
	private used = 0;
	private count = 0;
	/** Lowest priority that may still hold entries; the highest pushed. */
	private low = 0;
	private high = -Infinity;
	/** Priority of the last entry popped: nothing lower may come in while in bucket mode. */
	private floor = 0;
	private heapMode = false;
	private readonly heap = new StateHeap();
	private lastG = 0;

	get size(): number {
		return this.heapMode ? this.heap.size : this.count;
	}

	clear(): void {
		if (this.count > 0) this.head.fill(-1);
		this.used = 0;
		this.count = 0;
		this.high = -Infinity;
		this.floor = 0;
		this.heapMode = false;
		this.heap.clear();
	}

	push(f: number, g: number, state: number): void {
		if (this.heapMode) return this.heap.push(f, g, state);
		if (f !== Math.floor(f) || f < this.floor || f > MAX_BUCKET_PRIORITY) {
			this.toHeap();
			return this.heap.push(f, g, state);
		}
		let low = f,
			high = f;
		if (this.count > 0) {
			low = Math.min(f, this.low);
			high = Math.max(f, this.high);
			if (high - low > this.mask) this.widen(high - low);
		}
		this.low = low;
		this.high = high;
		if (this.used === this.next.length) this.growPool();
		const e = this.used++;
		const b = f & this.mask;
		this.next[e] = this.head[b];
		this.g[e] = g;
		this.state[e] = state;
		this.head[b] = e;
		this.count++;
	}

	/** The lowest priority waiting (Infinity when empty). */
	peekF(): number {
		if (this.heapMode) return this.heap.size > 0 ? this.heap.topF() : Infinity;
		return this.count === 0 ? Infinity : this.lowestFull();
	}

	/** The lowest priority whose bucket holds an entry, kept as `low` (bucket mode, entries waiting). */
	private lowestFull(): number {
		const head = this.head,
			mask = this.mask;
		let f = this.low;
		while (head[f & mask] < 0)
			if (++f > this.high) throw new Error('state queue: lost its entries');
		this.low = f;
		return f;
	}

	/** Removes an entry of the lowest priority and returns its state; `poppedG` is its cost so far. */
	pop(): number {
		if (this.heapMode) {
			this.lastG = this.heap.topG();
			return this.heap.pop();
		}
		const f = (this.floor = this.lowestFull());
		const b = f & this.mask;
		const e = this.head[b];
		this.head[b] = this.next[e];
		this.count--;
		this.lastG = this.g[e];
		return this.state[e];
	}

	/** Cost so far of the entry the last `pop()` returned. */
	get poppedG(): number {
		return this.lastG;
	}

	private growPool(): void {
		const n = this.next.length * 2;
		const next = new Int32Array(n),
			g = new Float64Array(n),
			state = new Int32Array(n);
		next.set(this.next);
		g.set(this.g);
		state.set(this.state);
		this.next = next;
		this.g = g;
		this.state = state;
	}

	/** Doubles the ring until it spans `span` + 1 priorities, re-linking the waiting entries. */
	private widen(span: number): void {
		let size = this.head.length;
		while (size <= span) size *= 2;
		const old = this.head,
			oldMask = this.mask;
		this.head = new Int32Array(size).fill(-1);
		this.mask = size - 1;
		// The waiting entries lie in [low, high], which the old ring spans; walk each bucket's list
		// from its end so the new list keeps the same order.
		const chain: number[] = [];
		for (let f = this.low; f <= this.high; f++) {
			chain.length = 0;
			for (let e = old[f & oldMask]; e >= 0; e = this.next[e]) chain.push(e);
			for (let k = chain.length - 1; k >= 0; k--) {
				const e = chain[k];
				this.next[e] = this.head[f & this.mask];
				this.head[f & this.mask] = e;
			}
		}
	}

	private toHeap(): void {
		const mask = this.mask;
		for (let f = this.low; this.count > 0; f++)
			for (let e = this.head[f & mask]; e >= 0; e = this.next[e]) {
				this.heap.push(f, this.g[e], this.state[e]);
				this.count--;
			}
		this.head.fill(-1);
		this.heapMode = true;
	}
}
