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
import { parseDesignText } from '../../src/lib/core/design/parse-design';
import { planGlass } from '../../src/lib/core/glass/plan-glass';

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

/** The routing the app's worker computes for the demo (the same core function, deterministic). */
function demoPlan() {
	const parsed = parseDesignText(readFileSync('src/lib/core/design/demo-design.json', 'utf8'));
	if (!parsed.ok) throw new Error('the demo design does not parse');
	return { design: parsed.design, plan: planGlass(parsed.design) };
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
	const { design, plan } = demoPlan();
	const seg1 = design.segmentLines.find((l) => l.name === 'SEG1')!;
	const lead = plan.glassArt.traces.find(
		(t) => t.plate === 'segment' && t.net === seg1.id && t.points.length >= 3
	)!;
	expect(lead).toBeDefined();
	const corner = lead.points[1];
	await openGlassTab(page);
	await generateInApp(page);
	await page.getByTestId('glass-show-plates').check();
	await page.getByTestId('tool-points').click();
	const count = page.getByTestId('glass-trace-count');
	const before = (await count.textContent())!;

	// a corner of SEG1's lead, dragged into the middle of the digits
	const stage = page.getByTestId('editor-stage');
	const [scale, offsetX, offsetY] = (await stage.getAttribute('data-view'))!.split(' ').map(Number);
	const box = (await stage.boundingBox())!;
	const at = (x_mm: number, y_mm: number) => ({
		x: box.x + offsetX + x_mm * scale,
		y: box.y + offsetY + y_mm * scale
	});
	const from = at(corner.x, corner.y);
	const to = at(22, 17);
	await page.mouse.move(from.x, from.y);
	await page.mouse.down();
	for (let k = 1; k <= 8; k++)
		await page.mouse.move(from.x + ((to.x - from.x) * k) / 8, from.y + ((to.y - from.y) * k) / 8);
	await page.mouse.up();

	await expect(page.getByTestId('status')).toContainText('Undo: Move point');
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
	await openGlassTab(page);
	await generateInApp(page);
	// Generating shows the plates; hide them to see the finding bring them back.
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
