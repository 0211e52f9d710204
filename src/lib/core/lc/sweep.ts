/**
 * Director profiles over a list of RMS voltages with continuation.
 *
 * The first voltage is reached from 0 V through the threshold-scaled ladder of director.ts (or
 * from `start` when given); every later voltage is warm-started from the previous solution, in the
 * order given, walking the ladder's rungs between the two (ladderBetween). Order therefore matters only for hysteretic (high-twist) cells: sweep upwards for
 * the switching branch, downwards for the relaxing one. One workspace serves the whole sweep.
 */
import type { DirectorCell } from './cell';
import { createDirectorWorkspace } from './director-kernel';
import {
	checkCell,
	checkVoltage,
	continuationLadder,
	ladderBetween,
	resolveSettings,
	solveAlong,
	type DirectorSettings
} from './director';
import { loadInitialGuess, loadStartProfile } from './director-setup';
import type { DirectorProfile, DirectorSolution } from './profile';

export function sweepVoltage(
	options: {
		cell: DirectorCell;
		voltages_V: readonly number[];
		start?: DirectorProfile;
	} & DirectorSettings
): DirectorSolution[] {
	const { cell, voltages_V, start } = options;
	checkCell(cell);
	voltages_V.forEach(checkVoltage);
	const { slices, newton } = resolveSettings(options);
	const ws = createDirectorWorkspace(slices);
	const solutions: DirectorSolution[] = [];
	voltages_V.forEach((voltage_V, index) => {
		if (index > 0) {
			const voltages = ladderBetween(cell, voltages_V[index - 1], voltage_V);
			solutions.push(solveAlong({ ws, cell, voltages_V: voltages, newton }));
		} else if (start) {
			loadStartProfile(ws, cell, start);
			solutions.push(solveAlong({ ws, cell, voltages_V: [voltage_V], newton }));
		} else {
			loadInitialGuess(ws, cell, newton.nudge_rad);
			solutions.push(
				solveAlong({ ws, cell, voltages_V: continuationLadder(cell, voltage_V), newton })
			);
		}
	});
	return solutions;
}
