/**
 * Immutable id sets for editor state: a selection is replaced by a new set, never changed in
 * place, so a plain Set is the right value (state classes hold it with $state.raw).
 */
export const idSet = (ids: Iterable<string> = []): ReadonlySet<string> => new Set(ids);

export const EMPTY_IDS: ReadonlySet<string> = idSet();

/** Counts of electrodes per common and per segment line. */
export function wiringCounts(
	electrodes: readonly { common: string | null; line: string | null }[]
): {
	commons: ReadonlyMap<string, number>;
	lines: ReadonlyMap<string, number>;
} {
	const commons = new Map<string, number>();
	const lines = new Map<string, number>();
	for (const e of electrodes) {
		if (e.common) commons.set(e.common, (commons.get(e.common) ?? 0) + 1);
		if (e.line) lines.set(e.line, (lines.get(e.line) ?? 0) + 1);
	}
	return { commons, lines };
}
