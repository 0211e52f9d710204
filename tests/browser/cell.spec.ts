import { expect, test } from '@playwright/test';
import { openApp } from './ready';

test('the cell panel shows predicted colours, curves and reacts to the gap', async ({ page }) => {
	await openApp(page);
	await page.getByTestId('view-cell').click();
	await expect(page.getByTestId('cell-results')).toBeVisible({ timeout: 20_000 });
	await expect(page.getByTestId('spectra-plot').locator('svg').first()).toBeVisible();
	await expect(page.getByTestId('eo-plot').locator('svg').first()).toBeVisible();
	await expect(page.getByTestId('response-plot').locator('svg').first()).toBeVisible();
	const before = await page.getByTestId('contrast-ratio').textContent();
	expect(Number.parseFloat(before!)).toBeGreaterThan(3);
	await page.getByTestId('gap-input').fill('7');
	await page.getByTestId('gap-input').press('Enter');
	await expect(page.getByTestId('contrast-ratio')).not.toHaveText(before!, { timeout: 20_000 });
	await expect(page.locator('body')).not.toContainText('NaN');
});

test('a bad cell value is refused with a reason and nothing breaks', async ({ page }) => {
	await openApp(page);
	await page.getByTestId('view-cell').click();
	await expect(page.getByTestId('cell-results')).toBeVisible({ timeout: 20_000 });
	await page.getByTestId('gap-input').fill('-2');
	await page.getByTestId('gap-input').press('Enter');
	await expect(page.getByText('at least 0.5')).toBeVisible();
	await page.getByTestId('gap-input').fill('abc');
	await page.getByTestId('gap-input').press('Enter');
	await expect(page.getByText('"abc" is not a number')).toBeVisible();
	await expect(page.getByTestId('cell-results')).toBeVisible();
	await expect(page.locator('body')).not.toContainText('NaN');
});

test('the drive check follows the cell model over temperature', async ({ page }) => {
	await openApp(page);
	await page.getByTestId('view-cell').click();
	await expect(page.getByTestId('cell-results')).toBeVisible({ timeout: 20_000 });
	await page.getByTestId('view-drive').click();
	await expect(page.getByTestId('drive-verdict')).toContainText(
		'switches cleanly from 0 °C to 40 °C'
	);
	await page.getByTestId('tmin-input').fill('-30');
	await page.getByTestId('tmin-input').press('Enter');
	// The cell model's V90 rises in the cold, eating into the on-segment margin.
	await expect(page.getByTestId('drive-verdict')).toContainText('from -30 °C to 40 °C', {
		timeout: 20_000
	});
	await expect(page.getByTestId('drive-verdict')).toContainText('little room');
});

test('a fluid that clears inside the operating range fails clearly, and undo restores it', async ({
	page
}) => {
	await openApp(page);
	await page.getByTestId('view-cell').click();
	await expect(page.getByTestId('cell-results')).toBeVisible({ timeout: 20_000 });
	await page.getByTestId('fluid-select').selectOption('cyanobiphenyl-single');
	await expect(page.getByTestId('cell-verdict')).toContainText(
		'below the hottest operating temperature 40 °C',
		{ timeout: 20_000 }
	);
	await expect(page.getByTestId('overall')).toHaveText('Fails checks');
	await page.keyboard.press('Control+z');
	await expect(page.getByTestId('fluid-select')).toHaveValue('generic-reflective-tn');
	await expect(page.getByTestId('cell-results')).toBeVisible({ timeout: 20_000 });
	await expect(page.getByTestId('overall')).not.toHaveText('Fails checks');
});
