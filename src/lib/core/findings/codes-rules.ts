/** Finding codes of the design-rule check (geometry, placement, usage, character size). */
import type { FindingCode } from './codes';

export const RULE_CODES: readonly FindingCode[] = [
	{ code: 'rule.empty-design', meaning: 'the design has no electrodes, so nothing was checked' },
	{ code: 'rule.overlap', meaning: 'two electrodes of one plate overlap or touch: a short' },
	{ code: 'rule.min-gap', meaning: 'two electrodes are closer than the minimum gap' },
	{ code: 'rule.min-width', meaning: 'a part of an electrode is narrower than the minimum width' },
	{ code: 'rule.self-crossing', meaning: 'an outline or hole crosses or touches itself' },
	{ code: 'rule.zero-area', meaning: 'an electrode encloses no area' },
	{ code: 'rule.outside-glass', meaning: 'an electrode reaches beyond the glass' },
	{ code: 'rule.edge-margin', meaning: 'an electrode is closer to the glass edge than the margin' },
	{
		code: 'rule.outside-viewing-area',
		meaning: 'an electrode reaches outside the viewing area, behind the bezel'
	},
	{ code: 'rule.unused-common', meaning: 'a common that no electrode uses' },
	{ code: 'rule.unused-line', meaning: 'a segment line that no electrode uses' },
	{
		code: 'rule.character-small',
		meaning: 'characters subtend less than the minimum visual angle at the viewing distance'
	},
	{ code: 'rule.stroke-thin', meaning: 'character strokes subtend less than the minimum angle' },
	{ code: 'rule.character-size-ok', meaning: 'a character group is large enough to read' },
	{ code: 'rule.ok', meaning: 'every geometric rule passes' }
];
