/** Opens the app and waits until it is interactive (hydrated), so inputs have their handlers. */
import { expect, type Page } from '@playwright/test';

export async function openApp(page: Page, path = '/') {
	await page.goto(path);
	await expect(page.locator('[data-hydrated="true"]')).toBeVisible();
}

/** Resolves once autosave has written the design after `action` (its saved time moves on). */
export async function afterAutosave(page: Page, action: () => Promise<unknown>) {
	const status = page.getByTestId('autosave-status');
	const before = (await status.getAttribute('data-saved-at')) ?? '';
	await action();
	await expect(status).not.toHaveAttribute('data-saved-at', before, { timeout: 15_000 });
	await expect(status).not.toHaveAttribute('data-saved-at', '');
}
