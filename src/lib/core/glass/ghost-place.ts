/**
 * Where a glass ghost lies, kept apart from the ghost check so the page can sort the ghosts it is
 * handed without loading the check. `idle`: no electrode uses the ghost's (common, line) pair, so
 * the driver never selects it and the overlap only ever sees the unselected voltage: it stays dark.
 */
export type GhostPlace = 'visible' | 'bezel' | 'seal' | 'idle';

/** Whether the ghost switches where fluid is (in view or behind the bezel): the ones drawn and counted. */
export const ghostSwitches = (g: { where: GhostPlace }): boolean =>
	g.where === 'visible' || g.where === 'bezel';
