// The app server keeps running when files it listed at start-up vanish (the app rebuilt under
// it): a missing built asset is answered with 404 and later requests still succeed.
import { test, expect } from '@playwright/test';
import { spawn, type ChildProcess } from 'node:child_process';
import { cpSync, mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { TEST_BUILD_DIR } from '../../playwright.config';

interface Served {
	child: ChildProcess;
	origin: string;
	/** Everything the server wrote to stdout and stderr so far. */
	log: () => string;
}

function startServer(buildDir: string): Promise<Served> {
	const child = spawn('node', ['scripts/serve.js'], {
		env: { ...process.env, SUNGLYPH_BUILD_DIR: buildDir, PORT: '0', HOST: '127.0.0.1' },
		stdio: ['ignore', 'pipe', 'pipe']
	});
	let log = '';
	child.stderr!.on('data', (chunk) => (log += chunk));
	return new Promise((done, fail) => {
		let out = '';
		child.stdout!.on('data', (chunk) => {
			out += chunk;
			log += chunk;
			const match = /http:\/\/127\.0\.0\.1:(\d+)\//.exec(out);
			if (match) done({ child, origin: `http://127.0.0.1:${match[1]}`, log: () => log });
		});
		child.on('exit', (code) => fail(new Error(`server exited with ${code}`)));
	});
}

test('a built asset removed under the running server gives 404, not a crash', async () => {
	// Inside the project, so the server's chunks resolve their packages from node_modules.
	mkdirSync('test-results', { recursive: true });
	const copy = resolve(mkdtempSync(join('test-results', 'served-build-')));
	cpSync(resolve(TEST_BUILD_DIR), copy, { recursive: true });
	const { child, origin } = await startServer(copy);
	let exited = false;
	child.on('exit', () => (exited = true));
	try {
		const chunkDir = join(copy, 'client/_app/immutable/chunks');
		const name = readdirSync(chunkDir).find((f) => f.endsWith('.js'))!;
		const url = `${origin}/_app/immutable/chunks/${name}`;
		const before = await fetch(url, { headers: { 'accept-encoding': 'br' } });
		expect(before.status).toBe(200);
		await before.arrayBuffer();

		for (const suffix of ['', '.br', '.gz']) rmSync(join(chunkDir, name + suffix), { force: true });
		const gone = await fetch(url, { headers: { 'accept-encoding': 'br, gzip' } });
		expect(gone.status).toBe(404);
		await gone.arrayBuffer();

		// Only the compressed twin missing: the plain file is sent instead.
		const other = readdirSync(chunkDir).find((f) => f.endsWith('.js') && f !== name)!;
		rmSync(join(chunkDir, other + '.br'), { force: true });
		const plain = await fetch(`${origin}/_app/immutable/chunks/${other}`, {
			headers: { 'accept-encoding': 'br' }
		});
		expect(plain.status).toBe(200);
		expect((await plain.text()).length).toBeGreaterThan(0);

		const page = await fetch(`${origin}/`);
		expect(page.status).toBe(200);
		await new Promise((r) => setTimeout(r, 200));
		expect(exited).toBe(false);
	} finally {
		child.kill();
		rmSync(copy, { recursive: true, force: true });
	}
});

test('each refused request is logged as one line, without a stack trace', async () => {
	const { child, origin, log } = await startServer(resolve(TEST_BUILD_DIR));
	try {
		const refused: [string, string, number][] = [
			['GET', '/no-such-page', 404],
			['POST', '/', 405],
			['DELETE', '/no-such-page', 404],
			['GET', '/_app/immutable/chunks/no-such-chunk.js', 404]
		];
		for (const [method, path, status] of refused) {
			const response = await fetch(origin + path, { method });
			expect(response.status, `${method} ${path}`).toBe(status);
			await response.arrayBuffer();
		}
		await expect
			.poll(
				() =>
					log()
						.split('\n')
						.filter((l) => /^40[45] /.test(l)).length
			)
			.toBe(4);
		const lines = log()
			.split('\n')
			.filter((l) => l.trim() !== '' && !l.includes('sunglyph is running'));
		expect(lines).toEqual([
			'404 GET /no-such-page: Not found: /no-such-page',
			expect.stringMatching(/^405 POST \/: .+/),
			'404 DELETE /no-such-page: Not found: /no-such-page',
			'404 GET /_app/immutable/chunks/no-such-chunk.js: no such file'
		]);
		expect(log()).not.toMatch(/^\s+at /m);
	} finally {
		child.kill();
	}
});
