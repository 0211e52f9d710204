/** Finding codes of the viewing-angle check (cell orientation, contrast map, parallax). */
import type { FindingCode } from './codes';

export const VIEW_ANGLE_CODES: readonly FindingCode[] = [
	{
		code: 'viewangle.rubbing-twist-mismatch',
		meaning: "the rubbing directions and twist sense give a twist other than the cell's"
	},
	{
		code: 'viewangle.parallax-shadow',
		meaning: 'at 30° off the normal the segment shadow moves by more than half the narrowest stroke'
	},
	{
		code: 'viewangle.narrow-cone',
		meaning: 'in the best viewing direction the contrast falls below 3:1 within 30° of the normal'
	},
	{
		code: 'viewangle.contrast-inversion',
		meaning: 'seen from some directions within the map, on segments look lighter than off ones'
	},
	{
		code: 'viewangle.best-direction',
		meaning: 'the clock direction the readout is best seen from'
	},
	{ code: 'viewangle.model-failed', meaning: 'the viewing-angle model could not be evaluated' }
];
