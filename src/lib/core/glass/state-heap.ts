/**
 * Binary min-heap of search states on typed arrays (Williams, CACM 7, 1964), for the routing grid's
 * least-cost searches. Each entry holds a priority (f = cost so far + distance estimate), the cost
 * so far (g) and a state index. Entries are ordered by f; among equal f the larger g comes first,
 * so a search steps along one of several equally cheap paths instead of widening over all of them
 * (the usual tie rule of A*: among equal estimates, the deeper state is nearer its goal).
 *
 * The arrays grow by doubling and are kept between searches; `clear()` empties the heap without
 * freeing them. No decrease-key: a caller pushes a state again when it finds it cheaper and skips
 * the stale entry when it comes out (its g is above the state's best cost).
 */
export class StateHeap {
	private f: Float64Array;
	private g: Float64Array;
	private state: Int32Array;
	private count = 0;

	constructor(capacity = 1024) {
		this.f = new Float64Array(capacity);
		this.g = new Float64Array(capacity);
		this.state = new Int32Array(capacity);
	}

	get size(): number {
		return this.count;
	}

	clear(): void {
		this.count = 0;
	}

	/** Priority of the first entry (undefined behaviour when empty). */
	topF(): number {
		return this.f[0];
	}

	/** Cost so far of the first entry (undefined behaviour when empty). */
	topG(): number {
		return this.g[0];
	}

	private grow(): void {
		const n = this.f.length * 2;
		const f = new Float64Array(n);
		const g = new Float64Array(n);
		const s = new Int32Array(n);
		f.set(this.f);
		g.set(this.g);
		s.set(this.state);
		this.f = f;
		this.g = g;
		this.state = s;
	}

	push(f: number, g: number, state: number): void {
		if (this.count === this.f.length) this.grow();
		const fs = this.f,
			gs = this.g,
			ss = this.state;
		let i = this.count++;
		while (i > 0) {
			const parent = (i - 1) >> 1;
			const pf = fs[parent];
			if (pf < f || (pf === f && gs[parent] >= g)) break;
			fs[i] = pf;
			gs[i] = gs[parent];
			ss[i] = ss[parent];
			i = parent;
		}
		fs[i] = f;
		gs[i] = g;
		ss[i] = state;
	}

	/** Removes the first entry and returns its state. */
	pop(): number {
		const fs = this.f,
			gs = this.g,
			ss = this.state;
		const top = ss[0];
		const n = --this.count;
		const lf = fs[n],
			lg = gs[n],
			ls = ss[n];
		let i = 0;
		for (;;) {
			let child = 2 * i + 1;
			if (child >= n) break;
			let cf = fs[child],
				cg = gs[child];
			const right = child + 1;
			if (right < n) {
				const rf = fs[right],
					rg = gs[right];
				if (rf < cf || (rf === cf && rg > cg)) {
					child = right;
					cf = rf;
					cg = rg;
				}
			}
			if (cf > lf || (cf === lf && cg <= lg)) break;
			fs[i] = cf;
			gs[i] = cg;
			ss[i] = ss[child];
			i = child;
		}
		fs[i] = lf;
		gs[i] = lg;
		ss[i] = ls;
		return top;
	}
}
