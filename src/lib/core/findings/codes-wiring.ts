/** Finding codes of the wiring tools: pin layout along the contact edge. */
import type { FindingCode } from './codes';

export const WIRING_CODES: readonly FindingCode[] = [
	{
		code: 'wiring.pins-do-not-fit',
		meaning: 'the pins at the chosen pitch are longer than the contact edge of the glass'
	}
];
