/** Finding codes of the app's bounded-work guards. */
import type { FindingCode } from './codes';

export const RELIABILITY_CODES: readonly FindingCode[] = [
	{
		code: 'optics.model-timeout',
		meaning:
			'The optical model did not finish within its time limit and was stopped; optics results are missing.'
	}
];
