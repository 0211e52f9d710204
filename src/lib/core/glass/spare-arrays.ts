/**
 * Per-cell arrays kept between nets and plates, so routing a glass again allocates little: an
 * array handed back is kept (the newest `keep` of them) and handed out again for a grid of its
 * length. It holds whatever its last user left in it: each kind of use says whether it is handed
 * back cleared or filled afresh on taking.
 */
export class SpareArrays<T extends { readonly length: number }> {
	private readonly kept: T[] = [];

	constructor(
		private readonly make: (length: number) => T,
		private readonly keep: number
	) {}

	/** A kept array of this length, or a new one. */
	take(length: number): T {
		const i = this.kept.findIndex((a) => a.length === length);
		return i >= 0 ? this.kept.splice(i, 1)[0] : this.make(length);
	}

	/** Keeps the array for a later `take`, dropping the oldest beyond `keep`. */
	give(array: T): void {
		if (this.kept.length === this.keep) this.kept.shift();
		this.kept.push(array);
	}
}
