/**
 * The glass drawing as a designer uses it: open the demo, route plates and traces in the worker
 * (the page stays usable and shows that it is working), export the SVG artwork, and check the
 * downloaded files render (resvg, the `@resvg/resvg-js` package, and the browser's own image
 * decoder) and are byte for byte what `sunglyph export` writes for the same design. Then drag a
 * trace point by hand, see the glass check follow, and take it back with Ctrl+Z.
 */
import { expect, test, type Page } from '@playwright/test';
import { Resvg } from '@resvg/resvg-js';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { dragLeadIntoDigits, seg1Corner } from './ghost-lead';

async function openGlassTab(page: Page) {
	await page.goto('/');
	// hydration can take a while on a busy machine
	await expect(page.locator('[data-hydrated="true"]')).toBeVisible({ timeout: 30_000 });
	await page.getByTestId('view-glass').click();
	await expect(page.getByTestId('glass-panel')).toBeVisible();
}

/** Routes the demo's plates and traces in the app and waits for the one undoable step. */
async function generateInApp(page: Page) {
	await page.getByTestId('glass-generate').click();
	await expect(page.getByTestId('status')).toContainText('Undo: Generate plates and traces', {
		timeout: 90_000
	});
	await expect(page.getByTestId('glass-plan')).toHaveAttribute('data-state', 'idle');
}

/** Counts pixels resvg paints (alpha > 0) in an SVG rendered 800 px wide. */
function paintedPixels(svg: string): { width: number; height: number; painted: number } {
	const image = new Resvg(svg, { fitTo: { mode: 'width', value: 800 } }).render();
	// `pixels` copies the buffer on every read: take it once
	const pixels = image.pixels;
	let painted = 0;
	for (let i = 3; i < pixels.length; i += 4) if (pixels[i] > 0) painted++;
	return { width: image.width, height: image.height, painted };
}

test('routes plates and traces off the main thread, exports SVG that renders and matches the CLI', async ({
	page
}) => {
	test.setTimeout(120_000);
	await openGlassTab(page);
	// a wider trace makes the new routing differ from the demo's stored one
	await page.getByTestId('glass-trace-width').fill('0.12');
	await page.getByTestId('glass-trace-width').press('Enter');
	await page.getByTestId('glass-generate').click();
	await expect(page.getByTestId('glass-routing')).toBeVisible();
	// the page answers while the worker routes: another tab opens and comes back
	await page.getByTestId('view-rules').click();
	await page.getByTestId('view-glass').click();
	await expect(page.getByTestId('status')).toContainText('Undo: Generate plates and traces', {
		timeout: 90_000
	});
	await expect(page.getByTestId('glass-plan')).toHaveAttribute('data-state', 'idle');
	await expect(page.getByTestId('glass-plan-error')).toHaveCount(0);
	await expect(page.getByTestId('glass-trace-count')).toHaveText(/^[1-9]\d* traces, \d+ ghosts?$/);

	const downloads: { name: string; text: string }[] = [];
	page.on('download', async (d) =>
		downloads.push({ name: d.suggestedFilename(), text: readFileSync(await d.path(), 'utf8') })
	);
	await page.getByTestId('glass-export-svg').click();
	await expect.poll(() => downloads.length, { timeout: 20_000 }).toBe(3);
	const svgs = downloads.filter((d) => d.name.endsWith('.svg'));
	expect(svgs.map((d) => d.name).sort()).toEqual([
		expect.stringMatching(/-common\.svg$/),
		expect.stringMatching(/-composite\.svg$/),
		expect.stringMatching(/-segment\.svg$/)
	]);
	for (const svg of svgs) {
		const render = paintedPixels(svg.text);
		expect(render.width, svg.name).toBe(800);
		expect(render.height, svg.name).toBeGreaterThan(0);
		expect(render.painted, svg.name).toBeGreaterThan(1000);
		const natural = await page.evaluate(async (text) => {
			const img = new Image();
			img.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(text)}`;
			await img.decode();
			return { width: img.naturalWidth, height: img.naturalHeight };
		}, svg.text);
		expect(natural.width, svg.name).toBeGreaterThan(0);
		expect(natural.height, svg.name).toBeGreaterThan(0);
	}

	// the same design through the command line gives the very same bytes
	const saved = page.waitForEvent('download');
	await page.getByTestId('save-file').click();
	const designPath = await (await saved).path();
	const out = mkdtempSync(join(tmpdir(), 'glass-export-'));
	const cli = spawnSync(
		process.execPath,
		['bin/sunglyph.js', 'export', designPath, '--out', out, '--format', 'svg'],
		{ encoding: 'utf8' }
	);
	// 0: the glass check passes, 1: it fails; both mean the files were written
	expect([0, 1], cli.stderr).toContain(cli.status);
	expect(readdirSync(out).sort()).toEqual(svgs.map((d) => d.name).sort());
	for (const svg of svgs)
		expect(readFileSync(join(out, svg.name), 'utf8'), svg.name).toBe(svg.text);
});

test('a trace point dragged by hand changes the glass check, and Ctrl+Z takes it back', async ({
	page
}) => {
	test.setTimeout(150_000);
	const corner = seg1Corner();
	await openGlassTab(page);
	await generateInApp(page);
	const count = page.getByTestId('glass-trace-count');
	const before = (await count.textContent())!;

	// a corner of SEG1's lead, dragged into the middle of the digits
	await dragLeadIntoDigits(page, corner);
	await expect(page.getByTestId('tool-options')).toContainText('1 point selected');
	// the lead now crosses other commons' back plates in the viewing area: more ghosts
	await expect(count).not.toHaveText(before);
	const ghosts = (text: string) => Number(/(\d+) ghost/.exec(text)![1]);
	expect(ghosts((await count.textContent())!)).toBeGreaterThan(ghosts(before));

	await page.keyboard.press('Control+z');
	await expect(count).toHaveText(before);
	await expect(page.getByTestId('status')).toContainText('Undo: Generate plates and traces');
});

test('clicking a ghost finding shows the plates, zooms to it and picks the lead causing it', async ({
	page
}) => {
	test.setTimeout(150_000);
	const corner = seg1Corner();
	await openGlassTab(page);
	await generateInApp(page);
	// The generated drawing has no ghost: make one by hand, then hide the plates and let the
	// finding bring them back.
	await dragLeadIntoDigits(page, corner);
	await page.getByTestId('tool-pick').click();
	await page.getByTestId('glass-show-plates').uncheck();
	await expect(page.getByTestId('glass-show-plates')).not.toBeChecked();
	const zoom = await page.getByTestId('editor-stage').getAttribute('data-view');
	await page
		.getByTestId('glass-verdict')
		.locator('li[data-code="glass.ghost-visible"] button')
		.first()
		.click();
	await expect(page.getByTestId('glass-show-plates')).toBeChecked();
	await expect(page.getByTestId('editor-stage')).toHaveAttribute('data-tool', 'points');
	await expect(page.getByTestId('tool-options')).toContainText(/[1-9]\d* points? selected/);
	await expect(page.getByTestId('editor-stage')).not.toHaveAttribute('data-view', zoom!);
});
