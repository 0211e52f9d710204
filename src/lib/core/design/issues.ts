/**
 * A problem found in a design document, located by a JSON path such as `electrodes[3].outline`.
 */
export interface DesignIssue {
	path: string;
	message: string;
}

/** Formats a path of keys and indices as `a.b[3].c`; the empty path is `(root)`. */
export function formatJsonPath(path: readonly PropertyKey[]): string {
	let text = '';
	for (const key of path) {
		if (typeof key === 'number') text += `[${key}]`;
		else text += text === '' ? String(key) : `.${String(key)}`;
	}
	return text === '' ? '(root)' : text;
}

export function formatIssue(issue: DesignIssue): string {
	return `${issue.path}: ${issue.message}`;
}

export class DesignError extends Error {
	readonly issues: DesignIssue[];
	constructor(issues: DesignIssue[]) {
		super(issues.map(formatIssue).join('\n'));
		this.name = 'DesignError';
		this.issues = issues;
	}
}
