/** Finding codes of the electrical load estimate, with their meaning. */
import type { FindingCode } from './codes';

export const LOAD_CODES: readonly FindingCode[] = [
	{
		code: 'load.rc-too-slow',
		meaning: 'a trace and its pixel charge too slowly: τ = RC over a quarter of the settling window'
	},
	{
		code: 'load.rc-marginal',
		meaning: 'a trace and its pixel settle, but τ = RC exceeds a tenth of the settling window'
	},
	{
		code: 'load.current-over-budget',
		meaning: 'the drive current exceeds the budget somewhere in the temperature range'
	},
	{ code: 'load.trace-unknown-electrode', meaning: 'a trace names an electrode the design lacks' },
	{ code: 'load.nothing-driven', meaning: 'no electrode is assigned, so there is no load to rate' },
	{ code: 'load.model-failed', meaning: "the fluid's permittivity could not be evaluated" },
	{ code: 'load.ok', meaning: 'the drive current and every known trace are within their limits' }
];
