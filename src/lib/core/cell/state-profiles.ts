/**
 * The director profiles behind a cell report's pixel states, kept beside the report (not in it:
 * the report stays plain data for JSON and the worker) so that a later model of the same states
 * (the oblique views of the legibility scenarios) need not solve them again. Keyed by the states
 * object itself; a copied report simply has none, and its user solves afresh.
 */
import type { DirectorProfile } from '../lc/profile';

export interface StateProfiles {
	background: DirectorProfile;
	off: DirectorProfile;
	on: DirectorProfile;
}

const profiles = new WeakMap<object, StateProfiles>();

export function rememberStateProfiles(states: object, solved: StateProfiles): void {
	profiles.set(states, solved);
}

export function stateProfilesOf(states: object): StateProfiles | undefined {
	return profiles.get(states);
}
