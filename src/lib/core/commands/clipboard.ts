/**
 * The clipboard payload for copy and paste, within a design or between designs:
 * `{ format: 'sunglyph-clipboard', version: 1, electrodes, groups }`, validated on the way in with
 * the document's own zod schemas, plus the rules the schema cannot state (unique ids, members
 * that are in the payload). Only groups wholly inside the copied selection travel with it.
 */
import { z } from 'zod';
import type { Design, Electrode, Group } from '../design/schema';
import { electrodeSchema, groupSchema } from '../design/schema';
import { formatJsonPath, type DesignIssue } from '../design/issues';
import { selectedElectrodes } from './selection';

export const CLIPBOARD_FORMAT = 'sunglyph-clipboard';
export const CLIPBOARD_VERSION = 1;

export const clipboardSchema = z.strictObject({
	format: z.literal(CLIPBOARD_FORMAT),
	version: z.literal(CLIPBOARD_VERSION),
	electrodes: z.array(electrodeSchema).min(1, 'expected at least one electrode'),
	groups: z.array(groupSchema).default([])
});

export type ClipboardPayload = z.infer<typeof clipboardSchema>;

export function copySelection(design: Design, args: { ids: readonly string[] }): ClipboardPayload {
	const electrodes: Electrode[] = selectedElectrodes(design, args.ids);
	const copied = new Set(electrodes.map((e) => e.id));
	const groups: Group[] = design.groups.filter(
		(g) => g.members.length > 0 && g.members.every((m) => copied.has(m))
	);
	return { format: CLIPBOARD_FORMAT, version: CLIPBOARD_VERSION, electrodes, groups };
}

export const serializeClipboard = (payload: ClipboardPayload): string => JSON.stringify(payload);

function crossCheck(payload: ClipboardPayload): DesignIssue[] {
	const issues: DesignIssue[] = [];
	const ids = new Set<string>();
	payload.electrodes.forEach((e, i) => {
		if (ids.has(e.id))
			issues.push({ path: `electrodes[${i}].id`, message: `duplicate id "${e.id}"` });
		ids.add(e.id);
	});
	payload.groups.forEach((g, gi) =>
		g.members.forEach((m, mi) => {
			if (!ids.has(m))
				issues.push({
					path: `groups[${gi}].members[${mi}]`,
					message: `"${m}" is not in the clipboard`
				});
		})
	);
	return issues;
}

export type ClipboardParseResult =
	{ ok: true; payload: ClipboardPayload } | { ok: false; issues: DesignIssue[] };

export function parseClipboard(text: string): ClipboardParseResult {
	let raw: unknown;
	try {
		raw = JSON.parse(text);
	} catch {
		return {
			ok: false,
			issues: [
				{ path: '(root)', message: 'the clipboard does not hold sunglyph electrodes (not JSON)' }
			]
		};
	}
	const parsed = clipboardSchema.safeParse(raw);
	if (!parsed.success) {
		return {
			ok: false,
			issues: parsed.error.issues.map((i) => ({ path: formatJsonPath(i.path), message: i.message }))
		};
	}
	const issues = crossCheck(parsed.data);
	return issues.length > 0 ? { ok: false, issues } : { ok: true, payload: parsed.data };
}
