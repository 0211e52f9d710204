import { execFileSync } from 'node:child_process';
import { readFile, mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import { Resvg } from '@resvg/resvg-js';
import { openApp } from './ready';

test('generate plates and traces, export, and the downloaded SVG renders like the CLI file', async ({
	page
}) => {
	test.setTimeout(180_000);
	await openApp(page);
	await page.getByTestId('view-glass').click();
	await expect(page.getByTestId('glass-panel')).toBeVisible();
	await page.getByTestId('glass-generate').click();
	await expect(page.getByTestId('glass-generate')).toHaveText('Generate plates and traces', {
		timeout: 120_000
	});
	await expect(page.getByTestId('glass-trace-count')).toContainText('traces');
	await expect(page.getByTestId('glass-verdict').locator('li').first()).toBeVisible();

	const downloads: { name: string; path: string }[] = [];
	page.on('download', async (d) =>
		downloads.push({ name: d.suggestedFilename(), path: (await d.path())! })
	);
	await page.getByTestId('glass-export-svg').click();
	await expect.poll(() => downloads.length, { timeout: 30_000 }).toBe(3);
	const composite = downloads.find((d) => d.name.endsWith('-composite.svg'))!;
	await expect.poll(async () => (await readFile(composite.path, 'utf8')).length).toBeGreaterThan(0);
	const svg = await readFile(composite.path, 'utf8');

	// resvg (@resvg/resvg-js) renders it at 10 px/mm: the glass size, with ink on it.
	const img = new Resvg(svg, { dpi: 254 }).render();
	expect([img.width, img.height]).toEqual([660, 420]);
	let inked = 0;
	for (let i = 3; i < img.pixels.length; i += 4) if (img.pixels[i] > 0) inked++;
	expect(inked).toBeGreaterThan(1000);

	// The same file, byte for byte, as `sunglyph export --generate` writes for the demo.
	const dir = await mkdtemp(join(tmpdir(), 'glass-'));
	const cli = (args: string[]) =>
		execFileSync('node', ['bin/sunglyph.js', ...args], { encoding: 'utf8' });
	await writeFile(join(dir, 'demo.json'), cli(['demo']));
	try {
		cli(['export', join(dir, 'demo.json'), '--out', dir, '--format', 'svg', '--generate']);
	} catch {
		// Exit 1 only says the glass check has failures; the files are written either way.
	}
	expect(svg).toBe(await readFile(join(dir, composite.name), 'utf8'));
});

for (const size of [
	{ width: 1024, height: 768 },
	{ width: 1440, height: 900 }
])
	test(`the glass panel fits at ${size.width}×${size.height}`, async ({ page }) => {
		await page.setViewportSize(size);
		await openApp(page);
		await page.getByTestId('view-glass').click();
		await expect(page.getByTestId('glass-panel')).toBeVisible();
		await page.screenshot({ path: `test-results/glass-${size.width}.png` });
		const panel = await page.getByTestId('glass-panel').boundingBox();
		expect(panel!.x + panel!.width).toBeLessThanOrEqual(size.width);
	});
