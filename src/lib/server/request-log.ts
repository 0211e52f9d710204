/**
 * One log line per request the app refuses (404 not found, 405 method not allowed, other 4xx):
 * status, method, path and the reason, with control characters removed and the path shortened
 * so a hostile URL cannot forge or flood log lines. Internal errors (5xx) keep their stack after
 * the line, since those are ours to fix.
 */

const MAX_PATH_CHARS = 200;

export interface RefusedRequest {
	status: number;
	method: string;
	path: string;
	reason: string;
}

function printable(text: string, maxChars: number): string {
	// eslint-disable-next-line no-control-regex
	const clean = text.replace(/[\u0000-\u001f\u007f-\u009f]/g, '?');
	return clean.length > maxChars ? `${clean.slice(0, maxChars)}…` : clean;
}

/** The single line logged for a refused request. */
export function refusedRequestLine(request: RefusedRequest): string {
	const method = printable(request.method, 16);
	const path = printable(request.path, MAX_PATH_CHARS);
	const reason = printable(request.reason, MAX_PATH_CHARS);
	return `${request.status} ${method} ${path}: ${reason}`;
}

/** Whether a status is the client's mistake (one line) rather than ours (line and stack). */
export function isRefusal(status: number): boolean {
	return status >= 400 && status < 500;
}
