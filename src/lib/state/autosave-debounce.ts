/**
 * Debounced saving: `schedule` remembers the latest snapshot and saves it `delay_ms` after the
 * last change (but at least every `maxWait_ms` during continuous editing); `flush` saves a
 * pending snapshot now (page hide). With `leading`, the first change after a quiet spell (no save
 * started within `delay_ms`) is saved at once, so a single edit reaches storage without waiting;
 * changes that follow it are debounced as usual. Saves never overlap; a failed save is reported,
 * not thrown.
 */
export interface Debouncer<T> {
	schedule(snapshot: T): void;
	flush(): Promise<void>;
	cancel(): void;
	readonly pending: boolean;
}

export function createDebouncedSaver<T>(options: {
	save: (snapshot: T) => Promise<void>;
	delay_ms: number;
	maxWait_ms?: number;
	leading?: boolean;
	onError?: (error: unknown) => void;
	setTimer?: (fn: () => void, ms: number) => unknown;
	clearTimer?: (handle: unknown) => void;
	now?: () => number;
}): Debouncer<T> {
	const setTimer = options.setTimer ?? ((fn, ms) => setTimeout(fn, ms));
	const clearTimer =
		options.clearTimer ?? ((h) => clearTimeout(h as ReturnType<typeof setTimeout>));
	const now = options.now ?? (() => Date.now());
	const maxWait = options.maxWait_ms ?? options.delay_ms * 5;
	let latest: { value: T } | null = null;
	let timer: unknown = null;
	let firstPending_ms = 0;
	let running: Promise<void> = Promise.resolve();
	let lastRun_ms = -Infinity;

	const run = (): Promise<void> => {
		if (timer !== null) clearTimer(timer);
		timer = null;
		const item = latest;
		latest = null;
		if (!item) return running;
		lastRun_ms = now();
		running = running.then(() => options.save(item.value)).catch((e) => options.onError?.(e));
		return running;
	};

	return {
		schedule(snapshot: T) {
			const quiet = !latest && now() - lastRun_ms >= options.delay_ms;
			if (!latest) firstPending_ms = now();
			latest = { value: snapshot };
			if (options.leading && quiet) return void run();
			if (timer !== null) clearTimer(timer);
			const wait = Math.max(0, Math.min(options.delay_ms, firstPending_ms + maxWait - now()));
			timer = setTimer(() => void run(), wait);
		},
		flush: run,
		cancel() {
			if (timer !== null) clearTimer(timer);
			timer = null;
			latest = null;
		},
		get pending() {
			return latest !== null;
		}
	};
}
