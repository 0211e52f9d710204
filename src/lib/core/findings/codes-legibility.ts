/** Finding codes of the legibility check (light scenarios, readers, threshold model), with their meaning. */
import type { FindingCode } from './codes';

export const LEGIBILITY_CODES: readonly FindingCode[] = [
	{ code: 'legibility.readable', meaning: 'every character group reads in this light scenario' },
	{
		code: 'legibility.too-small',
		meaning: 'characters subtend less than 16′ at the reading distance'
	},
	{ code: 'legibility.small', meaning: 'characters subtend 16–20′: under the preferred height' },
	{ code: 'legibility.washed-out', meaning: 'the front-surface veil pulls contrast under 3:1' },
	{ code: 'legibility.glare', meaning: 'the front-surface veil pulls contrast under 6:1' },
	{ code: 'legibility.low-contrast', meaning: 'on:off contrast under 3:1 even without glare' },
	{
		code: 'legibility.contrast-below-recommended',
		meaning: 'on:off contrast under 6:1 even without glare'
	},
	{
		code: 'legibility.below-threshold',
		meaning: 'visibility level under the floor: strokes near or below the detection threshold'
	},
	{ code: 'legibility.low-visibility', meaning: 'visibility level under the reading factor' },
	{ code: 'legibility.ghosts-visible', meaning: 'off segments stand out from the background' },
	{ code: 'legibility.no-characters', meaning: 'no character group to judge legibility on' },
	{
		code: 'legibility.safety-caution',
		meaning: 'a safety-relevant readout: confirm with measured samples and the applicable standards'
	}
];
