/**
 * Editor speed in Chromium with a 300-electrode design: frame times while dragging a selection
 * (from requestAnimationFrame timestamps) and click-to-selection latency (from the pointerdown
 * event's time stamp to the editor's `editor:selection-drawn` performance mark, and to the frame
 * that presents it). Prints medians and 95th percentiles. Not a test: it prints, it never fails.
 *
 * Needs a production build first: `npm run build && npm run bench:editor`. Starts
 * `node build/index.js` on a free port and stops it at the end.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import { chromium, type Page } from '@playwright/test';
import { serializeDesign } from '../src/lib/core/design/parse-design';
import { benchDesign, BENCH_ELECTRODES } from './editor-design';
import {
	installProbes,
	readClicks,
	readFrames,
	readMoves,
	startFrames,
	stopFrames
} from './editor-probes';

const CHROMIUM_ARGS = [
	'--disable-background-networking',
	'--disable-component-update',
	'--disable-sync',
	'--no-first-run',
	'--disable-quic',
	'--disable-gpu',
	'--no-sandbox'
];

function freePort(): Promise<number> {
	return new Promise((resolve, reject) => {
		const server = createServer();
		server.once('error', reject);
		server.listen(0, '127.0.0.1', () => {
			const address = server.address();
			const port = typeof address === 'object' && address ? address.port : 0;
			server.close(() => resolve(port));
		});
	});
}

async function startServer(port: number): Promise<ChildProcess> {
	const child = spawn(process.execPath, ['build/index.js'], {
		env: { ...process.env, PORT: String(port), HOST: '127.0.0.1' },
		stdio: 'ignore'
	});
	for (let i = 0; i < 100; i++) {
		try {
			if ((await fetch(`http://127.0.0.1:${port}/`)).ok) return child;
		} catch {
			/* not up yet */
		}
		await new Promise((r) => setTimeout(r, 100));
	}
	child.kill();
	throw new Error('the app server did not start within 10 s');
}

const quantile = (values: number[], q: number) => {
	const s = [...values].sort((a, b) => a - b);
	return s.length ? s[Math.min(s.length - 1, Math.floor(q * (s.length - 1) + 0.5))] : NaN;
};

async function centreOf(page: Page, id: string) {
	const box = await page.locator(`[data-electrode="${id}"]`).boundingBox();
	if (!box) throw new Error(`electrode ${id} is not on screen`);
	return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
}

async function dragFrames(page: Page, from: { x: number; y: number }, steps: number) {
	await page.mouse.move(from.x, from.y);
	await page.mouse.down();
	await startFrames(page);
	for (let i = 1; i <= steps; i++)
		await page.mouse.move(from.x + i * 1.5, from.y + Math.sin(i / 9) * 25);
	await stopFrames(page);
	await page.mouse.up();
	return { frames: await readFrames(page), moves: await readMoves(page) };
}

async function main() {
	if (!existsSync('build/index.js')) {
		console.error('No build found: run `npm run build` first.');
		process.exit(2);
	}
	const port = await freePort();
	const server = await startServer(port);
	const browser = await chromium.launch({
		executablePath: '/usr/bin/chromium',
		args: CHROMIUM_ARGS
	});
	const rows: string[][] = [];
	try {
		const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
		const errors: string[] = [];
		page.on('pageerror', (e) => errors.push(e.message));
		await page.goto(`http://127.0.0.1:${port}/`);
		await page.locator('[data-testid="editor-canvas"][data-ready="true"]').waitFor();
		await page.getByTestId('file-input').setInputFiles({
			name: 'bench-300.sunglyph.json',
			mimeType: 'application/json',
			buffer: Buffer.from(serializeDesign(benchDesign()))
		});
		await page.waitForFunction(
			(n) => document.querySelectorAll('[data-electrode]').length === n,
			BENCH_ELECTRODES
		);
		await page.waitForTimeout(1500);
		await installProbes(page);

		await startFrames(page);
		const targets = ['row1.c0.a', 'row2.c3.g', 'row3.c9.d', 'bars.bar7', 'row1.c5.dp', 'row2.c8.b'];
		for (let i = 0; i < 36; i++) {
			const at = await centreOf(page, targets[i % targets.length]);
			await page.mouse.move(at.x, at.y);
			await page.waitForTimeout(60); // as a hand would: the pointer rests before pressing
			await page.mouse.down();
			await page.mouse.up();
			await page.waitForTimeout(40);
		}
		await stopFrames(page);
		const clicks = (await readClicks(page)).slice(6); // the first round warms up the hit index
		const drawn = clicks.map((c) => c.drawn_ms);
		const shown = clicks.map((c) => c.frame_ms);
		rows.push([
			'click → selected and drawn',
			fmt(quantile(drawn, 0.5)),
			fmt(quantile(drawn, 0.95)),
			`${clicks.length} clicks (target < 16 ms)`
		]);
		rows.push([
			'click → frame that shows it',
			fmt(quantile(shown, 0.5)),
			fmt(quantile(shown, 0.95)),
			'adds the wait for the next 60 Hz frame'
		]);

		for (const [label, select] of [
			['drag 1 of 300 selected', 'one'],
			['drag 300 of 300 selected', 'all']
		] as const) {
			const grab = await centreOf(page, 'row2.c4.g');
			await page.keyboard.press('Escape');
			if (select === 'all') await page.keyboard.press('Control+a');
			const { frames, moves } = await dragFrames(page, grab, 150);
			await page.keyboard.press('Control+z');
			const intervals = frames.slice(1).map((t, i) => t - frames[i]);
			const median = quantile(intervals, 0.5);
			const p95 = quantile(intervals, 0.95);
			rows.push([
				`${label}: frame time`,
				fmt(median),
				fmt(p95),
				`${intervals.length} frames, ${fmt(1000 / median, 0)} fps median (target ≥ 50)`
			]);
			rows.push([
				`${label}: work per move`,
				fmt(quantile(moves, 0.5)),
				fmt(quantile(moves, 0.95)),
				`${moves.length} moves: event dispatch → canvas drawn (budget 20 ms)`
			]);
		}
		if (errors.length) console.log(`page errors:\n  ${errors.join('\n  ')}`);
	} finally {
		await browser.close();
		server.kill();
	}
	printTable(['measure (Chromium, 300 electrodes)', 'median ms', 'p95 ms', 'notes'], rows);
}

const fmt = (v: number, digits = 2) => (Number.isFinite(v) ? v.toFixed(digits) : '—');

function printTable(head: string[], rows: string[][]) {
	const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
	const line = (cells: string[]) =>
		cells
			.map((c, i) => (i === 0 || i === 3 ? c.padEnd(widths[i]) : c.padStart(widths[i])))
			.join('  ');
	console.log(line(head));
	console.log(widths.map((w) => '─'.repeat(w)).join('  '));
	for (const r of rows) console.log(line(r));
}

await main();
