/**
 * The editable design-rule limits, each declared once: label, unit, the range the document
 * schema accepts (`design/rules-schema.ts`; a test keeps the two in step) and the input step.
 * The app's rules panel and any other editor loop over this list. Units: millimetres and
 * arcminutes.
 */
import type { DesignRules } from '../design/rules-schema';

export interface RuleLimit {
	key: keyof DesignRules;
	label: string;
	unit: 'mm' | 'arcmin';
	min: number;
	max: number;
	step: number;
	/** What the limit guards, in a few words for a tooltip. */
	hint: string;
}

export const RULE_LIMITS: readonly RuleLimit[] = [
	{
		key: 'minGap_mm',
		label: 'Minimum gap',
		unit: 'mm',
		min: 0.001,
		max: 10,
		step: 0.005,
		hint: 'between electrodes of one plate (common practice 0.05 mm, 0.03 mm possible)'
	},
	{
		key: 'minWidth_mm',
		label: 'Minimum width',
		unit: 'mm',
		min: 0.001,
		max: 10,
		step: 0.005,
		hint: 'of any part of an electrode'
	},
	{
		key: 'edgeMargin_mm',
		label: 'Glass edge margin',
		unit: 'mm',
		min: 0,
		max: 50,
		step: 0.1,
		hint: 'from every electrode to the glass edge (common practice 1.5–2.0 mm)'
	},
	{
		key: 'minCharacterHeight_arcmin',
		label: 'Minimum character height',
		unit: 'arcmin',
		min: 0.001,
		max: 600,
		step: 1,
		hint: 'as seen from the viewing distance (ISO 9241-3: 16′ minimum)'
	},
	{
		key: 'minStroke_arcmin',
		label: 'Minimum stroke',
		unit: 'arcmin',
		min: 0.001,
		max: 600,
		step: 0.5,
		hint: 'stroke width as seen from the viewing distance'
	}
];
