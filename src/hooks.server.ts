/**
 * Server-side error hook: a refused request (404, 405 …) is logged as one line, an internal error
 * as one line followed by its stack. The page shows only the status message either way.
 */
import type { HandleServerError } from '@sveltejs/kit';
import { isRefusal, refusedRequestLine } from '$lib/server/request-log';

export const handleError: HandleServerError = ({ error, event, status, message }) => {
	const line = refusedRequestLine({
		status,
		method: event.request.method,
		path: event.url.pathname,
		reason: error instanceof Error && error.message ? error.message : message
	});
	if (isRefusal(status)) console.warn(line);
	else console.error(line, error instanceof Error && error.stack ? `\n${error.stack}` : '');
	return { message };
};
