/** Finding codes of bad leads and transfer points on the glass drawing (off the glass, degenerate, on no net). */
import type { FindingCode } from './codes';

export const GLASS_OUTLINE_CODES: readonly FindingCode[] = [
	{
		code: 'glass.trace-off-glass',
		meaning: "a trace runs past its plate's glass, or lies off it entirely"
	},
	{
		code: 'glass.trace-degenerate',
		meaning: 'a trace has no length, fewer than two points, or a point that is not a number'
	},
	{
		code: 'glass.trace-no-net',
		meaning: 'a trace belongs to no common or segment line of its plate'
	},
	{
		code: 'glass.transfer-off-seal',
		meaning: 'a transfer point does not lie wholly under the seal, or lies off the back glass'
	}
];
