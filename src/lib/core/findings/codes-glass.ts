/** Finding codes of the glass drawing (plates, leads, ghosts, ledge), with their meaning. */
import type { FindingCode } from './codes';

export const GLASS_CODES: readonly FindingCode[] = [
	{ code: 'glass.ok', meaning: 'both plates are connected, apart and free of visible ghosts' },
	{
		code: 'glass.margin-reduced',
		meaning: "a back plate's overlap margin is cut below the setting next to another common"
	},
	{
		code: 'glass.commons-touch',
		meaning: 'two commons cannot be kept the minimum gap apart: their electrodes are too close'
	},
	{ code: 'glass.no-route', meaning: 'no lead could be routed to these electrodes or pads' },
	{ code: 'glass.open', meaning: 'an electrode, transfer point or pad has no path to its pad' },
	{ code: 'glass.short', meaning: 'conductors of two nets touch on one plate' },
	{
		code: 'glass.gap-too-small',
		meaning: 'a lead comes closer to another net than the minimum gap'
	},
	{
		code: 'glass.ghost-visible',
		meaning: 'a lead over a foreign plate lights inside the viewing area'
	},
	{
		code: 'glass.ghost-hidden',
		meaning: 'a lead over a foreign plate switches outside the viewing area, behind the bezel'
	},
	{ code: 'glass.ghost-under-seal', meaning: 'a plate overlap lies under the seal, with no fluid' },
	{
		code: 'glass.ghost-idle',
		meaning: 'a plate overlap crosses a (common, line) pair no electrode uses, so it stays dark'
	},
	{ code: 'glass.bad-outline', meaning: 'an electrode outline crosses itself or has no area' },
	{ code: 'glass.off-glass', meaning: "an electrode lies outside the seal's inner edge" },
	{ code: 'glass.ledge-short', meaning: 'the contact ledge is shallower than the connector needs' },
	{ code: 'glass.pitch-connector', meaning: "the pin pitch does not suit the ledge's connector" },
	{ code: 'glass.pins-off-ledge', meaning: 'the pads do not fit along the ledge at this pitch' }
];
