import { readFileSync } from 'node:fs';
import { expect, test, type Page } from '@playwright/test';
import { openApp } from './ready';
import { parseCsv } from '../wiring/csv-parse';

async function download(page: Page, testid: string): Promise<string> {
	const [file] = await Promise.all([
		page.waitForEvent('download'),
		page.getByTestId(testid).click()
	]);
	return readFileSync((await file.path())!, 'utf8');
}

test('clear, assign automatically, drag onto a taken crossing, undo, export pins and header', async ({
	page
}) => {
	await openApp(page);
	await expect(page.getByTestId('editor-canvas')).toHaveAttribute('data-ready', 'true');
	await page.getByTestId('view-wiring').click();
	const tray = page.getByTestId('unwired-tray');

	await page.getByTestId('clear-wiring').click();
	await expect(tray).toContainText('Unwired (53)');
	await expect(page.getByTestId('overall')).toHaveText('Fails checks');

	await page.getByTestId('auto-commons').fill('4');
	await page.getByTestId('auto-assign').click();
	await expect(tray).toContainText('Unwired (0)');
	await expect(
		page.locator('[data-testid="wiring-verdict"] [data-code="wiring.ok"]')
	).toBeVisible();
	const matrix = page.getByTestId('crossing-matrix');
	await expect(matrix.locator('thead th')).toHaveCount(1 + 14);
	await expect(matrix.locator('td.doubled')).toHaveCount(0);

	// Drag 1A onto the crossing that drives 1G.
	await page.locator('[data-chip="d1a"]').dragTo(page.locator('td:has([data-chip="d1g"])'));
	await expect(matrix.locator('td.doubled')).toHaveCount(1);
	const canvas = page.getByTestId('editor-canvas');
	await expect(canvas).toHaveAttribute('data-conflicts', /d1a/);
	await expect(canvas).toHaveAttribute('data-conflicts', /d1g/);
	await expect(page.locator('[data-code="wiring.shared-crossing"]')).toBeVisible();

	await page.locator('body').click({ position: { x: 5, y: 5 } });
	await page.keyboard.press('Control+z');
	await expect(matrix.locator('td.doubled')).toHaveCount(0);
	await expect(canvas).toHaveAttribute('data-conflicts', '');

	const rows = parseCsv(await download(page, 'export-pin-csv'));
	expect(rows[0].slice(0, 2)).toEqual(['pin', 'function']);
	expect(rows).toHaveLength(1 + 4 + 14);
	expect(rows.slice(1).filter((r) => r[1].startsWith('COM'))).toHaveLength(4);

	const header = await download(page, 'export-header');
	expect(header).toContain('#define LCD_COMMONS 4');
	expect(header).toContain('#define LCD_LINES 14');
	const digits = header.slice(
		header.indexOf('lcd_digit_bits'),
		header.indexOf('};', header.indexOf('lcd_digit_bits'))
	);
	expect(digits.split('\n').filter((l) => l.includes('/* Digit'))).toHaveLength(4);
});
