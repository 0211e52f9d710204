/**
 * What generators produce: electrode drafts without ids (the insert command allocates them) keyed
 * by a stable part key ('a', 'g2', 'c1.dp', 'bar3'), bundled with the generator kind and the full,
 * resolved parameters so the group can be regenerated later.
 */
import type { Contour, ElectrodeKind } from '../design/schema';

export type GeneratorParamValue = number | string | boolean;
export type GeneratorParams = Record<string, GeneratorParamValue>;

export interface ElectrodeDraft {
	/** Stable key of this part within its generator ('a', 'dp', 'c2.g1', 'bar4'). */
	readonly key: string;
	readonly name: string;
	readonly kind: ElectrodeKind;
	readonly outline: Contour;
	readonly holes: readonly Contour[];
}

export interface GeneratedGroup {
	readonly kind: string;
	readonly params: GeneratorParams;
	/** Default group name, e.g. "7-segment digit". */
	readonly name: string;
	/** Prefix for the group id, e.g. "digit" gives digit1, digit2, … */
	readonly idPrefix: string;
	readonly parts: readonly ElectrodeDraft[];
}

/**
 * A generator refused its parameters. `param` names the parameter at fault when there is one
 * (e.g. `gap_mm`), and `reason` says what is wrong with it in words a form can show beside the
 * field (e.g. "expected a number above 0"); `message` is the whole sentence for logs and the CLI.
 */
export class GlyphError extends Error {
	readonly param: string | null;
	readonly reason: string;
	constructor(message: string, options: { param?: string; reason?: string } = {}) {
		super(message);
		this.name = 'GlyphError';
		this.param = options.param ?? null;
		this.reason = options.reason ?? message;
	}
}
