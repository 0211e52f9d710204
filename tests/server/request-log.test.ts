// A refused request is logged as exactly one printable line (common practice for server access
// and error logs: one event per line, so a log reader or a grep counts requests correctly).
import { describe, expect, it } from 'vitest';
import { isRefusal, refusedRequestLine } from '../../src/lib/server/request-log';

describe('refused-request log line', () => {
	it('names status, method, path and reason on one line', () => {
		expect(
			refusedRequestLine({ status: 404, method: 'GET', path: '/nope', reason: 'Not found: /nope' })
		).toBe('404 GET /nope: Not found: /nope');
	});

	it('cannot be split into forged lines by control characters', () => {
		const line = refusedRequestLine({
			status: 404,
			method: 'GET',
			path: '/a\n200 GET /admin',
			reason: 'x\r\ny'
		});
		expect(line.split(/\r|\n/)).toHaveLength(1);
		expect(line).toBe('404 GET /a?200 GET /admin: x??y');
	});

	it('shortens a very long path', () => {
		const line = refusedRequestLine({
			status: 404,
			method: 'GET',
			path: '/' + 'a'.repeat(5000),
			reason: 'Not found'
		});
		expect(line.length).toBeLessThan(450);
		expect(line).toContain('…');
	});

	it('treats 4xx as refusals and 5xx as internal errors', () => {
		expect([400, 404, 405, 499].map(isRefusal)).toEqual([true, true, true, true]);
		expect([200, 302, 500, 503].map(isRefusal)).toEqual([false, false, false, false]);
	});
});
