import { expect, test } from '@playwright/test';
import { openApp } from './ready';

test('opens with the demo drawn to scale and its drive verdict', async ({ page }) => {
	await openApp(page);
	await expect(page.getByTestId('design-name')).toContainText('garden-water timer');
	await expect(page.locator('[data-electrode]')).toHaveCount(53);
	await expect(page.getByTestId('selection-ratio')).toHaveText('1.7321');
	await expect(page.getByTestId('drive-verdict')).toContainText('switches cleanly');
	await page.locator('[data-electrode="d1a"]').hover();
	await expect(page.getByTestId('electrode-tip')).toContainText('COM1');
	// Digit 1's a, f, e, d share the second line: the demo's pins follow its leads, bar step 1 first.
	await expect(page.getByTestId('electrode-tip')).toContainText('SEG2');
});

test('changing the bias updates the figures live', async ({ page }) => {
	await openApp(page);
	await expect(page.getByTestId('selection-ratio')).toHaveText('1.7321');
	const bias = page.getByTestId('bias-input');
	await bias.fill('1/2');
	await bias.press('Enter');
	// Alt & Pleshko (1974) relations by hand: 1/4 duty with 1/2 bias gives V_on/V_off = √(7/3) = 1.528.
	await expect(page.getByTestId('selection-ratio')).toHaveText('1.5275');
	await bias.fill('1/1');
	await bias.press('Enter');
	await expect(page.getByText('not a usable bias')).toBeVisible();
	await expect(page.getByTestId('selection-ratio')).toHaveText('1.5275');
	await page.getByTestId('amplitude-input').fill('6');
	await page.getByTestId('amplitude-input').press('Enter');
	await expect(page.getByTestId('drive-verdict')).toContainText('ghost');
	await expect(page.getByTestId('overall')).toHaveText('Fails checks');
});

test('an invalid file shows path-named errors and keeps the open design', async ({ page }) => {
	await openApp(page);
	const broken = JSON.stringify({
		format: 'sunglyph-design',
		version: 2,
		name: 'x',
		glass: { width_mm: -3 }
	});
	await page.getByTestId('file-input').setInputFiles({
		name: 'broken.json',
		mimeType: 'application/json',
		buffer: Buffer.from(broken)
	});
	const error = page.getByTestId('load-error');
	await expect(error).toContainText('broken.json was not opened');
	await expect(error).toContainText('glass.width_mm: expected 0.1 to 2000 mm');
	await expect(page.getByTestId('design-name')).toContainText('garden-water timer');
	await expect(page.locator('[data-electrode]')).toHaveCount(53);
});

test('saves the design and opens it again', async ({ page }) => {
	await openApp(page);
	await page.getByTestId('amplitude-input').fill('3.4');
	await page.getByTestId('amplitude-input').press('Enter');
	const download = page.waitForEvent('download');
	await page.getByTestId('save-file').click();
	const file = await (await download).path();
	const fs = await import('node:fs');
	const saved = JSON.parse(fs.readFileSync(file, 'utf8'));
	expect(saved.drive.amplitude_V).toBe(3.4);
	await page.reload();
	await expect(page.locator('[data-hydrated="true"]')).toBeVisible();
	await page.getByTestId('file-input').setInputFiles(file);
	await expect(page.getByTestId('amplitude-input')).toHaveValue('3.4');
});
