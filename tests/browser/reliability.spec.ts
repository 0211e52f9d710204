import { expect, test, type Page } from '@playwright/test';
import { afterAutosave } from './ready';

/** Opens the app and waits for hydration, allowing for a busy shared machine. */
async function openApp(page: Page) {
	await page.goto('/');
	await expect(page.locator('[data-hydrated="true"]')).toBeVisible({ timeout: 30_000 });
}

test('number fields apply only whole committed values', async ({ page }) => {
	await openApp(page);
	await expect(page.getByTestId('selection-ratio')).toHaveText('1.7321');
	const commons = page.getByTestId('commons-input');
	await commons.fill('');
	// Typed key by key: the prefix "2" of "2.5" must never be applied on the way.
	await commons.pressSequentially('2.5');
	await expect(page.getByTestId('selection-ratio')).toHaveText('1.7321');
	await commons.press('Enter');
	await expect(page.getByText('enter a whole number')).toBeVisible();
	await expect(page.getByTestId('selection-ratio')).toHaveText('1.7321');
	const volts = page.getByTestId('amplitude-input');
	await volts.fill('');
	await volts.pressSequentially('1e9');
	await volts.press('Enter');
	await expect(page.getByText('at most 60')).toBeVisible();
	await volts.press('Escape');
	await expect(volts).toHaveValue('4.7');
	await expect(page.getByTestId('overall')).not.toContainText('Fails');
});

test('the verdict badge waits for the optics of the design on screen', async ({ page }) => {
	await openApp(page);
	await expect(page.getByTestId('overall')).toHaveAttribute('data-current', 'true', {
		timeout: 30_000
	});
	await page.getByTestId('view-cell').click();
	const gap = page.getByTestId('gap-input');
	await gap.fill('6');
	await gap.press('Enter');
	await expect(page.getByTestId('overall')).toHaveText(/computing/);
	await expect(page.getByTestId('overall')).toHaveAttribute('data-current', 'true', {
		timeout: 30_000
	});
	await expect(page.getByTestId('overall')).toHaveText(/Pass|Fail/);
});

test('designs can be created, named, saved, listed, reopened and duplicated', async ({ page }) => {
	await openApp(page);
	await page.getByTestId('new-design').click();
	await page.getByTestId('design-name-input').fill('Kitchen scale');
	await page.getByTestId('designs-confirm').click();
	await expect(page.getByTestId('design-name')).toHaveText('Kitchen scale');
	await expect(page.locator('[data-electrode]')).toHaveCount(0);
	await expect(page.getByTestId('unsaved-mark')).toBeVisible();

	await page.getByTestId('rename-design').click();
	await page.getByTestId('design-name-input').fill('Kitchen scale rev B');
	await page.getByTestId('designs-confirm').click();
	await expect(page.getByTestId('design-name')).toHaveText('Kitchen scale rev B');

	const download = page.waitForEvent('download');
	await page.getByTestId('save-file').click();
	expect((await download).suggestedFilename()).toBe('Kitchen scale rev B.sunglyph.json');
	await expect(page.getByTestId('unsaved-mark')).toHaveCount(0);

	await page.getByTestId('duplicate-design').click();
	await expect(page.getByTestId('design-name')).toHaveText('Kitchen scale rev B (copy)');

	await page.getByTestId('designs-list').click();
	const list = page.getByTestId('recent-designs');
	await expect(list).toContainText('Kitchen scale rev B (copy)');
	await list
		.locator('li', { hasText: /^Kitchen scale rev B(?! \(copy\))/ })
		.getByText('Open')
		.click();
	await expect(page.getByTestId('design-name')).toHaveText('Kitchen scale rev B');

	// Opening a file over unsaved changes asks first.
	await page.getByTestId('rename-design').click();
	await page.getByTestId('design-name-input').fill('Kitchen scale rev C');
	await page.getByTestId('designs-confirm').click();
	await page.getByTestId('open-file').click();
	await expect(page.getByTestId('confirm-open')).toContainText('Kitchen scale rev C');
});

test('a kept design this build cannot read is listed and offered, never deleted', async ({
	page
}) => {
	await openApp(page);
	await expect(page.getByTestId('workspace')).toHaveAttribute('data-autosave', 'on');
	await page.evaluate(async () => {
		const db = await new Promise<IDBDatabase>((resolve, reject) => {
			const r = indexedDB.open('sunglyph', 2);
			r.onsuccess = () => resolve(r.result);
			r.onerror = () => reject(r.error);
		});
		const text = JSON.stringify({
			format: 'sunglyph-design',
			version: 99,
			name: 'From the future'
		});
		await new Promise((resolve) => {
			const tx = db.transaction('designs', 'readwrite');
			tx.objectStore('designs').put(
				{
					id: 'future',
					name: 'From the future',
					fileName: 'f.json',
					text,
					changedAt_ms: 1,
					unsaved: true
				},
				'future'
			);
			tx.oncomplete = resolve;
		});
		db.close();
	});
	for (let i = 0; i < 2; i++) {
		await page.reload();
		await expect(page.getByTestId('workspace')).toHaveAttribute('data-autosave', 'on');
		await page.getByTestId('designs-list').click();
		const row = page.getByTestId('recent-designs').locator('li', { hasText: 'From the future' });
		await expect(row).toContainText('Cannot be read by this version');
		const download = page.waitForEvent('download');
		await row.getByText('Download').click();
		expect((await download).suggestedFilename()).toBe('f.json');
		await page.keyboard.press('Escape');
	}
});

test('a second tab opening the same design is told', async ({ context }) => {
	const first = await context.newPage();
	await openApp(first);
	await afterAutosave(first, async () => {
		await first.getByTestId('new-design').click();
		await first.getByTestId('design-name-input').fill('Shared glass');
		await first.getByTestId('designs-confirm').click();
		await expect(first.getByTestId('design-name')).toHaveText('Shared glass');
	});
	const second = await context.newPage();
	await openApp(second);
	await expect(second.getByTestId('workspace')).toHaveAttribute('data-autosave', 'on');
	// The design held by the first tab is not taken over on start.
	await expect(second.getByTestId('design-name')).not.toHaveText('Shared glass');
	await second.getByTestId('designs-list').click();
	await second
		.getByTestId('recent-designs')
		.locator('li', { hasText: 'Shared glass' })
		.getByText('Open')
		.click();
	await expect(second.getByTestId('other-tab')).toBeVisible();
});
