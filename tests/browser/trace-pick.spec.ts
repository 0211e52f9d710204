/**
 * Traces of the glass drawing pick like electrodes: generate the demo's plates and traces, click
 * a lead with the pick tool, see it selected with its plate, net, width and point count, change
 * its width (one undo step), take it back; Delete removes it and undo brings it back.
 */
import { expect, test } from '@playwright/test';
import { demoFromFile, seg1Lead } from './demo-file';

test('a trace picked on the drawing shows its properties, takes a new width, and undo restores it', async ({
	page
}) => {
	test.setTimeout(150_000);
	// The routing the app's worker computes for the demo (the same core function, deterministic).
	const design = demoFromFile();
	const lead = seg1Lead(design, 2);
	// the middle of its longest run outside the viewing area, where no electrode lies over it
	const va = design.glass.viewingArea;
	const outside = (p: { x: number; y: number }) =>
		p.x < va.x_mm || p.y < va.y_mm || p.x > va.x_mm + va.width_mm || p.y > va.y_mm + va.height_mm;
	const runs = lead.points.slice(1).map((b, i) => {
		const a = lead.points[i];
		return {
			middle: { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 },
			length: Math.hypot(b.x - a.x, b.y - a.y)
		};
	});
	const { middle } = runs.filter((r) => outside(r.middle)).sort((p, q) => q.length - p.length)[0];

	await page.goto('/');
	await expect(page.locator('[data-hydrated="true"]')).toBeVisible({ timeout: 30_000 });
	await page.getByTestId('view-glass').click();
	await page.getByTestId('glass-generate').click();
	const status = page.getByTestId('status');
	await expect(status).toContainText('Undo: Generate plates and traces', { timeout: 90_000 });
	await expect(page.getByTestId('glass-show-plates')).toBeChecked();
	await page.getByTestId('tool-pick').click();

	const stage = page.getByTestId('editor-stage');
	const [scale, offsetX, offsetY] = (await stage.getAttribute('data-view'))!.split(' ').map(Number);
	const box = (await stage.boundingBox())!;
	await page.mouse.click(box.x + offsetX + middle.x * scale, box.y + offsetY + middle.y * scale);

	const props = page.getByTestId('trace-properties');
	await expect(props).toBeVisible();
	await expect(props).toHaveAttribute('data-trace', lead.id);
	await expect(page.getByTestId('properties')).toContainText('trace');
	await expect(page.getByTestId('status')).toContainText('1 trace selected');
	await expect(page.getByTestId('trace-plate')).toHaveText('segment');
	await expect(page.getByTestId('trace-net')).toHaveText('SEG1');
	await expect(page.getByTestId('trace-points')).toHaveText(String(lead.points.length));
	const width = page.getByTestId('trace-width');
	expect(Number(await width.inputValue())).toBeCloseTo(lead.width_mm, 6);

	await width.fill('0.2');
	await width.press('Enter');
	await expect(status).toContainText('Undo: Trace width');
	await expect.poll(async () => Number(await width.inputValue())).toBeCloseTo(0.2, 6);

	await page.getByTestId('action-undo').click();
	await expect(status).toContainText('Undo: Generate plates and traces');
	await expect.poll(async () => Number(await width.inputValue())).toBeCloseTo(lead.width_mm, 6);
	await expect(props).toHaveAttribute('data-trace', lead.id);

	// Delete removes the picked trace; undo brings it back
	await page.keyboard.press('Delete');
	await expect(status).toContainText('Undo: Delete trace');
	await expect(props).toHaveCount(0);
	await page.getByTestId('action-undo').click();
	await expect(status).toContainText('Undo: Generate plates and traces');

	// the panel's Remove button does the same
	await page.mouse.click(box.x + offsetX + middle.x * scale, box.y + offsetY + middle.y * scale);
	await expect(props).toHaveAttribute('data-trace', lead.id);
	await page.getByTestId('trace-delete').click();
	await expect(status).toContainText('Undo: Delete trace');
	await expect(props).toHaveCount(0);
});
