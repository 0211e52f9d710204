// Recovered work and a file opened afterwards: the notice goes with the recovered work, so its
// Discard can never replace the file just opened.
import { expect, test, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { afterAutosave, openApp } from './ready';

async function screenOf(page: Page, x_mm: number, y_mm: number) {
	const stage = page.getByTestId('editor-stage');
	const box = (await stage.boundingBox())!;
	const [scale, ox, oy] = (await stage.getAttribute('data-view'))!.split(' ').map(Number);
	return { x: box.x + ox + x_mm * scale, y: box.y + oy + y_mm * scale };
}
async function waitForEditor(page: Page) {
	await expect(page.locator('[data-testid="editor-canvas"][data-ready="true"]')).toHaveCount(1);
	await expect(page.locator('[data-autosave="on"]')).toHaveCount(1);
}

test('opening a file after a recovery retires the recovery notice', async ({ page: first }) => {
	let page = first;
	await openApp(page);
	await waitForEditor(page);
	await page.getByTestId('tool-oval').click();
	const from = await screenOf(page, 45, 36);
	const to = await screenOf(page, 48, 39);
	await afterAutosave(page, async () => {
		await page.mouse.move(from.x, from.y);
		await page.mouse.down();
		await page.mouse.move(to.x, to.y, { steps: 8 });
		await page.mouse.up();
		await expect(page.locator('[data-electrode]')).toHaveCount(54);
	});
	// A fresh tab is offered the unsaved work as recovered work.
	const fresh = await page.context().newPage();
	await page.close();
	page = fresh;
	await page.goto('/');
	await waitForEditor(page);
	await expect(page.getByTestId('recovered-notice')).toBeVisible();

	const other = JSON.parse(readFileSync('src/lib/core/design/demo-design.json', 'utf8'));
	other.name = 'Opened after recovery';
	await page.getByTestId('file-input').setInputFiles({
		name: 'opened.sunglyph.json',
		mimeType: 'application/json',
		buffer: Buffer.from(JSON.stringify(other))
	});
	await expect(page.getByTestId('design-name')).toHaveText('Opened after recovery');
	await expect(page.getByTestId('recovered-notice')).toHaveCount(0);
	await expect(page.locator('[data-electrode]')).toHaveCount(53);
});
