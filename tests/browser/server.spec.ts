// The app server keeps running when files it listed at start-up vanish (the app rebuilt under
// it): a missing built asset is answered with 404 and later requests still succeed.
import { test, expect } from '@playwright/test';
import { spawn, type ChildProcess } from 'node:child_process';
import { cpSync, mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { TEST_BUILD_DIR } from '../../playwright.config';

function startServer(buildDir: string): Promise<{ child: ChildProcess; origin: string }> {
	const child = spawn('node', ['scripts/serve.js'], {
		env: { ...process.env, SUNGLYPH_BUILD_DIR: buildDir, PORT: '0', HOST: '127.0.0.1' },
		stdio: ['ignore', 'pipe', 'pipe']
	});
	return new Promise((done, fail) => {
		let out = '';
		child.stdout!.on('data', (chunk) => {
			out += chunk;
			const match = /http:\/\/127\.0\.0\.1:(\d+)\//.exec(out);
			if (match) done({ child, origin: `http://127.0.0.1:${match[1]}` });
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
