/** Finding codes of the fluid's limits over the operating range, with their meaning. */
import type { FindingCode } from './codes';

export const FLUID_CODES: readonly FindingCode[] = [
	{
		code: 'optics.fluid-clears',
		meaning:
			'the fluid clears inside the operating range: the display blanks there; results cover the rest'
	}
];
