/**
 * Starting points for a new design: a blank glass (the demo's glass, drive, cell and rules with no
 * electrodes, four commons and no segment lines) or the demo itself as a worked example.
 */
import { demoDesign } from './demo';
import type { Design } from './schema';

export type TemplateId = 'blank' | 'demo';

export const TEMPLATES: readonly { id: TemplateId; label: string }[] = [
	{ id: 'blank', label: 'Blank glass (4 commons, no electrodes)' },
	{ id: 'demo', label: 'Worked example: garden-water timer' }
];

export function designFromTemplate(template: TemplateId, name: string): Design {
	const demo = demoDesign();
	if (template === 'demo') return { ...demo, name };
	return {
		...demo,
		name,
		commons: [1, 2, 3, 4].map((n) => ({ id: `com${n}`, name: `COM${n}` })),
		segmentLines: [],
		electrodes: [],
		groups: []
	};
}

/** A download file name from a design name: readable, no path or control characters. */
export function fileNameForDesign(name: string): string {
	const stem = name
		.normalize('NFC')
		// eslint-disable-next-line no-control-regex
		.replace(/[\u0000-\u001f\u007f-\u009f/\\:*?"<>|]+/g, ' ')
		.replace(/\s+/g, ' ')
		.trim()
		.replace(/^\.+/, '')
		.slice(0, 80)
		.trim();
	return `${stem || 'design'}.sunglyph.json`;
}
