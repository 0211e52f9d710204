/**
 * At 1024×768 the status bar wraps onto a second line once it names the last edit and the time it
 * was kept; the drawing, its rulers and the status bar must then still share the height without
 * one lying over the other.
 */
import { expect, test } from '@playwright/test';
import { openApp } from './ready';

test.use({ viewport: { width: 1024, height: 768 } });

test('the drawing gives way when the status bar wraps', async ({ page }) => {
	await openApp(page);
	const status = page.getByTestId('status');
	const stage = page.getByTestId('editor-stage');
	const oneLine = (await status.boundingBox())!.height;
	await page.locator('[data-electrode="d1a"]').click();
	await page.keyboard.press('ArrowRight');
	await expect(status).toContainText('Undo: Nudge');
	await expect.poll(async () => (await status.boundingBox())!.height).toBeGreaterThan(oneLine);
	await expect
		.poll(async () => {
			const s = (await stage.boundingBox())!;
			return s.y + s.height - (await status.boundingBox())!.y;
		})
		.toBeLessThanOrEqual(0.5);
	for (const canvas of await page.locator('canvas').all()) {
		const c = (await canvas.boundingBox())!;
		expect(c.y + c.height).toBeLessThanOrEqual((await status.boundingBox())!.y + 0.5);
	}
});
