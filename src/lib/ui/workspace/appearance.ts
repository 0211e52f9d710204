/**
 * Predicted colours for painting the drawing as the glass will look: the background (off
 * segments and glass) and switched-on segments, as CSS colours. Null means wiring colours.
 */
export interface Appearance {
	background: string;
	segmentOn: string;
	/** Colour of a segment that is driven off (ghosting shows here); the background when absent. */
	segmentOff?: string;
	/** Which electrodes to show switched on; all when absent. */
	litIds?: ReadonlySet<string>;
}
