/**
 * The ghosts on the drawing always belong to the drawing on show: they come from the design
 * checks' worker for exactly that design (ghosts made by dragging a lead across a plate), so while an electrode is being dragged the plates are
 * drawn without ghosts, and once the edit lands the ghosts of the new drawing appear — as many as
 * the glass panel counts.
 */
import { expect, test, type Page } from '@playwright/test';
import { dragLeadIntoDigits, seg1Corner } from './ghost-lead';
import { demoFromFile } from './demo-file';

const ghostsInPanel = async (page: Page) =>
	Number(/(\d+) ghost/.exec((await page.getByTestId('glass-trace-count').textContent())!)![1]);

test('ghosts are drawn only for the drawing they were checked on', async ({ page }) => {
	test.setTimeout(150_000);
	const bar = demoFromFile().electrodes.find((e) => e.name === '1A')!;
	const centre = {
		x: bar.outline.reduce((s, p) => s + p.x, 0) / bar.outline.length,
		y: bar.outline.reduce((s, p) => s + p.y, 0) / bar.outline.length
	};

	await page.goto('/');
	await expect(page.locator('[data-hydrated="true"]')).toBeVisible({ timeout: 30_000 });
	await page.getByTestId('view-glass').click();
	await page.getByTestId('glass-generate').click();
	const status = page.getByTestId('status');
	await expect(status).toContainText('Undo: Generate plates and traces', { timeout: 90_000 });
	// The generated drawing has no ghost: make some by hand first.
	await dragLeadIntoDigits(page, seg1Corner());
	const canvas = page.getByTestId('editor-canvas');
	await expect(canvas).toHaveAttribute('data-ghosts', /^[1-9]\d*$/, { timeout: 30_000 });
	await expect(page.getByTestId('glass-check')).toHaveAttribute('aria-busy', 'false');
	const before = Number(await canvas.getAttribute('data-ghosts'));
	expect(before).toBe(await ghostsInPanel(page));

	await page.getByTestId('tool-pick').click();
	const stage = page.getByTestId('editor-stage');
	const [scale, offsetX, offsetY] = (await stage.getAttribute('data-view'))!.split(' ').map(Number);
	const box = (await stage.boundingBox())!;
	const from = { x: box.x + offsetX + centre.x * scale, y: box.y + offsetY + centre.y * scale };
	await page.mouse.move(from.x, from.y);
	await page.mouse.down();
	for (let k = 1; k <= 6; k++) await page.mouse.move(from.x + 6 * k, from.y + 4 * k);
	// mid-drag: the drawing has moved on, the last check does not describe it
	await expect(canvas).toHaveAttribute('data-ghosts', 'pending');
	await page.mouse.up();
	await expect(status).toContainText('Undo: Move');
	await expect(canvas).toHaveAttribute('data-ghosts', /^\d+$/, { timeout: 30_000 });
	await expect(page.getByTestId('glass-check')).toHaveAttribute('aria-busy', 'false');
	expect(Number(await canvas.getAttribute('data-ghosts'))).toBe(await ghostsInPanel(page));

	await page.getByTestId('action-undo').click();
	await expect(canvas).toHaveAttribute('data-ghosts', String(before), { timeout: 30_000 });
});
