import { expect, test } from '@playwright/test';
import { openApp } from './ready';

for (const viewport of [
	{ width: 1024, height: 768 },
	{ width: 1440, height: 900 }
])
	test(`a scenario's viewing angle picks the optical model, named in the table (${viewport.width}×${viewport.height})`, async ({
		page
	}) => {
		await page.setViewportSize(viewport);
		await openApp(page);
		await page.getByTestId('view-legibility').click();
		const office = page.getByTestId('scenario-row').filter({ hasText: 'Office' });
		await office.click();
		const model = office.getByTestId('scenario-model');
		const picked = page.getByTestId('picked-model');
		// the demo's scenarios are read 15° off the normal, from the designed 6 o'clock side
		await expect(model).toHaveText('oblique 15°', { timeout: 30_000 });
		await expect(picked).toHaveText("oblique, θ = 15° from 6 o'clock");
		const contrastAt15 = await office.locator('td.num').nth(2).textContent();

		const angle = page.getByTestId('scenario-view-angle');
		await angle.fill('0');
		await angle.press('Enter');
		await expect(model).toHaveText('normal', { timeout: 30_000 });
		await expect(picked).toHaveText('normal incidence');

		await angle.fill('45');
		await angle.press('Enter');
		await expect(model).toHaveText('oblique 45°', { timeout: 30_000 });
		await expect(office.locator('td.num').nth(2)).not.toHaveText(contrastAt15!);

		// the optics label and the verdict stay whole inside the checks panel
		const panel = await page.getByTestId('checks').boundingBox();
		for (const box of [await model.boundingBox(), await office.locator('td.verdict').boundingBox()])
			expect(box && panel && box.x + box.width <= panel.x + panel.width - 8).toBe(true);
		await page.screenshot({ path: `test-results/legibility-angle-${viewport.width}.png` });
	});
