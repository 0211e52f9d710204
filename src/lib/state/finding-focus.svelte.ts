/**
 * A request to show what a finding is about: the analysis side asks, the editor selects the
 * electrodes and zooms to the location. Each request carries a serial so asking twice for the
 * same finding zooms again.
 */
import { getContext, setContext } from 'svelte';
import type { Finding } from '$lib/core/findings/finding';

export interface FocusRequest {
	serial: number;
	electrodes: readonly string[];
	location: Finding['location'];
}

export class FindingFocus {
	request = $state.raw<FocusRequest | null>(null);
	#serial = 0;

	show(finding: Finding) {
		this.#serial += 1;
		this.request = {
			serial: this.#serial,
			electrodes: finding.electrodes,
			location: finding.location
		};
	}
}

const KEY = Symbol('finding-focus');
export const setFindingFocus = (focus: FindingFocus) => setContext(KEY, focus);
export const getFindingFocus = () => getContext<FindingFocus | undefined>(KEY);
