/**
 * The published minimums shown beside the threshold model, each with its source:
 * - character height: 16′ minimum, 20–22′ preferred (ISO 9241-3, now 9241-303; NUREG-0700 Rev. 2/3);
 * - luminance contrast ratio: 3:1 minimum (ISO 9241-3), 6:1–10:1 recommended (ISO 9241-3;
 *   NUREG-0700 Rev. 3 asks 6:1 minimum, ambient reflections included);
 * - ghosts: off segments more than ≈ 1 ΔE00 from the background can be seen side by side
 *   [common practice: a just-noticeable difference of about 1 ΔE00].
 */
export interface PublishedLimit {
	value: number;
	unit: string;
	source: string;
}

export const CHARACTER_HEIGHT_MIN: PublishedLimit = {
	value: 16,
	unit: 'arcmin',
	source: 'ISO 9241-3; NUREG-0700 Rev. 3 (minimum)'
};
export const CHARACTER_HEIGHT_PREFERRED: PublishedLimit = {
	value: 20,
	unit: 'arcmin',
	source: 'ISO 9241-3; NUREG-0700 Rev. 3 (20–22′ preferred)'
};
export const CONTRAST_RATIO_MIN: PublishedLimit = {
	value: 3,
	unit: ':1',
	source: 'ISO 9241-3 (minimum)'
};
export const CONTRAST_RATIO_RECOMMENDED: PublishedLimit = {
	value: 6,
	unit: ':1',
	source: 'ISO 9241-3 (6:1–10:1 recommended); NUREG-0700 Rev. 3'
};
export const GHOST_DELTA_E00: PublishedLimit = {
	value: 1,
	unit: 'ΔE00',
	source: 'common practice: a just-noticeable difference'
};

export const PUBLISHED_LIMITS = [
	CHARACTER_HEIGHT_MIN,
	CHARACTER_HEIGHT_PREFERRED,
	CONTRAST_RATIO_MIN,
	CONTRAST_RATIO_RECOMMENDED,
	GHOST_DELTA_E00
] as const;
