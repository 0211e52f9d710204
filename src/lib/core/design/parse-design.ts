/**
 * Turns JSON text or a parsed value into a validated Design, or into a list of issues that each
 * name a JSON path. Nothing is half-applied: either the whole document is valid or no design is
 * returned.
 */
import { designSchema, type Design } from './schema';
import { formatJsonPath, type DesignIssue } from './issues';
import { migrateDocument, type MigrationTable } from './migrations';
import { checkReferences } from './references';
import { describeJsonError, formatJsonError } from './json-error';

export type ParseResult = { ok: true; design: Design } | { ok: false; issues: DesignIssue[] };

export function parseDesignValue(
	raw: unknown,
	options: { migrations?: MigrationTable } = {}
): ParseResult {
	const migrated = migrateDocument(raw, options);
	if (!migrated.ok)
		return { ok: false, issues: [{ path: migrated.path, message: migrated.message }] };
	const parsed = designSchema.safeParse(migrated.document);
	if (!parsed.success) {
		const issues = parsed.error.issues.map((issue) => ({
			path: formatJsonPath(issue.path),
			message: issue.message
		}));
		return { ok: false, issues };
	}
	const referenceIssues = checkReferences(parsed.data);
	if (referenceIssues.length > 0) return { ok: false, issues: referenceIssues };
	return { ok: true, design: parsed.data };
}

export function parseDesignText(text: string): ParseResult {
	let raw: unknown;
	try {
		// A byte-order mark left by an editor is not part of the JSON.
		raw = JSON.parse(text.startsWith('\uFEFF') ? text.slice(1) : text);
	} catch (error) {
		const place = formatJsonError(describeJsonError(text, error));
		return { ok: false, issues: [{ path: '(root)', message: `not valid JSON at ${place}` }] };
	}
	return parseDesignValue(raw);
}

/** Serialises a design as stable, human-diffable JSON. */
export function serializeDesign(design: Design): string {
	return JSON.stringify(design, null, '\t') + '\n';
}
