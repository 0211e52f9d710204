/** Opens the app and waits until it is interactive (hydrated), so inputs have their handlers. */
import { expect, type Page } from '@playwright/test';

export async function openApp(page: Page, path = '/') {
	await page.goto(path);
	await expect(page.locator('[data-hydrated="true"]')).toBeVisible();
}
