import { expect, test } from '@playwright/test';
import type { Page } from '@playwright/test';

/** Opens the app and waits for hydration; the first load on a busy machine can be slow. */
async function openApp(page: Page) {
	await page.goto('/');
	await expect(page.locator('[data-hydrated="true"]')).toBeVisible({ timeout: 30_000 });
}

const opposite = (a: number, b: number) => Math.abs((((a - b + 540) % 360) - 180 + 360) % 360);

test('the viewing-angle map shows the best direction, and turning the rubbing moves it to the opposite side', async ({
	page
}) => {
	await openApp(page);
	await page.getByTestId('view-angle').click();
	const plot = page.getByTestId('view-angle-plot');
	await expect(plot).toBeVisible({ timeout: 40_000 });
	await expect(page.getByTestId('view-angle-best')).toContainText("o'clock");
	await expect(page.getByTestId('view-angle-best-arrow')).toBeVisible();
	await expect(page.getByTestId('view-angle-swatches')).toBeVisible();
	await expect(page.getByTestId('parallax-table')).toContainText('mm');
	const before = Number(await plot.getAttribute('data-best-azimuth'));
	await page.getByTestId('turn-rubbing').click();
	await expect(plot).not.toHaveAttribute('data-best-azimuth', before.toFixed(1), {
		timeout: 40_000
	});
	await expect(page.getByTestId('view-angle-progress')).toHaveCount(0, { timeout: 40_000 });
	const after = Number(await plot.getAttribute('data-best-azimuth'));
	expect(Math.abs(opposite(after, before) - 180)).toBeLessThan(1);
	await expect(page.locator('body')).not.toContainText('NaN');
});

test('a bad rubbing angle is refused with a reason and the map stays', async ({ page }) => {
	await openApp(page);
	await page.getByTestId('view-angle').click();
	await expect(page.getByTestId('view-angle-plot')).toBeVisible({ timeout: 40_000 });
	await page.getByTestId('front-rubbing-input').fill('400');
	await expect(page.getByTestId('view-angle-panel')).toContainText('359.99');
	await expect(page.getByTestId('view-angle-plot')).toBeVisible();
	await expect(page.locator('body')).not.toContainText('NaN');
});
