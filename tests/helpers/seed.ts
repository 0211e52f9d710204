/**
 * Seeds for property tests: a new one each run, so every run explores new cases, printed so a
 * failure can be replayed with FC_SEED=<seed>.
 */
export function propertySeed(label: string): number {
	const fromEnv = process.env.FC_SEED;
	const seed =
		fromEnv !== undefined ? Number(fromEnv) : (Date.now() ^ (Math.random() * 2 ** 31)) | 0;
	console.log(`[seed] ${label}: ${seed} (replay with FC_SEED=${seed})`);
	return seed;
}
