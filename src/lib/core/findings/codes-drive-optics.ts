/** Finding codes of the drive, wiring and cell-optics checks, with their meaning. */
import type { FindingCode } from './codes';

export const DRIVE_AND_OPTICS_CODES: readonly FindingCode[] = [
	{ code: 'drive.no-temperatures', meaning: 'the drive has no temperature to be checked at' },
	{
		code: 'drive.ratio-too-low',
		meaning: "the selection ratio is below the cell's V90/V10 at a temperature: no amplitude works"
	},
	{
		code: 'drive.no-common-amplitude',
		meaning: 'each temperature has a window, but no single amplitude covers the whole range'
	},
	{ code: 'drive.amplitude-too-low', meaning: 'on segments stay below V90 somewhere in the range' },
	{ code: 'drive.amplitude-too-high', meaning: 'off segments exceed V10 somewhere in the range' },
	{ code: 'drive.margin-small', meaning: 'every segment switches, but the margin is under 5 %' },
	{ code: 'drive.window-ok', meaning: 'every segment switches over the whole range' },
	{
		code: 'drive.bias-off-optimum',
		meaning: 'the bias gives a lower selection ratio than optimum'
	},
	{ code: 'drive.frame-rate-low', meaning: 'the frame rate is low enough to flicker' },
	{ code: 'drive.frame-rate-high', meaning: 'the frame rate wastes drive current' },
	{ code: 'wiring.shared-crossing', meaning: 'two electrodes share one (common, line) crossing' },
	{ code: 'wiring.unassigned', meaning: 'electrodes without a common or a segment line' },
	{
		code: 'wiring.common-beyond-drive',
		meaning: 'electrodes sit on commons the drive does not scan'
	},
	{ code: 'wiring.ok', meaning: 'every electrode has its own crossing' },
	{ code: 'optics.slow-switching', meaning: 'the cell switches slower than the limit when cold' },
	{ code: 'optics.contrast-below-minimum', meaning: 'on:off contrast below 3:1' },
	{ code: 'optics.contrast-below-recommended', meaning: 'on:off contrast below 6:1' },
	{ code: 'optics.ghost-visible', meaning: 'off segments differ visibly from the background' },
	{ code: 'optics.model-failed', meaning: 'the cell model could not be evaluated' },
	{
		code: 'optics.thresholds-disagree',
		meaning: "entered V10/V90 differ from the cell model's by more than 10 %"
	}
];
