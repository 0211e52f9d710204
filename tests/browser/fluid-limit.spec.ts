// A fluid that clears inside the operating range: every result below the clearing point stays on
// screen, and the failure is one coded finding with a fix — on the cell tab, in the list of every
// finding, and in the saved report.
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { openApp } from './ready';

test('a fluid clearing at 35 °C in a 0–40 °C design keeps the 0 and 25 °C results', async ({
	page
}) => {
	await openApp(page);
	await page.getByTestId('view-cell').click();
	await expect(page.getByTestId('cell-results')).toBeVisible({ timeout: 30_000 });
	// A single-compound cyanobiphenyl clears near 35 °C (Gray, Harrison & Nash, Electron. Lett. 1973).
	await page.getByTestId('fluid-select').selectOption('cyanobiphenyl-single');
	const finding = page.locator('[data-testid="cell-verdict"] [data-code="optics.fluid-clears"]');
	await expect(finding).toBeVisible({ timeout: 30_000 });
	await expect(finding).toContainText('below the hottest operating temperature 40 °C');
	await expect(finding).toContainText('clears well above 40 °C');
	await expect(page.getByTestId('overall')).toHaveText('Fails checks');

	// The optics below the clearing point are still shown: swatches, contrast and both curves.
	await expect(page.getByTestId('cell-results')).toBeVisible();
	await expect(page.getByTestId('contrast-ratio')).toHaveText(/^\d+\.\d\d : 1$/);
	await expect(page.getByTestId('cell-results')).toContainText('V10 / V50 / V90 at 0 °C');
	await expect(page.getByTestId('cell-results')).toContainText('V10 / V50 / V90 at 25 °C');
	await expect(page.getByTestId('cell-results')).not.toContainText('at 40 °C');
	await expect(page.getByTestId('eo-plot').locator('svg[viewBox]')).toBeVisible();

	// The drive check runs at the temperatures the model can give.
	await page.getByTestId('view-drive').click();
	const table = page.getByTestId('model-thresholds');
	await expect(table).toContainText('0 °C');
	await expect(table).toContainText('25 °C');
	await expect(page.getByTestId('von')).toHaveText(/\d\.\d+ V/);

	// Every finding, and the report the app saves, carry the coded failure.
	await page.getByTestId('view-findings').click();
	await expect(page.getByTestId('all-findings')).toContainText('optics.fluid-clears');
	const download = page.waitForEvent('download');
	await page.getByTestId('report-save').click();
	const html = readFileSync((await (await download).path())!, 'utf8');
	expect(html).toContain('<code>optics.fluid-clears</code>');
	expect(html).toContain('<h2>Electrical load</h2>');
	expect(html).toContain('<h2>Glass</h2>');
});
