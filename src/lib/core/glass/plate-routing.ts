/**
 * What routing one plate gives back: its leads, the nets left short of a terminal and how many
 * terminals no lead reached (for comparing attempts).
 */
import type { Trace } from '../design/glass-art-schema';

export interface Unrouted {
	plate: 'segment' | 'common';
	net: string;
	electrodes: string[];
}

export interface GlassRouting {
	traces: Trace[];
	unrouted: Unrouted[];
}

export interface PlateRouting {
	traces: Trace[];
	unrouted: Unrouted[];
	/** Terminals left unreached, for comparing attempts. */
	missed: number;
}
