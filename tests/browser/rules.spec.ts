import { expect, test, type Page } from '@playwright/test';
import { openApp } from './ready';

/** Screen position of a document point (mm), from the view the canvas reports. */
async function screenOf(page: Page, x_mm: number, y_mm: number) {
	const stage = page.getByTestId('editor-stage');
	const box = (await stage.boundingBox())!;
	const [scale, ox, oy] = (await stage.getAttribute('data-view'))!.split(' ').map(Number);
	return { x: box.x + ox + x_mm * scale, y: box.y + oy + y_mm * scale };
}

test('a narrowed gap shows up as a rule finding that selects and shows its electrodes', async ({
	page
}) => {
	const errors: string[] = [];
	page.on('pageerror', (e) => errors.push(e.message));
	await openApp(page);
	await expect(page.locator('[data-testid="editor-canvas"][data-ready="true"]')).toHaveCount(1);

	await page.getByTestId('view-rules').click();
	await expect(page.getByTestId('rules-findings').locator('[data-code="rule.ok"]')).toBeVisible();

	// The second moisture bar (12.8 … 17.0 mm) moved to 12.21 mm: 0.01 mm from the first.
	const bar2 = await screenOf(page, 14.9, 30.6);
	await page.mouse.click(bar2.x, bar2.y);
	await expect(page.getByTestId('status')).toContainText('1 selected');
	await page.getByTestId('prop-x').fill('12.21');
	await page.getByTestId('prop-x').press('Enter');

	const gap = page.getByTestId('rules-findings').locator('[data-code="rule.min-gap"]');
	await expect(gap).toContainText('bar1 and bar2 are 0.01 mm apart');
	await expect(page.getByTestId('view-rules')).toHaveClass(/failing/);
	await expect(page.getByTestId('overall')).toHaveText('Fails checks');

	const empty = await screenOf(page, 60, 39);
	await page.mouse.click(empty.x, empty.y);
	await expect(page.getByTestId('status')).toContainText('0 selected');
	const viewBefore = await page.getByTestId('editor-stage').getAttribute('data-view');
	await gap.getByTestId('rule-finding').click();
	await expect(page.getByTestId('status')).toContainText('2 selected');
	await expect(page.getByTestId('properties')).toContainText('2 electrodes');
	await expect
		.poll(() => page.getByTestId('editor-stage').getAttribute('data-view'))
		.not.toBe(viewBefore);

	// Loosening the limit below the gap clears the finding; undo brings it back.
	await page.getByTestId('rule-limit-minGap_mm').fill('0.005');
	await page.getByTestId('rule-limit-minGap_mm').press('Enter');
	await expect(gap).toHaveCount(0);
	await page.getByTestId('action-undo').click();
	await expect(page.getByTestId('rule-limit-minGap_mm')).toHaveValue('0.05');
	await expect(gap).toHaveCount(1);
	expect(errors).toEqual([]);
});
