// Dialog problems speak the user's words — the field's label and unit, never an internal name —
// and mark the field at fault (aria-invalid, a red outline); Enter takes the caret to it.
import { expect, test, type Locator, type Page } from '@playwright/test';
import { openApp } from './ready';

async function waitForEditor(page: Page) {
	await openApp(page);
	await expect(page.locator('[data-testid="editor-canvas"][data-ready="true"]')).toHaveCount(1);
}

/** A red outline: the field's border (or its frame's) takes the error colour. */
async function outlinedRed(field: Locator): Promise<boolean> {
	return field.evaluate((el) => {
		const frame = el.closest('.box') ?? el;
		const colour = getComputedStyle(frame).borderTopColor;
		const [r, g, b] = colour.match(/\d+/g)!.map(Number);
		return r > 150 && g < 90 && b < 90;
	});
}

test('the digits dialog names the gap by its label and unit and marks it', async ({ page }) => {
	await waitForEditor(page);
	await page.keyboard.press('d');
	const gap = page.getByTestId('param-gap_mm');
	await gap.fill('0');
	const status = page.getByTestId('generator-status');
	await expect(status).toHaveText('Gap: enter a number above 0 mm');
	await expect(status).not.toContainText('gap_mm');
	await expect(gap).toHaveAttribute('aria-invalid', 'true');
	expect(await outlinedRed(gap)).toBe(true);
	await expect(page.getByTestId('generator-dialog')).toContainText('enter a number above 0 mm');
	await expect(page.getByTestId('generator-apply')).toBeDisabled();
	// Enter in another field takes the caret to the field at fault.
	await page.getByTestId('param-height_mm').press('Enter');
	await expect(gap).toBeFocused();
	await gap.fill('0.12');
	await expect(gap).toHaveAttribute('aria-invalid', 'false');
	await expect(status).toContainText('electrodes');
});

test('the array dialog marks a count that is not a number and focuses it', async ({ page }) => {
	await waitForEditor(page);
	await page.locator('[data-electrode]').first().click({ force: true });
	await page.getByTestId('action-array').click();
	const count = page.getByTestId('array-count');
	await count.fill('three');
	await page.getByTestId('array-dx').focus();
	await page.getByTestId('array-apply').click();
	await expect(count).toHaveAttribute('aria-invalid', 'true');
	await expect(count).toBeFocused();
	expect(await outlinedRed(count)).toBe(true);
	await expect(page.getByTestId('array-dialog').getByRole('alert')).toHaveText(
		'Count (with the original): "three" is not a number'
	);
});

test('the icon dialog names a bad size by its label and unit', async ({ page }) => {
	await waitForEditor(page);
	await page.getByTestId('action-icons').click();
	const size = page.getByTestId('icon-size');
	await size.fill('-3');
	await expect(page.getByTestId('icon-error')).toHaveText('Size: enter a number above 0 mm');
	await expect(size).toHaveAttribute('aria-invalid', 'true');
	expect(await outlinedRed(size)).toBe(true);
});
